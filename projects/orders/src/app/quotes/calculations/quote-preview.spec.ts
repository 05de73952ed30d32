import { applyRateHalfUp, previewTotals } from './quote-preview';

describe('previewTotals', () => {
  it('matches the worked example of the records service (10 % off, 6.5 % tax, 50 % deposit)', () => {
    // Worked by hand in services/records/src/orders/quote-totals.spec.ts:
    // items $1,645.00; discount $164.50; tax 9 623.25 cents -> $96.23; total $1,576.73; deposit 78 836.5 -> $788.37 (half-up)
    const preview = previewTotals(
      [
        { kind: 'rack', quantity: 1, unitPriceCents: 148000 },
        { kind: 'item', quantity: 2, unitPriceCents: 4500 },
        { kind: 'delivery', quantity: 1, unitPriceCents: 7500 },
      ],
      { taxRatePercent: 6.5, discountPercent: 10, depositPercent: 50 },
    );
    expect(preview).toEqual({ itemsCents: 164500, discountCents: 16450, taxCents: 9623, totalCents: 157673, depositCents: 78837, complete: true });
  });

  it('leaves out lines the server prices and says so', () => {
    const preview = previewTotals(
      [
        { kind: 'rack', quantity: 1, unitPriceCents: null },
        { kind: 'item', quantity: 1, unitPriceCents: 10000 },
      ],
      { taxRatePercent: 0, discountPercent: 0, depositPercent: 50 },
    );
    expect(preview).toMatchObject({ itemsCents: 10000, totalCents: 10000, depositCents: 5000, complete: false });
  });

  it('subtracts discount lines and stops at zero', () => {
    const preview = previewTotals(
      [
        { kind: 'item', quantity: 1, unitPriceCents: 1000 },
        { kind: 'discount', quantity: 1, unitPriceCents: 2500 },
      ],
      { taxRatePercent: 10, discountPercent: 0, depositPercent: 50 },
    );
    expect(preview).toMatchObject({ itemsCents: 1000, discountCents: 1000, taxCents: 0, totalCents: 0 });
  });

  it('rounds half a cent up (common practice for sales tax)', () => {
    // 5 % of 10 cents = 0.5 cent -> 1; 5 % of 9 cents = 0.45 cent -> 0
    expect(applyRateHalfUp(10, 500)).toBe(1);
    expect(applyRateHalfUp(9, 500)).toBe(0);
  });
});
