import { moduleUrl, safeReturnUrl, splitConsoleUrl } from './module-url';

describe('module URLs', () => {
  it('gives an element its sub-path', () => {
    expect(splitConsoleUrl('/collection/animals/42')).toEqual({ area: 'collection', first: 'collection', subPath: 'animals/42' });
    expect(splitConsoleUrl('/planning?q=tote&offset=25')).toEqual({ area: 'planning', first: 'planning', subPath: '?q=tote&offset=25' });
    expect(splitConsoleUrl('/orders')).toMatchObject({ subPath: '' });
    expect(splitConsoleUrl('/nowhere/else')).toMatchObject({ area: null, first: 'nowhere' });
  });

  it('turns an element sub-path back into a console URL', () => {
    expect(moduleUrl('collection', 'animals/42')).toBe('/collection/animals/42');
    expect(moduleUrl('planning', '?q=tote')).toBe('/planning?q=tote');
    expect(moduleUrl('orders', '/customers')).toBe('/orders/customers');
    expect(moduleUrl('orders', '')).toBe('/orders');
  });

  it('follows only local return URLs', () => {
    expect(safeReturnUrl('/collection/animals')).toBe('/collection/animals');
    expect(safeReturnUrl('//evil.example/x')).toBeNull();
    expect(safeReturnUrl('https://evil.example')).toBeNull();
    expect(safeReturnUrl('/sign-in')).toBeNull();
    expect(safeReturnUrl(undefined)).toBeNull();
  });
});
