import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  MM_PER_IN,
  formatInches,
  formatLength,
  formatMillimetres,
  fromInches,
  inToMm,
  kgToLb,
  lbToKg,
  mmToIn,
  parseInches,
  toInches,
} from './units.js';

describe('conversions', () => {
  it('uses the exact inch and pound (NIST SP 811)', () => {
    expect(inToMm(1)).toBe(25.4);
    expect(mmToIn(254)).toBeCloseTo(10, 12);
    expect(lbToKg(1)).toBe(0.45359237);
    expect(kgToLb(0.45359237)).toBeCloseTo(1, 12);
  });

  it('converts by unit', () => {
    expect(toInches(50.8, 'mm')).toBeCloseTo(2, 12);
    expect(toInches(2, 'in')).toBe(2);
    expect(fromInches(2, 'mm')).toBeCloseTo(50.8, 12);
  });

  it('round-trips inches through millimetres', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e5, max: 1e5, noNaN: true }), (x) => {
        expect(mmToIn(inToMm(x))).toBeCloseTo(x, 6);
      }),
    );
  });
});

describe('formatInches', () => {
  it.each([
    [34.125, '34 1/8'],
    [0.5, '1/2'],
    [6.5625, '6 9/16'],
    [6.625, '6 5/8'],
    [-1.5, '-1 1/2'],
    [-0.25, '-1/4'],
    [0, '0'],
    [-0.01, '0'],
    [2.99, '3'],
    [15.97, '16'],
    [1 / 32, '1/16'], // half a sixteenth rounds away from zero
    [12, '12'],
  ])('%s in -> "%s"', (value, text) => {
    expect(formatInches(value)).toBe(text);
  });

  it('accepts another denominator', () => {
    expect(formatInches(1.3, 8)).toBe('1 1/4');
    expect(formatInches(1.3, 4)).toBe('1 1/4');
    expect(formatInches(1.3, 2)).toBe('1 1/2');
  });

  it('is within 1/32 in of the value and parses back to the rounded value', () => {
    fc.assert(
      fc.property(fc.double({ min: -500, max: 500, noNaN: true }), (x) => {
        const text = formatInches(x);
        const back = parseInches(text);
        expect(back).not.toBeNull();
        expect(Math.abs(back! - x)).toBeLessThanOrEqual(1 / 32 + 1e-9);
        expect(Number.isInteger(back! * 16)).toBe(true);
      }),
    );
  });
});

describe('formatMillimetres and formatLength', () => {
  it('drops trailing zeros', () => {
    expect(formatMillimetres(866.775)).toBe('866.8');
    expect(formatMillimetres(1200)).toBe('1200');
    expect(formatMillimetres(-3.04)).toBe('-3');
    expect(formatMillimetres(3.175, 2)).toBe('3.18');
  });

  it('adds the unit sign', () => {
    expect(formatLength(34.125, 'in')).toBe('34 1/8 in');
    expect(formatLength(1, 'mm')).toBe('25.4 mm');
  });
});

describe('parseInches', () => {
  it.each([
    ['34 1/8', 34.125],
    ['1/2', 0.5],
    ['-1 1/2', -1.5],
    ['6 9/16 in', 6.5625],
    ['12"', 12],
    ['34.125', 34.125],
    ['.5', 0.5],
    ['  3 ', 3],
  ])('"%s" -> %s', (text, value) => {
    expect(parseInches(text)).toBe(value);
  });

  it.each(['', 'abc', '1/0', '3 1/0', '1 2', '1//2', '--1'])('rejects "%s"', (text) => {
    expect(parseInches(text)).toBeNull();
  });

  it('matches the 25.4 definition when combined with the mm conversion', () => {
    expect(inToMm(parseInches('1 1/2')!)).toBeCloseTo(1.5 * MM_PER_IN, 12);
  });
});
