import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { cutOneDimensional, solveBinPacking, toIntegers } from './one-dimensional.js';

function assertValid(bins: number[][], sizes: number[], capacity: number) {
  const seen = bins.flat().sort((a, b) => a - b);
  expect(seen).toEqual(sizes.map((_, i) => i));
  for (const bin of bins) expect(bin.reduce((s, i) => s + sizes[i], 0)).toBeLessThanOrEqual(capacity + 1e-9);
}

describe('one-dimensional cutting', () => {
  it('finds 2 bins where first- and best-fit decreasing need 3', () => {
    // FFD: {5,4} {4,3,2} {2}; optimum {5,3,2} {4,4,2} (hand-checked).
    const sizes = [5, 4, 4, 3, 2, 2];
    const r = solveBinPacking(sizes, 10, { deadline: Date.now() + 2000 });
    assertValid(r.bins, sizes, 10);
    expect(r.bins.length).toBe(2);
    expect(r.optimal).toBe(true);
  });

  it('treats decimal sizes that fill a bin exactly as exact', () => {
    // 36.6 + 26.8 + 36.6 = 100 in decimal, 100.00000000000001 in binary floating point.
    expect(toIntegers([36.6, 26.8, 36.6], 100)).toEqual({ sizes: [366, 268, 366], capacity: 1000 });
    expect(solveBinPacking([36.6, 26.8, 36.6], 100).bins.length).toBe(1);
  });

  it('charges a kerf between pieces but not after the last one', () => {
    expect(cutOneDimensional([48, 48], 96, 0.125).bins.length).toBe(2);
    expect(cutOneDimensional([47.9375, 47.9375], 96, 0.125).bins.length).toBe(1);
    expect(cutOneDimensional([96], 96, 0.125).bins.length).toBe(1);
  });

  it('rejects an item longer than the board', () => {
    expect(() => solveBinPacking([101], 100)).toThrow(RangeError);
  });

  it('always returns a valid packing no smaller than its bound', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: 1, max: 100 }), { minLength: 1, maxLength: 40 }), (sizes) => {
        const r = solveBinPacking(sizes, 100, { deadline: Date.now() + 50 });
        assertValid(r.bins, sizes, 100);
        expect(r.bins.length).toBeGreaterThanOrEqual(r.lowerBound);
        expect(r.bins.length).toBeGreaterThanOrEqual(Math.ceil(sizes.reduce((a, b) => a + b, 0) / 100));
      }),
      { numRuns: 60 },
    );
  });
});
