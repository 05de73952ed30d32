import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { applyRateHalfUp, percentToBp, quoteTotals } from './quote-totals.js';

describe('applyRateHalfUp', () => {
  // Worked examples done by hand: 7.25 % of $19.99 = 144.9275 cents -> 145; 8 % of $0.50 = 4 cents exactly.
  it.each([
    [1999, 725, 145],
    [50, 800, 4],
    // 5 % of 10 cents = 0.5 cent: half goes up (common practice for sales tax).
    [10, 500, 1],
    // 5 % of 9 cents = 0.45 cent: below half goes down.
    [9, 500, 0],
    // 50 % deposit of an odd total: $1,234.57 / 2 = 61 728.5 cents -> 61 729.
    [123457, 5000, 61729],
    [0, 725, 0],
  ])('%i cents at %i bp is %i cents', (amount, bp, expected) => {
    expect(applyRateHalfUp(amount, bp)).toBe(expected);
  });

  it('refuses fractional or negative amounts', () => {
    expect(() => applyRateHalfUp(10.5, 100)).toThrow(RangeError);
    expect(() => applyRateHalfUp(-1, 100)).toThrow(RangeError);
  });

  it('never differs from the exact value by more than half a cent', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 1_000_000_000 }), fc.integer({ min: 0, max: 10_000 }), (amount, bp) => {
        const exact = (amount * bp) / 10_000;
        const rounded = applyRateHalfUp(amount, bp);
        expect(Math.abs(rounded - exact)).toBeLessThanOrEqual(0.5);
        expect(Number.isInteger(rounded)).toBe(true);
      }),
    );
  });
});

describe('percentToBp', () => {
  it('turns two-decimal percentages into whole basis points despite binary fractions', () => {
    // 0.07 * 100 is 7.000000000000001 in binary floating point.
    expect(percentToBp(0.07)).toBe(7);
    expect(percentToBp(7.25)).toBe(725);
    expect(percentToBp(50)).toBe(5000);
  });
});

describe('quoteTotals', () => {
  it('works a rack quote by hand: items, a 10 % discount, 6.5 % tax and a 50 % deposit', () => {
    // items: 1 x $1,480.00 + 2 x $45.00 + $75.00 delivery = $1,645.00
    // discount 10 % = $164.50; taxable $1,480.50; tax 6.5 % = 9 623.25 cents -> $96.23
    // total $1,576.73; deposit 50 % = 78 836.5 cents -> $788.37 (half-up)
    const totals = quoteTotals(
      [
        { kind: 'rack', quantity: 1, unitPriceCents: 148000 },
        { kind: 'item', quantity: 2, unitPriceCents: 4500 },
        { kind: 'delivery', quantity: 1, unitPriceCents: 7500 },
      ],
      { taxRateBp: 650, discountBp: 1000, depositBp: 5000 },
    );
    expect(totals).toEqual({ itemsCents: 164500, discountCents: 16450, taxCents: 9623, totalCents: 157673, depositCents: 78837 });
  });

  it('subtracts discount lines before tax and never goes below zero', () => {
    const some = quoteTotals(
      [
        { kind: 'item', quantity: 1, unitPriceCents: 10000 },
        { kind: 'discount', quantity: 1, unitPriceCents: 2500 },
      ],
      { taxRateBp: 1000, discountBp: 0, depositBp: 5000 },
    );
    // $100 - $25 = $75; 10 % tax = $7.50; total $82.50; deposit $41.25
    expect(some).toEqual({ itemsCents: 10000, discountCents: 2500, taxCents: 750, totalCents: 8250, depositCents: 4125 });
    const tooMuch = quoteTotals(
      [
        { kind: 'item', quantity: 1, unitPriceCents: 1000 },
        { kind: 'discount', quantity: 3, unitPriceCents: 1000 },
      ],
      { taxRateBp: 1000, discountBp: 0, depositBp: 5000 },
    );
    expect(tooMuch.totalCents).toBe(0);
    expect(tooMuch.discountCents).toBe(1000);
  });

  it('keeps total = items - discount + tax and deposit <= total for any lines', () => {
    const line = fc.record({
      kind: fc.constantFrom('rack' as const, 'item' as const, 'labor' as const, 'delivery' as const, 'discount' as const),
      quantity: fc.integer({ min: 1, max: 50 }),
      unitPriceCents: fc.integer({ min: 0, max: 500_000 }),
    });
    const rate = fc.integer({ min: 0, max: 10_000 });
    fc.assert(
      fc.property(fc.array(line, { minLength: 1, maxLength: 20 }), rate, rate, rate, (lines, taxRateBp, discountBp, depositBp) => {
        const t = quoteTotals(lines, { taxRateBp, discountBp, depositBp });
        expect(t.totalCents).toBe(t.itemsCents - t.discountCents + t.taxCents);
        expect(t.discountCents).toBeLessThanOrEqual(t.itemsCents);
        expect(t.depositCents).toBeLessThanOrEqual(t.totalCents);
        expect(t.totalCents).toBeGreaterThanOrEqual(0);
      }),
    );
  });
});
