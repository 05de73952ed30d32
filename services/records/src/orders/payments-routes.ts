import express, { Router } from 'express';
import type { Knex } from 'knex';
import Stripe from 'stripe';
import { IdParams } from '../../../../shared/api/common.js';
import { ConfirmPaymentRequest, CreatePaymentRequest } from '../../../../shared/api/orders.js';
import { json } from '../../../common/src/async-handler.js';
import { ApiError, ConflictError, ForbiddenError, NotFoundError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import type { RecordsDeps } from '../app.js';
import { audit } from '../audit/audit-log.js';
import { insertId, nowIso } from '../db/knex.js';
import { idempotent } from './idempotency.js';
import { notifyOrder } from './mail-notices.js';
import { enterStage, findOrder, orderPayments, toPayment } from './orders-store.js';
import { amountDue, startCheckout } from './checkout.js';
import { providerError } from './provider-error.js';
import { actorOf } from './quotes-routes.js';

export const PAYMENT_ROLES = ['owner', 'sales'] as const;
const WEBHOOK_ACTOR = 'payments-webhook';

async function findPayment(db: Knex, id: number) {
  const row = await db('payments').where({ id }).first();
  if (!row) throw new NotFoundError(`No payment with id ${id}.`);
  return row as Record<string, any>;
}

type ApplyOutcome = { duplicate: boolean; depositPaidOrderId: number | null; refundedOrderId: number | null };
type Row = Record<string, any>;

/** A payment the provider reports paid: counted once on the order, which leaves awaiting_deposit when the deposit is covered. */
async function markSucceeded(trx: Knex, payment: Row, now: string, raw: string, label: string, extra: Row, outcome: ApplyOutcome): Promise<void> {
  await trx('payments').where({ id: payment.id }).update({ status: 'succeeded', paid_at: now, raw_event_json: raw, failure_message: null, updated_at: now, ...extra });
  const order = await trx('orders').where({ id: payment.order_id }).first();
  const paid = order.paid_cents + payment.amount_cents;
  const balance = Math.max(0, order.total_cents - paid);
  await trx('orders').where({ id: order.id }).update({ paid_cents: paid, balance_cents: balance, updated_at: now });
  if (order.status === 'awaiting_deposit' && paid >= order.deposit_due_cents) {
    await enterStage(trx, order.id, 'deposit_paid', WEBHOOK_ACTOR, `Payment ${label}`, now);
    outcome.depositPaidOrderId = order.id;
  }
  if (balance === 0) await trx('invoices').where({ order_id: order.id, status: 'open' }).update({ status: 'paid', updated_at: now });
}

async function applyIntentEvent(trx: Knex, event: Stripe.Event, intent: Row, outcome: ApplyOutcome): Promise<void> {
  const payment = await trx('payments').where({ provider_id: intent.id }).first();
  // Intents made elsewhere (another app on the same account, or behind a checkout) are recorded and otherwise ignored.
  if (!payment || payment.status === 'succeeded') return;
  const now = nowIso();
  const raw = JSON.stringify(event);
  if (event.type === 'payment_intent.succeeded') {
    await markSucceeded(trx, payment, now, raw, intent.id, {}, outcome);
  } else if (event.type === 'payment_intent.payment_failed') {
    const message = (intent.last_payment_error as { message?: string } | null | undefined)?.message ?? 'Payment failed.';
    await trx('payments').where({ id: payment.id }).update({ status: 'failed', failure_message: message, raw_event_json: raw, updated_at: now });
  } else if (event.type === 'payment_intent.canceled') {
    await trx('payments').where({ id: payment.id }).update({ status: 'canceled', raw_event_json: raw, updated_at: now });
  }
}

async function applyCheckoutEvent(trx: Knex, event: Stripe.Event, session: Row, outcome: ApplyOutcome): Promise<void> {
  const payment = await trx('payments').where({ provider_id: session.id }).first();
  if (!payment || payment.status === 'succeeded') return;
  const now = nowIso();
  const raw = JSON.stringify(event);
  if (event.type === 'checkout.session.completed' && session.payment_status === 'paid') {
    await markSucceeded(trx, payment, now, raw, `${session.id} (checkout)`, { intent_id: session.payment_intent ?? null }, outcome);
  } else if (event.type === 'checkout.session.expired') {
    await trx('payments').where({ id: payment.id }).update({ status: 'canceled', failure_message: 'The payment page expired unpaid.', raw_event_json: raw, updated_at: now });
  }
}

/** A refund the provider reports: money leaves the order once, whatever order the events arrive in. */
async function applyRefundEvent(trx: Knex, refund: Row, outcome: ApplyOutcome): Promise<void> {
  const ownId = Number((refund.metadata as Row | undefined)?.refund_id);
  const row = (Number.isInteger(ownId) && (await trx('refunds').where({ id: ownId }).first())) || (await trx('refunds').where({ provider_id: refund.id }).first());
  if (!row || row.status === 'succeeded') return;
  const now = nowIso();
  if (refund.status === 'failed' || refund.status === 'canceled') {
    await trx('refunds').where({ id: row.id }).update({ status: 'failed', provider_id: refund.id, updated_at: now });
    return;
  }
  if (refund.status !== 'succeeded') return;
  await trx('refunds').where({ id: row.id }).update({ status: 'succeeded', provider_id: refund.id, refunded_at: now, updated_at: now });
  await trx('payments').where({ id: row.payment_id }).increment('refunded_cents', row.amount_cents);
  const order = await trx('orders').where({ id: row.order_id }).first();
  const paid = order.paid_cents - row.amount_cents;
  // A cancelled order owes nothing more; an open one owes again what was given back.
  const balance = order.status === 'cancelled' ? order.balance_cents : Math.max(0, order.total_cents - paid);
  await trx('orders').where({ id: order.id }).update({ paid_cents: paid, refunded_cents: order.refunded_cents + row.amount_cents, balance_cents: balance, updated_at: now });
  outcome.refundedOrderId = order.id;
}

/**
 * Applies one verified provider event exactly once: the event id is recorded in the same
 * transaction as its effect, and a payment already succeeded is never counted twice.
 */
export async function applyPaymentEvent(db: Knex, event: Stripe.Event): Promise<ApplyOutcome> {
  return db.transaction(async (trx) => {
    const outcome: ApplyOutcome = { duplicate: false, depositPaidOrderId: null, refundedOrderId: null };
    if (await trx('payment_events').where({ event_id: event.id }).first()) return { ...outcome, duplicate: true };
    const object = event.data.object as unknown as Row & { id: string };
    await trx('payment_events').insert({ event_id: event.id, type: event.type, provider_id: object.id ?? null, received_at: nowIso() });
    if (event.type.startsWith('payment_intent.')) await applyIntentEvent(trx, event, object, outcome);
    else if (event.type.startsWith('checkout.session.')) await applyCheckoutEvent(trx, event, object, outcome);
    else if (event.type.startsWith('refund.')) await applyRefundEvent(trx, object, outcome);
    return outcome;
  });
}

/** The provider's signed webhook; needs the raw body, so it mounts before the JSON parser. */
export function paymentWebhookRoutes(deps: RecordsDeps): Router {
  const router = Router();
  router.post(
    '/api/v1/payments/webhook',
    (req, _res, next) => next(req.identity?.role === 'system' ? undefined : new ForbiddenError('Only the payment provider posts here, through the gateway.')),
    express.raw({ type: () => true, limit: '512kb' }),
    json(async (req) => {
      const signature = req.header('stripe-signature');
      if (!signature) throw new ApiError(400, 'invalid_signature', 'The stripe-signature header is missing.', 'stripe-signature');
      let event: Stripe.Event;
      try {
        event = deps.payments.client.webhooks.constructEvent(Buffer.isBuffer(req.body) ? req.body : Buffer.alloc(0), signature, deps.payments.webhookSecret);
      } catch {
        throw new ApiError(400, 'invalid_signature', 'The webhook signature does not match this body; nothing was changed.', 'stripe-signature');
      }
      const outcome = await applyPaymentEvent(deps.db, event);
      if (outcome.depositPaidOrderId !== null) {
        await audit(deps.db, req.identity, 'deposit_paid', 'order', outcome.depositPaidOrderId, { event: event.id });
        await notifyOrder(deps.db, deps.mailer, 'deposit_received', await findOrder(deps.db, outcome.depositPaidOrderId));
      }
      if (outcome.refundedOrderId !== null) {
        await audit(deps.db, req.identity, 'refunded', 'order', outcome.refundedOrderId, { event: event.id });
        await notifyOrder(deps.db, deps.mailer, 'refund_issued', await findOrder(deps.db, outcome.refundedOrderId));
      }
      return { received: true as const, duplicate: outcome.duplicate };
    }),
  );
  return router;
}

/** Deposits and balances through the provider's SDK; the webhook, not the browser, marks them paid. */
export function paymentsRoutes(deps: RecordsDeps): Router {
  const { db } = deps;
  const router = Router();

  router.get(
    '/api/v1/orders/:id/payments',
    allow(...PAYMENT_ROLES),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      await findOrder(db, id);
      return { items: await orderPayments(db, id) };
    }),
  );

  router.post(
    '/api/v1/orders/:id/payments',
    allow(...PAYMENT_ROLES),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(CreatePaymentRequest, req.body ?? {});
      const order = await findOrder(db, id);
      return idempotent(db, req, res, async () => {
        const amountCents = amountDue(order, body.kind);
        if (body.via === 'checkout') {
          const paymentId = await startCheckout(deps, order, body.kind, amountCents, actorOf(req));
          await audit(db, req.identity, 'create', 'payment', paymentId, { orderId: id, kind: body.kind, amountCents, via: 'checkout' });
          return { status: 201, body: toPayment(await findPayment(db, paymentId)) };
        }
        let intent: Stripe.PaymentIntent;
        try {
          intent = await deps.payments.client.paymentIntents.create({
            amount: amountCents,
            currency: order.currency,
            description: `${body.kind === 'deposit' ? 'Deposit' : 'Balance'} for order ${order.number}`,
            metadata: { order_id: String(order.id), order_number: order.number, kind: body.kind },
          });
        } catch (err) {
          throw providerError(err);
        }
        const now = nowIso();
        const paymentId = await insertId(db('payments'), {
          order_id: id,
          provider_id: intent.id,
          via: 'card',
          kind: body.kind,
          amount_cents: amountCents,
          currency: order.currency,
          status: 'pending',
          created_by: actorOf(req),
          created_at: now,
          updated_at: now,
        });
        await audit(db, req.identity, 'create', 'payment', paymentId!, { orderId: id, kind: body.kind, amountCents, providerId: intent.id });
        return { status: 201, body: { ...toPayment(await findPayment(db, paymentId!)), clientSecret: intent.client_secret } };
      });
    }),
  );

  router.post(
    '/api/v1/payments/:id/confirm',
    allow(...PAYMENT_ROLES),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const { paymentMethod } = parseOrThrow(ConfirmPaymentRequest, req.body ?? {});
      const payment = await findPayment(db, id);
      if (payment.via === 'checkout') throw new ConflictError(`Payment ${id} is paid by the customer on the provider's page, not confirmed here.`);
      if (payment.status === 'succeeded' || payment.status === 'canceled') throw new ConflictError(`Payment ${id} is ${payment.status}.`);
      try {
        await deps.payments.client.paymentIntents.confirm(payment.provider_id, { payment_method: paymentMethod });
      } catch (err) {
        throw providerError(err);
      }
      await audit(db, req.identity, 'confirm', 'payment', id, { paymentMethod });
      // The status shown is what the provider's events have applied so far.
      return toPayment(await findPayment(db, id));
    }),
  );

  // A payment asked for and not wanted after all (a link sent by mistake, a card the customer will not use):
  // the provider closes it and its signed event marks it canceled, so the order can be paid another way.
  router.post(
    '/api/v1/payments/:id/cancel',
    allow(...PAYMENT_ROLES),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const payment = await findPayment(db, id);
      if (payment.status !== 'pending' && payment.status !== 'failed') throw new ConflictError(`Payment ${id} is ${payment.status}; only a pending one can be withdrawn.`);
      try {
        if (payment.via === 'checkout') await deps.payments.client.checkout.sessions.expire(payment.provider_id);
        else await deps.payments.client.paymentIntents.cancel(payment.provider_id);
      } catch (err) {
        throw providerError(err);
      }
      await audit(db, req.identity, 'cancel', 'payment', id, { via: payment.via });
      return toPayment(await findPayment(db, id));
    }),
  );

  return router;
}
