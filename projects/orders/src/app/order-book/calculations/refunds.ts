import { formatCents, parseMoneyToCents } from '../../core/money';
import type { Refund } from '../../core/orders-types';

/**
 * What can still go back to the customer: paid (the order's paid figure already has succeeded
 * refunds taken off) less refunds the provider has not confirmed yet. Never below zero.
 */
export function refundableCents(paidCents: number, refunds: readonly Pick<Refund, 'amountCents' | 'status'>[]): number {
  const underWay = refunds.filter((r) => r.status === 'pending').reduce((sum, r) => sum + r.amountCents, 0);
  return Math.max(0, paidCents - underWay);
}

/** What is wrong with a typed refund amount, or null when it may be sent. */
export function refundAmountProblem(text: string, refundable: number, currency: string): string | null {
  if (!text.trim()) return 'Enter the amount to refund';
  const cents = parseMoneyToCents(text);
  if (cents === null) return 'Enter an amount like 250.00';
  if (cents === 0) return 'Enter an amount above 0';
  if (cents > refundable) return `At most ${formatCents(refundable, currency)} can be refunded`;
  return null;
}
