import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { add, compare, divide, formatFraction, fraction, fromDecimal, multiply, roundTo, subtract, sum, toNumber } from './fraction.js';

describe('fraction', () => {
  it('reduces and keeps the sign on the numerator', () => {
    expect(fraction(2, 4)).toEqual({ num: 1n, den: 2n });
    expect(fraction(3, -9)).toEqual({ num: -1n, den: 3n });
    expect(fraction(0, 7)).toEqual({ num: 0n, den: 1n });
  });

  it('refuses a zero denominator and inexact numbers', () => {
    expect(() => fraction(1, 0)).toThrow(RangeError);
    expect(() => fraction(0.5)).toThrow(RangeError);
    expect(() => divide(fraction(1), fraction(0))).toThrow(RangeError);
  });

  it('does arithmetic exactly where floats do not (0.1 + 0.2)', () => {
    expect(add(fraction(1, 10), fraction(2, 10))).toEqual(fraction(3, 10));
    expect(add(fraction(1, 3), fraction(1, 6))).toEqual(fraction(1, 2));
    expect(subtract(fraction(1), fraction(1, 4))).toEqual(fraction(3, 4));
    expect(multiply(fraction(3, 4), fraction(2, 3))).toEqual(fraction(1, 2));
    expect(divide(fraction(1, 2), fraction(3, 4))).toEqual(fraction(2, 3));
    expect(sum([fraction(1, 4), fraction(1, 2), fraction(1, 4)])).toEqual(fraction(1));
  });

  it('compares by value, not by representation', () => {
    expect(compare(fraction(1, 3), fraction(1, 2))).toBeLessThan(0);
    expect(compare(fraction(2, 6), fraction(1, 3))).toBe(0);
    expect(compare(fraction(-1, 2), fraction(-2, 3))).toBeGreaterThan(0);
  });

  it('formats as reduced numerator/denominator, 1 included', () => {
    expect(formatFraction(fraction(2, 16))).toBe('1/8');
    expect(formatFraction(fraction(4, 4))).toBe('1/1');
    expect(toNumber(fraction(1, 8))).toBe(0.125);
  });

  it('rounds half away from zero from the exact value', () => {
    expect(roundTo(fraction(2, 3), 4)).toBe(0.6667);
    expect(roundTo(fraction(1, 3), 4)).toBe(0.3333);
    expect(roundTo(fraction(1, 20000), 4)).toBe(0.0001); // exactly half a unit in the last place
    expect(roundTo(fraction(-2, 3), 4)).toBe(-0.6667);
  });

  it('reads decimals as written', () => {
    expect(fromDecimal(0.1)).toEqual(fraction(1, 10));
    expect(fromDecimal(0.6667)).toEqual(fraction(6667, 10000));
    expect(fromDecimal(1e-7)).toEqual(fraction(1, 10_000_000));
    expect(fromDecimal(2.5e-7)).toEqual(fraction(1, 4_000_000));
    expect(fromDecimal(1)).toEqual(fraction(1));
    expect(fromDecimal(-0.25)).toEqual(fraction(-1, 4));
    expect(() => fromDecimal(Number.NaN)).toThrow(RangeError);
  });

  it('a decimal read back equals a/10^k for any k-place decimal', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 10_000 }), (n) => {
        expect(fromDecimal(n / 10_000)).toEqual(fraction(n, 10_000));
      }),
    );
  });

  it('addition is commutative and associative exactly', () => {
    const arb = fc.tuple(fc.integer({ min: -1000, max: 1000 }), fc.integer({ min: 1, max: 1000 })).map(([n, d]) => fraction(n, d));
    fc.assert(
      fc.property(arb, arb, arb, (a, b, c) => {
        expect(add(a, b)).toEqual(add(b, a));
        expect(add(add(a, b), c)).toEqual(add(a, add(b, c)));
      }),
    );
  });
});
