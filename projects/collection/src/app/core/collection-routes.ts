import { ListDefaults, ListQuery, parseListPath, toListPath } from '@tubwright/kit';

/*
 * The module's pages as sub-paths the shell passes in `path` (the shell owns the address bar):
 *   '' | animals[?q&sort&status&sex…]   animal list
 *   animals/new                          add an animal
 *   animals/import                       import animals from CSV, with a preview
 *   animals/42                           one animal with its history
 *   animals/42/edit                      change an animal's record
 *   racks                                racks and empty tubs
 *   racks/3                              a rack's map of tubs
 *   racks/3/labels                       printable tub labels
 *   feeding[?date=2026-12-02]            who is due to eat
 *   feeding/3                            feeding day for one rack
 *   breeding                             pairings and clutches
 *   breeding/pairings/5                  one pairing: outcomes and clutches
 *   environment[?rackId=3]               temperature and humidity readings
 *   traits                               the shop's trait list
 *   species                              species of the collection with their husbandry ranges
 */

export const ANIMAL_STATUSES = ['active', 'on-hold', 'sold', 'deceased'] as const;
export const ANIMAL_SEXES = ['male', 'female', 'unknown'] as const;
export type AnimalStatusFilter = (typeof ANIMAL_STATUSES)[number];
export type AnimalSexFilter = (typeof ANIMAL_SEXES)[number];

export interface AnimalFilters {
  status: AnimalStatusFilter | null;
  sex: AnimalSexFilter | null;
}

export const ANIMAL_LIST_DEFAULTS: ListDefaults = { sort: 'code', limit: 25 };

export type CollectionView =
  | { page: 'animals'; query: ListQuery; filters: AnimalFilters }
  | { page: 'animal'; id: number }
  | { page: 'animal-new' }
  | { page: 'animal-edit'; id: number }
  | { page: 'import' }
  | { page: 'racks' }
  | { page: 'rack'; id: number }
  | { page: 'labels'; id: number }
  | { page: 'due'; date: string | null }
  | { page: 'feeding'; rackId: number }
  | { page: 'breeding' }
  | { page: 'pairing'; id: number }
  | { page: 'environment'; rackId: number | null }
  | { page: 'traits' }
  | { page: 'species' }
  | { page: 'missing'; route: string };

export type Section = 'animals' | 'racks' | 'feeding' | 'breeding' | 'traits' | 'environment' | 'species';

export function parseCollectionPath(path: string | null | undefined): CollectionView {
  const raw = (path ?? '').trim();
  const { route, query } = parseListPath(raw, ANIMAL_LIST_DEFAULTS);
  const params = new URLSearchParams(raw.includes('?') ? raw.slice(raw.indexOf('?') + 1) : '');
  const parts = route ? route.split('/') : [];
  const id = (s: string | undefined) => (s && /^[1-9]\d{0,9}$/.test(s) ? Number(s) : null);

  const [first = '', second, third, fourth] = parts;
  if (parts.length <= 1 && (first === '' || first === 'animals')) {
    return { page: 'animals', query, filters: readFilters(params) };
  }
  if (first === 'animals' && parts.length === 2 && second === 'new') return { page: 'animal-new' };
  if (first === 'animals' && parts.length === 2 && second === 'import') return { page: 'import' };
  if (first === 'animals' && parts.length === 2 && id(second)) return { page: 'animal', id: id(second)! };
  if (first === 'animals' && parts.length === 3 && id(second) && third === 'edit') return { page: 'animal-edit', id: id(second)! };
  if (first === 'racks') {
    if (parts.length === 1) return { page: 'racks' };
    if (parts.length === 2 && id(second)) return { page: 'rack', id: id(second)! };
    if (parts.length === 3 && id(second) && third === 'labels') return { page: 'labels', id: id(second)! };
  }
  if (first === 'feeding') {
    if (parts.length === 1) {
      const date = params.get('date');
      return { page: 'due', date: date && /^\d{4}-\d{2}-\d{2}$/.test(date) ? date : null };
    }
    if (parts.length === 2 && id(second)) return { page: 'feeding', rackId: id(second)! };
  }
  if (first === 'breeding') {
    if (parts.length === 1) return { page: 'breeding' };
    if (parts.length === 3 && second === 'pairings' && id(third) && !fourth) return { page: 'pairing', id: id(third)! };
  }
  if (first === 'environment' && parts.length === 1) return { page: 'environment', rackId: id(params.get('rackId') ?? undefined) };
  if (first === 'traits' && parts.length === 1) return { page: 'traits' };
  if (first === 'species' && parts.length === 1) return { page: 'species' };
  return { page: 'missing', route };
}

/** The animal list's sub-path; defaults stay out of the address. */
export function animalListPath(query: ListQuery, filters: AnimalFilters): string {
  const base = toListPath('animals', query, ANIMAL_LIST_DEFAULTS);
  const extra = new URLSearchParams();
  if (filters.status) extra.set('status', filters.status);
  if (filters.sex) extra.set('sex', filters.sex);
  const more = extra.toString();
  if (!more) return base;
  return base.includes('?') ? `${base}&${more}` : `${base}?${more}`;
}

/** Which entry of the module's navigation a page belongs to. */
export function sectionOf(view: CollectionView): Section | null {
  switch (view.page) {
    case 'animals':
    case 'animal':
    case 'animal-new':
    case 'animal-edit':
    case 'import':
      return 'animals';
    case 'racks':
    case 'rack':
    case 'labels':
      return 'racks';
    case 'due':
    case 'feeding':
      return 'feeding';
    case 'breeding':
    case 'pairing':
      return 'breeding';
    case 'environment':
      return 'environment';
    case 'traits':
      return 'traits';
    case 'species':
      return 'species';
    default:
      return null;
  }
}

function readFilters(params: URLSearchParams): AnimalFilters {
  const status = params.get('status');
  const sex = params.get('sex');
  return {
    status: (ANIMAL_STATUSES as readonly string[]).includes(status ?? '') ? (status as AnimalStatusFilter) : null,
    sex: (ANIMAL_SEXES as readonly string[]).includes(sex ?? '') ? (sex as AnimalSexFilter) : null,
  };
}
