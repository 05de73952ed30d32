import { fromSortParam, parseListPath, toListPath, toSortParam } from './list-query';

const defaults = { sort: 'name', limit: 25 };

describe('list state in a sub-path', () => {
  it('reads route, filter, sort and page', () => {
    expect(parseListPath('tub-models?q=tote&sort=-lengthIn&offset=50&limit=10', defaults)).toEqual({
      route: 'tub-models',
      query: { q: 'tote', sort: '-lengthIn', offset: 50, limit: 10 },
    });
  });

  it('uses the defaults for an empty or odd path', () => {
    expect(parseListPath('', defaults)).toEqual({ route: '', query: { q: '', sort: 'name', offset: 0, limit: 25 } });
    expect(parseListPath('/animals/?offset=-5&limit=7', defaults).query).toEqual({ q: '', sort: 'name', offset: 0, limit: 25 });
  });

  it('writes only what differs from the defaults, and reads back the same', () => {
    const query = { q: ' ball ', sort: 'name', offset: 25, limit: 25 };
    const path = toListPath('', query, defaults);
    expect(path).toBe('?q=ball&offset=25');
    expect(parseListPath(path, defaults).query).toEqual({ ...query, q: 'ball' });
    expect(toListPath('animals', { q: '', sort: 'name', offset: 0, limit: 25 }, defaults)).toBe('animals');
  });

  it('maps sort parameters to and from Material sort state', () => {
    expect(toSortParam('lengthIn', 'desc')).toBe('-lengthIn');
    expect(toSortParam('lengthIn', '')).toBe('');
    expect(fromSortParam('-lengthIn')).toEqual({ active: 'lengthIn', direction: 'desc' });
    expect(fromSortParam('name')).toEqual({ active: 'name', direction: 'asc' });
  });
});
