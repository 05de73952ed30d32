import { animalListPath, parseCollectionPath, sectionOf } from './collection-routes';

describe('parseCollectionPath', () => {
  it('opens the animal list at the module root and under animals, with its filters', () => {
    expect(parseCollectionPath('')).toMatchObject({ page: 'animals', filters: { status: null, sex: null } });
    const view = parseCollectionPath('animals?q=amber&status=on-hold&sex=female&sort=-weightG');
    expect(view).toEqual({
      page: 'animals',
      query: { q: 'amber', sort: '-weightG', offset: 0, limit: 25 },
      filters: { status: 'on-hold', sex: 'female' },
    });
  });

  it('ignores filter values the API would refuse', () => {
    expect(parseCollectionPath('animals?status=missing&sex=x')).toMatchObject({ filters: { status: null, sex: null } });
  });

  it('reads record ids and refuses anything that is not one', () => {
    expect(parseCollectionPath('animals/42')).toEqual({ page: 'animal', id: 42 });
    expect(parseCollectionPath('racks/3/labels')).toEqual({ page: 'labels', id: 3 });
    expect(parseCollectionPath('feeding/7')).toEqual({ page: 'feeding', rackId: 7 });
    expect(parseCollectionPath('breeding/pairings/5')).toEqual({ page: 'pairing', id: 5 });
    expect(parseCollectionPath('animals/0')).toEqual({ page: 'missing', route: 'animals/0' });
    expect(parseCollectionPath('animals/abc')).toEqual({ page: 'missing', route: 'animals/abc' });
    expect(parseCollectionPath('racks/3/other')).toEqual({ page: 'missing', route: 'racks/3/other' });
  });

  it('opens the animal form, the CSV import, the trait list and the species page', () => {
    expect(parseCollectionPath('animals/new')).toEqual({ page: 'animal-new' });
    expect(parseCollectionPath('animals/42/edit')).toEqual({ page: 'animal-edit', id: 42 });
    expect(parseCollectionPath('animals/import')).toEqual({ page: 'import' });
    expect(parseCollectionPath('traits')).toEqual({ page: 'traits' });
    expect(parseCollectionPath('species')).toEqual({ page: 'species' });
    expect(parseCollectionPath('animals/new/edit')).toEqual({ page: 'missing', route: 'animals/new/edit' });
    expect(parseCollectionPath('traits/3')).toEqual({ page: 'missing', route: 'traits/3' });
  });

  it('keeps the due list date and the environment rack from the query', () => {
    expect(parseCollectionPath('feeding?date=2026-12-02')).toEqual({ page: 'due', date: '2026-12-02' });
    expect(parseCollectionPath('feeding?date=tomorrow')).toEqual({ page: 'due', date: null });
    expect(parseCollectionPath('environment?rackId=2')).toEqual({ page: 'environment', rackId: 2 });
    expect(parseCollectionPath('environment')).toEqual({ page: 'environment', rackId: null });
  });

  it('puts each page under its navigation entry', () => {
    expect(sectionOf(parseCollectionPath('animals/4'))).toBe('animals');
    expect(sectionOf(parseCollectionPath('feeding/4'))).toBe('feeding');
    expect(sectionOf(parseCollectionPath('racks/4/labels'))).toBe('racks');
    expect(sectionOf(parseCollectionPath('animals/4/edit'))).toBe('animals');
    expect(sectionOf(parseCollectionPath('animals/import'))).toBe('animals');
    expect(sectionOf(parseCollectionPath('species'))).toBe('species');
    expect(sectionOf(parseCollectionPath('nowhere'))).toBeNull();
  });
});

describe('animalListPath', () => {
  it('writes only what differs from the defaults, filters last', () => {
    const query = { q: '', sort: 'code', offset: 0, limit: 25 };
    expect(animalListPath(query, { status: null, sex: null })).toBe('animals');
    expect(animalListPath({ ...query, q: 'pr' }, { status: 'active', sex: null })).toBe('animals?q=pr&status=active');
    expect(animalListPath(query, { status: null, sex: 'male' })).toBe('animals?sex=male');
  });

  it('round-trips through parseCollectionPath', () => {
    const query = { q: 'spilota', sort: '-hatchDate', offset: 50, limit: 50 };
    const filters = { status: 'sold', sex: 'female' } as const;
    expect(parseCollectionPath(animalListPath(query, filters))).toEqual({ page: 'animals', query, filters });
  });
});
