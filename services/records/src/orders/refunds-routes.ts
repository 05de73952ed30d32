import { Router } from 'express';
import type { Knex } from 'knex';
import type { z } from 'zod';
import { IdParams } from '../../../../shared/api/common.js';
import { CreateRefundRequest, type Refund } from '../../../../shared/api/orders.js';
import { json } from '../../../common/src/async-handler.js';
import { ConflictError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import type { RecordsDeps } from '../app.js';
import { audit } from '../audit/audit-log.js';
import { insertId, nowIso } from '../db/knex.js';
import { idempotent } from './idempotency.js';
import { findOrder } from './orders-store.js';
import { PAYMENT_ROLES } from './payments-routes.js';
import { providerError } from './provider-error.js';
import { actorOf } from './quotes-routes.js';

type RefundItem = z.output<typeof Refund>;
type Row = Record<string, any>;

function toRefund(row: Row): RefundItem {
  return {
    id: row.id,
    orderId: row.order_id,
    paymentId: row.payment_id,
    amountCents: row.amount_cents,
    currency: row.currency,
    status: row.status,
    providerId: row.provider_id ?? null,
    reason: row.reason,
    refundedAt: row.refunded_at ?? null,
    createdBy: row.created_by,
    createdAt: row.created_at,
  };
}

/** Each paid payment with what can still go back on it: paid, less refunds succeeded or under way. Newest first. */
async function refundable(db: Knex, orderId: number): Promise<{ payment: Row; leftCents: number }[]> {
  const payments = (await db('payments').where({ order_id: orderId, status: 'succeeded' }).orderBy('id', 'desc')) as Row[];
  const pending = (await db('refunds').where({ order_id: orderId, status: 'pending' })) as Row[];
  return payments
    .map((payment) => {
      const underWay = pending.filter((r) => r.payment_id === payment.id).reduce((sum, r) => sum + r.amount_cents, 0);
      return { payment, leftCents: payment.amount_cents - payment.refunded_cents - underWay };
    })
    .filter((p) => p.leftCents > 0);
}

/**
 * Money back to the customer through the provider's SDK, spread over the order's payments newest
 * first. The refund is recorded before the provider is asked (its event may arrive before its
 * answer) and counted on the order only when the provider's signed event says it succeeded.
 */
export function refundsRoutes(deps: RecordsDeps): Router {
  const { db } = deps;
  const router = Router();

  router.get(
    '/api/v1/orders/:id/refunds',
    allow(...PAYMENT_ROLES),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await findOrder(db, id);
      return { items: ((await db('refunds').where({ order_id: id }).orderBy('id')) as Row[]).map(toRefund) };
    }),
  );

  router.post(
    '/api/v1/orders/:id/refunds',
    allow(...PAYMENT_ROLES),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(CreateRefundRequest, req.body ?? {});
      const order = await findOrder(db, id);
      return idempotent(db, req, res, async () => {
        const sources = await refundable(db, id);
        const available = sources.reduce((sum, s) => sum + s.leftCents, 0);
        if (available === 0) throw new ConflictError(`Order ${order.number} has no paid money left to refund.`, 'amountCents');
        const wanted = body.amountCents ?? available;
        if (wanted > available) throw new ConflictError(`At most ${available} cents can be refunded on order ${order.number}.`, 'amountCents');
        const made: number[] = [];
        let left = wanted;
        for (const { payment, leftCents } of sources) {
          if (left === 0) break;
          const amount = Math.min(left, leftCents);
          left -= amount;
          const now = nowIso();
          const refundId = await insertId(db('refunds'), {
            order_id: id,
            payment_id: payment.id,
            amount_cents: amount,
            currency: payment.currency,
            status: 'pending',
            reason: body.reason,
            created_by: actorOf(req),
            created_at: now,
            updated_at: now,
          });
          made.push(refundId!);
          try {
            const refund = await deps.payments.client.refunds.create({
              payment_intent: payment.via === 'checkout' ? payment.intent_id : payment.provider_id,
              amount,
              reason: 'requested_by_customer',
              metadata: { refund_id: String(refundId), order_id: String(id) },
            });
            await db('refunds').where({ id: refundId }).whereNull('provider_id').update({ provider_id: refund.id, updated_at: nowIso() });
          } catch (err) {
            await db('refunds').where({ id: refundId }).update({ status: 'failed', updated_at: nowIso() });
            throw providerError(err);
          }
        }
        await audit(db, req.identity, 'refund', 'order', id, { amountCents: wanted, reason: body.reason, refunds: made });
        const items = ((await db('refunds').whereIn('id', made).orderBy('id')) as Row[]).map(toRefund);
        return { status: 201, body: { items } };
      });
    }),
  );

  return router;
}
