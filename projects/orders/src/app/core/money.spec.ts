import { formatCents, parseMoneyToCents, unitsToCents } from './money';

describe('money', () => {
  it('shows cents in the currency', () => {
    expect(formatCents(148000, 'usd')).toBe('$1,480.00');
    expect(formatCents(-4500, 'usd')).toBe('-$45.00');
    expect(formatCents(null)).toBe('—');
  });

  it('reads what a person types without floating-point drift', () => {
    expect(parseMoneyToCents('45')).toBe(4500);
    expect(parseMoneyToCents('$1,480.5')).toBe(148050);
    // 0.29 * 100 is 28.999999999999996 in binary floating point
    expect(parseMoneyToCents('0.29')).toBe(29);
    expect(parseMoneyToCents('-3')).toBeNull();
    expect(parseMoneyToCents('1.234')).toBeNull();
    expect(parseMoneyToCents('')).toBeNull();
  });

  it('turns price-list amounts into cents', () => {
    expect(unitsToCents(95)).toBe(9500);
    // 12.34 * 100 is 1233.9999999999998
    expect(unitsToCents(12.34)).toBe(1234);
  });
});
