import type { Payment, Refund } from './orders-types';

/** How the money came: the customer's own payment page, or a card taken at the counter. */
export function viaLabel(via: Payment['via']): string {
  return via === 'checkout' ? 'Payment link' : 'Card in shop';
}

/** A payment's status as the shop says it: `Paid`, `Pending`, `Failed`, `Canceled`. */
export function paymentStatusLabel(payment: Pick<Payment, 'status'>): string {
  return payment.status === 'succeeded' ? 'Paid' : capitalise(payment.status);
}

/** A refund's status: `Refunded`, `Pending`, `Failed`. */
export function refundStatusLabel(refund: Pick<Refund, 'status'>): string {
  return refund.status === 'succeeded' ? 'Refunded' : capitalise(refund.status);
}

function capitalise(word: string): string {
  return word.charAt(0).toUpperCase() + word.slice(1);
}
