import { Router } from 'express';
import type { Knex } from 'knex';
import type { z } from 'zod';
import type { OrderStatus } from '../../../../shared/api/orders.js';
import { CustomerQuote, QuoteLinkAcceptRequest, QuoteLinkParams } from '../../../../shared/api/quote-links.js';
import { json } from '../../../common/src/async-handler.js';
import { ConflictError, NotFoundError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import type { RecordsDeps } from '../app.js';
import { audit } from '../audit/audit-log.js';
import { nowIso } from '../db/knex.js';
import { shopName } from './mail-notices.js';
import { amountDue, startCheckout } from './checkout.js';
import { findOrder } from './orders-store.js';
import { quoteLinkMatches } from './quote-link-token.js';
import { acceptQuote } from './quotes-routes.js';
import { findQuote, type QuoteItem } from './quotes-store.js';

type CustomerQuoteView = z.output<typeof CustomerQuote>;

/**
 * The customer's side of a quote, reached by the link in the quote's e-mail with no account: see
 * it, accept it (which makes the order, as when sales record it) or decline it. The gateway lets
 * these paths through unsigned-in; the link's signature is the only key.
 */
export function quoteLinksRoutes(deps: RecordsDeps): Router {
  const { db } = deps;
  const router = Router();
  const base = '/api/v1/quote-links/:token';

  async function quoteFor(tokenParam: unknown): Promise<QuoteItem> {
    const { token } = parseOrThrow(QuoteLinkParams, { token: tokenParam });
    const number = token.slice(0, token.indexOf('.'));
    const row = (await db('quotes').where({ number }).whereNull('deleted_at').first('id')) as { id: number } | undefined;
    const quote = row && (await findQuote(db, row.id));
    // One answer for an unknown quote and a wrong signature: a link tells nothing it does not prove.
    if (!quote || !quoteLinkMatches(deps.internalSecret, token, quote)) throw new NotFoundError('This quote link is not valid (it may have been replaced by a newer e-mail); ask the shop for a new one.');
    return quote;
  }

  router.get(base, allow(), json(async (req) => customerView(db, await quoteFor(req.params['token']))));

  router.post(
    `${base}/accept`,
    allow(),
    json(async (req, res) => {
      const quote = await quoteFor(req.params['token']);
      if (quote.status !== 'sent') throw new ConflictError(`Quote ${quote.number} is ${quote.status}; it can no longer be accepted here.`);
      const body = parseOrThrow(QuoteLinkAcceptRequest, req.body ?? {});
      await acceptQuote(deps, req, quote.id, body);
      res.status(201);
      return customerView(db, await findQuote(db, quote.id));
    }),
  );

  router.post(
    `${base}/decline`,
    allow(),
    json(async (req) => {
      const quote = await quoteFor(req.params['token']);
      if (quote.status !== 'sent') throw new ConflictError(`Quote ${quote.number} is ${quote.status}; it can no longer be declined here.`);
      const now = nowIso();
      await db('quotes').where({ id: quote.id, status: 'sent' }).update({ status: 'declined', decided_at: now, updated_at: now });
      await audit(db, req.identity, 'decline (customer link)', 'quote', quote.id);
      return customerView(db, await findQuote(db, quote.id));
    }),
  );

  router.post(
    `${base}/pay`,
    allow(),
    json(async (req) => {
      const quote = await quoteFor(req.params['token']);
      if (!quote.orderId) throw new ConflictError(`Quote ${quote.number} is ${quote.status}; accept it first, then pay the deposit.`);
      const order = await findOrder(db, quote.orderId);
      if (order.status !== 'awaiting_deposit') throw new ConflictError(`Order ${order.number} is not waiting for a deposit.`);
      const amountCents = amountDue(order, 'deposit');
      // A second press (or a reload) reuses the page already opened for this amount.
      const open = (await db('payments')
        .where({ order_id: order.id, kind: 'deposit', via: 'checkout', status: 'pending', amount_cents: amountCents })
        .orderBy('id', 'desc')
        .first('checkout_url')) as { checkout_url: string | null } | undefined;
      if (open?.checkout_url) return { checkoutUrl: open.checkout_url };
      const paymentId = await startCheckout(deps, order, 'deposit', amountCents, 'customer-link');
      await audit(db, req.identity, 'create (customer link)', 'payment', paymentId, { orderId: order.id, kind: 'deposit', amountCents, via: 'checkout' });
      const row = (await db('payments').where({ id: paymentId }).first('checkout_url')) as { checkout_url: string };
      return { checkoutUrl: row.checkout_url };
    }),
  );

  return router;
}

async function customerView(db: Knex, quote: QuoteItem): Promise<CustomerQuoteView> {
  const order = quote.orderId
    ? ((await db('orders').where({ id: quote.orderId }).first('number', 'status', 'paid_cents', 'deposit_due_cents')) as { number: string; status: OrderStatus; paid_cents: number; deposit_due_cents: number } | undefined)
    : undefined;
  return {
    number: quote.number,
    shop: await shopName(db),
    customerName: quote.customerName,
    status: quote.status,
    validUntil: quote.validUntil,
    currency: quote.currency,
    lines: quote.lines.map((l) => ({ description: l.description, quantity: l.quantity, unitPriceCents: l.unitPriceCents, amountCents: l.amountCents })),
    itemsCents: quote.itemsCents,
    discountCents: quote.discountCents,
    taxCents: quote.taxCents,
    totalCents: quote.totalCents,
    depositCents: quote.depositCents,
    orderNumber: order?.number ?? null,
    orderStatus: order?.status ?? null,
    paidCents: order?.paid_cents ?? 0,
    depositDueNowCents: order && order.status === 'awaiting_deposit' ? Math.max(0, order.deposit_due_cents - order.paid_cents) : 0,
  };
}
