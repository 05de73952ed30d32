import { Role } from '@tubwright/kit';
import { areasFor, canUse, homeFor } from './areas';

describe('areas by role', () => {
  const names = (role: Role | null) => areasFor(role).map((a) => a.name);

  it('gives each role exactly its modules', () => {
    expect(names('owner')).toEqual(['planning', 'collection', 'orders', 'users', 'api-keys', 'activity', 'outbox']);
    expect(names('builder')).toEqual(['planning', 'orders']);
    expect(names('keeper')).toEqual(['collection']);
    expect(names('sales')).toEqual(['orders', 'planning']);
    expect(names(null)).toEqual([]);
  });

  it('refuses what the role does not list', () => {
    expect(canUse('keeper', 'planning')).toBe(false);
    expect(canUse('sales', 'users')).toBe(false);
    expect(canUse('builder', 'orders')).toBe(true);
    expect(canUse(null, 'collection')).toBe(false);
  });

  it('lands each role on its first module', () => {
    expect(homeFor('keeper')).toBe('/collection');
    expect(homeFor('sales')).toBe('/orders');
    expect(homeFor(null)).toBe('/sign-in');
  });
});
