import { ListQuery } from '../api/page';

export const PAGE_SIZES = [10, 25, 50, 100] as const;

export interface ListDefaults {
  sort: string;
  limit: number;
}

/**
 * A module element keeps its list state in its sub-path (`tub-models?q=tote&sort=-lengthIn&offset=25`),
 * so deep links, reload and back/forward restore the same page. `route` is the part before `?`.
 */
export function parseListPath(path: string, defaults: ListDefaults): { route: string; query: ListQuery } {
  const [route, search = ''] = splitPath(path);
  const params = new URLSearchParams(search);
  const limit = toInt(params.get('limit'), defaults.limit);
  return {
    route,
    query: {
      q: params.get('q') ?? '',
      sort: params.get('sort') ?? defaults.sort,
      limit: (PAGE_SIZES as readonly number[]).includes(limit) ? limit : defaults.limit,
      offset: Math.max(0, toInt(params.get('offset'), 0)),
    },
  };
}

/** The inverse of parseListPath; values equal to the defaults stay out of the address. */
export function toListPath(route: string, query: ListQuery, defaults: ListDefaults): string {
  const params = new URLSearchParams();
  if (query.q.trim()) params.set('q', query.q.trim());
  if (query.sort && query.sort !== defaults.sort) params.set('sort', query.sort);
  if (query.offset > 0) params.set('offset', String(query.offset));
  if (query.limit !== defaults.limit) params.set('limit', String(query.limit));
  const search = params.toString();
  return search ? `${route}?${search}` : route;
}

/** `name` / `-name` ⇄ Material's sort state. */
export function toSortParam(active: string, direction: 'asc' | 'desc' | ''): string {
  if (!active || !direction) return '';
  return direction === 'desc' ? `-${active}` : active;
}

export function fromSortParam(sort: string): { active: string; direction: 'asc' | 'desc' | '' } {
  if (!sort) return { active: '', direction: '' };
  return sort.startsWith('-') ? { active: sort.slice(1), direction: 'desc' } : { active: sort, direction: 'asc' };
}

function splitPath(path: string): [string, string?] {
  const at = path.indexOf('?');
  const route = (at < 0 ? path : path.slice(0, at)).replace(/^\/+|\/+$/g, '');
  return at < 0 ? [route] : [route, path.slice(at + 1)];
}

function toInt(value: string | null, fallback: number): number {
  const n = value === null ? NaN : Number.parseInt(value, 10);
  return Number.isFinite(n) ? n : fallback;
}
