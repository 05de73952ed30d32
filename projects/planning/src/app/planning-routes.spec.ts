import { comparePath, parsePlanningPath, planListPath } from './planning-routes';

describe('parsePlanningPath', () => {
  it('opens the saved plans at the module root, with the list state from the path', () => {
    expect(parsePlanningPath('')).toEqual({ page: 'plans', archived: false, query: { q: '', sort: '-updatedAt', offset: 0, limit: 25 } });
    expect(parsePlanningPath('plans?q=deep&status=archived&offset=25')).toEqual({
      page: 'plans',
      archived: true,
      query: { q: 'deep', sort: '-updatedAt', offset: 25, limit: 25 },
    });
  });

  it('reads the editor, new or saved, and a tub to start from', () => {
    expect(parsePlanningPath('plans/new')).toEqual({ page: 'plan', id: null, tubModelId: null });
    expect(parsePlanningPath('plans/new?tub=3')).toEqual({ page: 'plan', id: null, tubModelId: 3 });
    expect(parsePlanningPath('plans/42')).toEqual({ page: 'plan', id: 42, tubModelId: null });
  });

  it('reads tub models and the price list', () => {
    expect(parsePlanningPath('tub-models?sort=-lengthIn').page).toBe('tub-models');
    expect(parsePlanningPath('tub-models/new')).toEqual({ page: 'tub-model', id: null });
    expect(parsePlanningPath('tub-models/7')).toEqual({ page: 'tub-model', id: 7 });
    expect(parsePlanningPath('price-list')).toEqual({ page: 'price-list' });
    expect(parsePlanningPath('materials')).toEqual({ page: 'materials' });
  });

  it('reads a comparison of two saved plans, in the order given', () => {
    expect(parsePlanningPath('compare/12/7')).toEqual({ page: 'compare', a: 12, b: 7 });
    expect(parsePlanningPath(comparePath(3, 4))).toEqual({ page: 'compare', a: 3, b: 4 });
    expect(parsePlanningPath('compare/12').page).toBe('not-found');
    expect(parsePlanningPath('compare/12/x').page).toBe('not-found');
    expect(parsePlanningPath('compare/1/2/3').page).toBe('not-found');
  });

  it('says not found for anything else', () => {
    expect(parsePlanningPath('plans/abc').page).toBe('not-found');
    expect(parsePlanningPath('plans/0').page).toBe('not-found');
    expect(parsePlanningPath('plans/1/extra/more').page).toBe('not-found');
    expect(parsePlanningPath('no/such/page').page).toBe('not-found');
  });
});

describe('planListPath', () => {
  it('keeps defaults out of the address and adds the archived switch', () => {
    const query = { q: '', sort: '-updatedAt', offset: 0, limit: 25 };
    expect(planListPath(query, false)).toBe('plans');
    expect(planListPath(query, true)).toBe('plans?status=archived');
    expect(planListPath({ ...query, q: 'tall' }, true)).toBe('plans?q=tall&status=archived');
  });
});
