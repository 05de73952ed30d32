import type { PAYMENT_KINDS } from '../../../../shared/api/orders.js';
import { ConflictError } from '../../../common/src/errors.js';
import type { RecordsDeps } from '../app.js';
import { insertId, nowIso } from '../db/knex.js';
import type { OrderItem } from './orders-store.js';
import { providerError } from './provider-error.js';
import { quoteLinkToken, quoteLinkUrl } from './quote-link-token.js';

type PaymentKind = (typeof PAYMENT_KINDS)[number];

/** What a payment of this kind would ask now; 409 when nothing is due. */
export function amountDue(order: OrderItem, kind: PaymentKind): number {
  if (order.status === 'cancelled' || order.status === 'closed') throw new ConflictError(`Order ${order.number} is ${order.status}; it takes no payments.`);
  const amountCents = kind === 'deposit' ? order.depositDueCents - order.paidCents : order.balanceCents;
  if (amountCents <= 0) throw new ConflictError(kind === 'deposit' ? `The deposit of order ${order.number} is already paid.` : `Order ${order.number} owes nothing.`, 'kind');
  return amountCents;
}

/**
 * Opens a payment page at the provider for this order and records the payment as pending. The
 * customer comes back to their quote page; only the provider's signed event marks it paid.
 */
export async function startCheckout(deps: RecordsDeps, order: OrderItem, kind: PaymentKind, amountCents: number, actor: string): Promise<number> {
  const { db } = deps;
  const publicUrl = deps.publicUrl ?? 'http://127.0.0.1:4300';
  const quote = (await db('quotes').where({ id: order.quoteId }).first('id', 'number', 'sent_at')) as { id: number; number: string; sent_at: string | null } | undefined;
  const back = quote?.sent_at ? quoteLinkUrl(publicUrl, quoteLinkToken(deps.internalSecret, quote, quote.sent_at)) : new URL('/', publicUrl).href;
  const customer = (await db('customers').where({ id: order.customerId }).first('email')) as { email: string } | undefined;
  const what = `${kind === 'deposit' ? 'Deposit' : 'Balance'} for order ${order.number}`;
  let session: { id: string; url: string | null };
  try {
    session = await deps.payments.client.checkout.sessions.create({
      mode: 'payment',
      line_items: [{ price_data: { currency: order.currency, unit_amount: amountCents, product_data: { name: what } }, quantity: 1 }],
      ...(customer && { customer_email: customer.email }),
      client_reference_id: String(order.id),
      metadata: { order_id: String(order.id), order_number: order.number, kind },
      success_url: `${back}?payment=received`,
      cancel_url: `${back}?payment=cancelled`,
    });
  } catch (err) {
    throw providerError(err);
  }
  const now = nowIso();
  const id = await insertId(db('payments'), {
    order_id: order.id,
    provider_id: session.id,
    via: 'checkout',
    checkout_url: session.url,
    kind,
    amount_cents: amountCents,
    currency: order.currency,
    status: 'pending',
    created_by: actor,
    created_at: now,
    updated_at: now,
  });
  return id!;
}
