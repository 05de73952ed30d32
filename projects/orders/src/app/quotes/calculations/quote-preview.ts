import type { QuoteLineKind } from '../../core/orders-types';

/*
 * The quote's totals as the records service will compute them (services/records/src/orders/
 * quote-totals.ts): integer cents, rates in basis points, every rounding half-up to the cent.
 * Only a preview while editing: the saved quote's totals come from the server.
 */

export interface PreviewLine {
  kind: QuoteLineKind;
  quantity: number;
  /** Null when the server prices the line (a rack from a spec, a delivery at the shop's fee). */
  unitPriceCents: number | null;
}

export interface PreviewRates {
  taxRatePercent: number;
  discountPercent: number;
  depositPercent: number;
}

export interface QuotePreview {
  itemsCents: number;
  discountCents: number;
  taxCents: number;
  totalCents: number;
  depositCents: number;
  /** False when some line's price is only known once saved: the totals leave it out. */
  complete: boolean;
}

export function percentToBp(percent: number): number {
  return Math.round(percent * 100);
}

/** amount x bp / 10 000, half-up; amounts here are never negative. */
export function applyRateHalfUp(amountCents: number, bp: number): number {
  const product = amountCents * bp;
  const whole = Math.floor(product / 10_000);
  return product - whole * 10_000 >= 5_000 ? whole + 1 : whole;
}

export function previewTotals(lines: readonly PreviewLine[], rates: PreviewRates): QuotePreview {
  let itemsCents = 0;
  let lineDiscountCents = 0;
  let complete = true;
  for (const line of lines) {
    if (line.unitPriceCents === null) {
      complete = false;
      continue;
    }
    const amount = line.quantity * line.unitPriceCents;
    if (line.kind === 'discount') lineDiscountCents += amount;
    else itemsCents += amount;
  }
  const discountCents = Math.min(itemsCents, lineDiscountCents + applyRateHalfUp(itemsCents, percentToBp(rates.discountPercent)));
  const taxableCents = itemsCents - discountCents;
  const taxCents = applyRateHalfUp(taxableCents, percentToBp(rates.taxRatePercent));
  const totalCents = taxableCents + taxCents;
  return { itemsCents, discountCents, taxCents, totalCents, depositCents: applyRateHalfUp(totalCents, percentToBp(rates.depositPercent)), complete };
}
