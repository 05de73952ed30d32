/**
 * Quote arithmetic in integer cents. Rates arrive as basis points (1 % = 100 bp) so no
 * floating-point value ever reaches a sum; every rounding is half-up to the cent (common practice
 * for sales tax; the shop's rule is noted in its settings).
 */

export type LineKind = 'rack' | 'item' | 'labor' | 'delivery' | 'discount';

export interface PricedLine {
  kind: LineKind;
  quantity: number;
  unitPriceCents: number;
}

export interface QuoteRates {
  taxRateBp: number;
  discountBp: number;
  depositBp: number;
}

export interface QuoteTotals {
  itemsCents: number;
  discountCents: number;
  taxCents: number;
  totalCents: number;
  depositCents: number;
}

/** amount x bp / 10 000, rounded half-up; amounts here are never negative. */
export function applyRateHalfUp(amountCents: number, bp: number): number {
  if (!Number.isSafeInteger(amountCents) || amountCents < 0) throw new RangeError(`amountCents must be a whole, non-negative number: ${amountCents}`);
  if (!Number.isInteger(bp) || bp < 0) throw new RangeError(`bp must be a whole, non-negative number: ${bp}`);
  // Integer division with a half-up remainder: exact for any amount below 2^53 / 10 000.
  const product = amountCents * bp;
  const whole = Math.floor(product / 10_000);
  return product - whole * 10_000 >= 5_000 ? whole + 1 : whole;
}

/** Percent with at most two decimals (e.g. 7.25) to basis points (725). */
export function percentToBp(percent: number): number {
  return Math.round(percent * 100);
}

export function bpToPercent(bp: number): number {
  return bp / 100;
}

/** Signed line amount: discount lines subtract. */
export function lineAmountCents(line: PricedLine): number {
  const amount = line.quantity * line.unitPriceCents;
  return line.kind === 'discount' ? -amount : amount;
}

export function quoteTotals(lines: readonly PricedLine[], rates: QuoteRates): QuoteTotals {
  let itemsCents = 0;
  let lineDiscountCents = 0;
  for (const line of lines) {
    const amount = lineAmountCents(line);
    if (amount < 0) lineDiscountCents -= amount;
    else itemsCents += amount;
  }
  // A discount larger than the items would make a negative quote: it stops at zero.
  const discountCents = Math.min(itemsCents, lineDiscountCents + applyRateHalfUp(itemsCents, rates.discountBp));
  const taxableCents = itemsCents - discountCents;
  const taxCents = applyRateHalfUp(taxableCents, rates.taxRateBp);
  const totalCents = taxableCents + taxCents;
  return { itemsCents, discountCents, taxCents, totalCents, depositCents: applyRateHalfUp(totalCents, rates.depositBp) };
}
