import { ListDefaults, ListQuery, parseListPath, toListPath } from '@tubwright/kit';

export const PLAN_LIST_DEFAULTS: ListDefaults = { sort: '-updatedAt', limit: 25 };
export const TUB_MODEL_LIST_DEFAULTS: ListDefaults = { sort: 'name', limit: 25 };

/** The pages of the planning module, read from the sub-path the shell passes in `path`. */
export type PlanningView =
  | { page: 'plans'; query: ListQuery; archived: boolean }
  | { page: 'plan'; id: number | null; tubModelId: number | null }
  | { page: 'tub-models'; query: ListQuery }
  | { page: 'tub-model'; id: number | null }
  | { page: 'compare'; a: number; b: number }
  | { page: 'price-list' }
  | { page: 'materials' }
  | { page: 'not-found'; route: string };

export type PlanningSection = 'plans' | 'tub-models' | 'price-list' | 'materials';

export function parsePlanningPath(path: string): PlanningView {
  const [route = '', search = ''] = splitOnce(path.trim(), '?');
  const segments = route.split('/').filter(Boolean);
  const params = new URLSearchParams(search);
  const [first = '', second, ...rest] = segments;
  if (first === 'compare') {
    const [a, b] = [positiveInt(second), positiveInt(rest[0])];
    return a && b && rest.length === 1 ? { page: 'compare', a, b } : { page: 'not-found', route };
  }
  if (rest.length) return { page: 'not-found', route };

  if (first === '' || first === 'plans') {
    if (second === undefined) {
      return { page: 'plans', query: parseListPath(path, PLAN_LIST_DEFAULTS).query, archived: params.get('status') === 'archived' };
    }
    if (second === 'new') return { page: 'plan', id: null, tubModelId: positiveInt(params.get('tub')) };
    const id = positiveInt(second);
    return id ? { page: 'plan', id, tubModelId: null } : { page: 'not-found', route };
  }
  if (first === 'tub-models') {
    if (second === undefined) return { page: 'tub-models', query: parseListPath(path, TUB_MODEL_LIST_DEFAULTS).query };
    if (second === 'new') return { page: 'tub-model', id: null };
    const id = positiveInt(second);
    return id ? { page: 'tub-model', id } : { page: 'not-found', route };
  }
  if (first === 'price-list' && second === undefined) return { page: 'price-list' };
  if (first === 'materials' && second === undefined) return { page: 'materials' };
  return { page: 'not-found', route };
}

export function sectionOf(view: PlanningView): PlanningSection | null {
  switch (view.page) {
    case 'plans':
    case 'plan':
    case 'compare':
      return 'plans';
    case 'tub-models':
    case 'tub-model':
      return 'tub-models';
    case 'price-list':
      return 'price-list';
    case 'materials':
      return 'materials';
    default:
      return null;
  }
}

export function planListPath(query: ListQuery, archived: boolean): string {
  const path = toListPath('plans', query, PLAN_LIST_DEFAULTS);
  if (!archived) return path;
  return path + (path.includes('?') ? '&' : '?') + 'status=archived';
}

/** Two saved plans side by side: A's unit is the comparison's. */
export const comparePath = (a: number, b: number) => `compare/${a}/${b}`;

export const tubModelListPath = (query: ListQuery) => toListPath('tub-models', query, TUB_MODEL_LIST_DEFAULTS);

function splitOnce(text: string, separator: string): [string, string?] {
  const at = text.indexOf(separator);
  return at < 0 ? [text.replace(/^\/+|\/+$/g, '')] : [text.slice(0, at).replace(/^\/+|\/+$/g, ''), text.slice(at + 1)];
}

function positiveInt(text: string | null | undefined): number | null {
  if (!text || !/^\d+$/.test(text)) return null;
  const n = Number(text);
  return n > 0 && Number.isSafeInteger(n) ? n : null;
}
