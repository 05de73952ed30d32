import type { Knex } from 'knex';
import type { z } from 'zod';
import type { Order, OrderStage, OrderStatus, OrderSummary, Payment } from '../../../../shared/api/orders.js';
import { ConflictError, NotFoundError } from '../../../common/src/errors.js';
import { insertId, nowIso } from '../db/knex.js';
import { nextNumber } from './numbering.js';
import { nextStages } from './order-flow.js';
import { todayIso } from './quotes-store.js';
import { applyStageEffects } from './stage-effects.js';

export type OrderItem = z.output<typeof Order>;
type OrderSummaryItem = z.output<typeof OrderSummary>;
type PaymentItem = z.output<typeof Payment>;

export const ORDER_COLUMNS: Record<string, string> = {
  number: 'orders.number',
  status: 'orders.status',
  deliveryDate: 'orders.delivery_date',
  totalCents: 'orders.total_cents',
  createdAt: 'orders.created_at',
  updatedAt: 'orders.updated_at',
};

export function ordersQuery(db: Knex): Knex.QueryBuilder {
  return db('orders')
    .join('customers', 'customers.id', 'orders.customer_id')
    .whereNull('orders.deleted_at')
    .select('orders.*', 'customers.name as customer_name');
}

export function toOrderSummary(row: Record<string, any>): OrderSummaryItem {
  return {
    id: row.id,
    number: row.number,
    quoteId: row.quote_id,
    customerId: row.customer_id,
    customerName: row.customer_name,
    status: row.status,
    currency: row.currency,
    totalCents: row.total_cents,
    depositDueCents: row.deposit_due_cents,
    paidCents: row.paid_cents,
    balanceCents: row.balance_cents,
    deliveryMethod: row.delivery_method,
    deliveryDate: row.delivery_date ?? null,
    deliveryAddress: row.delivery_address,
    doorwayHeightIn: row.doorway_height_in ?? null,
    refundedCents: row.refunded_cents ?? 0,
    notes: row.notes,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
  };
}

function toStage(row: Record<string, any>): z.output<typeof OrderStage> {
  return { id: row.id, stage: row.stage, startedAt: row.started_at, finishedAt: row.finished_at ?? null, by: row.by, note: row.note };
}

export function toPayment(row: Record<string, any>): PaymentItem {
  return {
    id: row.id,
    orderId: row.order_id,
    kind: row.kind,
    amountCents: row.amount_cents,
    currency: row.currency,
    status: row.status,
    via: row.via ?? 'card',
    providerId: row.provider_id ?? null,
    checkoutUrl: row.checkout_url ?? null,
    refundedCents: row.refunded_cents ?? 0,
    failureMessage: row.failure_message ?? null,
    paidAt: row.paid_at ?? null,
    createdAt: row.created_at,
  };
}

export async function findOrder(db: Knex, id: number): Promise<OrderItem> {
  const row = await ordersQuery(db).where('orders.id', id).first();
  if (!row) throw new NotFoundError(`No order with id ${id}.`);
  const stages = (await db('order_stages').where({ order_id: id }).orderBy('id')).map(toStage);
  const racks = (await db('quote_lines').where({ quote_id: row.quote_id, kind: 'rack' }).orderBy('position')).map((line: Record<string, any>) => ({
    description: line.description,
    planId: line.plan_id ?? null,
    spec: line.spec_json ? JSON.parse(line.spec_json) : null,
    quantity: line.quantity,
  }));
  return { ...toOrderSummary(row), stages, nextStages: [...nextStages(row.status)], racks };
}

export interface DeliveryInput {
  deliveryMethod: 'pickup' | 'delivery';
  deliveryDate?: string | null;
  deliveryAddress: string;
  doorwayHeightIn?: number | null;
  notes: string;
}

/** Marks the stage the order is leaving finished and opens the new one; the caller holds the transaction. */
export async function enterStage(trx: Knex, orderId: number, stage: OrderStatus, by: string, note = '', at = nowIso()): Promise<void> {
  await trx('order_stages').where({ order_id: orderId }).whereNull('finished_at').update({ finished_at: at, updated_at: at });
  await trx('order_stages').insert({ order_id: orderId, stage, started_at: at, by, note, created_at: at, updated_at: at });
  await trx('orders').where({ id: orderId }).update({ status: stage, updated_at: at });
  await applyStageEffects(trx, orderId, stage);
}

/** Accepting a sent, still valid quote makes its order, waiting for the deposit (or already paid when nothing is due). */
export async function orderFromQuote(db: Knex, quoteId: number, delivery: DeliveryInput, by: string): Promise<number> {
  const current = await db('quotes').where({ id: quoteId }).whereNull('deleted_at').first();
  if (!current) throw new NotFoundError(`No quote with id ${quoteId}.`);
  if (current.status === 'sent' && current.valid_until < todayIso()) {
    // Recorded outside the refused transaction so the quote shows why.
    await db('quotes').where({ id: quoteId, status: 'sent' }).update({ status: 'expired', updated_at: nowIso() });
    throw new ConflictError(`Quote ${current.number} expired on ${current.valid_until}; send a new one.`, 'quoteId');
  }
  return db.transaction(async (trx) => {
    const quote = await trx('quotes').where({ id: quoteId }).first();
    if (quote.status !== 'sent') throw new ConflictError(`Quote ${quote.number} is ${quote.status}; only a sent quote can be accepted.`, 'quoteId');
    const now = nowIso();
    const number = await nextNumber(trx, 'orders', 'O', new Date(now).getUTCFullYear());
    const orderId = await insertId(trx('orders'), {
      number,
      quote_id: quoteId,
      customer_id: quote.customer_id,
      status: 'awaiting_deposit',
      currency: quote.currency,
      total_cents: quote.total_cents,
      deposit_due_cents: quote.deposit_cents,
      paid_cents: 0,
      balance_cents: quote.total_cents,
      delivery_method: delivery.deliveryMethod,
      delivery_date: delivery.deliveryDate ?? null,
      delivery_address: delivery.deliveryAddress,
      doorway_height_in: delivery.doorwayHeightIn ?? null,
      notes: delivery.notes,
      created_at: now,
      updated_at: now,
    });
    await trx('quotes').where({ id: quoteId }).update({ status: 'accepted', decided_at: now, updated_at: now });
    await trx('order_stages').insert({ order_id: orderId, stage: 'awaiting_deposit', started_at: now, by, note: `Accepted quote ${quote.number}`, created_at: now, updated_at: now });
    if (quote.deposit_cents === 0) await enterStage(trx, orderId!, 'deposit_paid', by, 'No deposit asked', now);
    return orderId!;
  });
}

export async function orderPayments(db: Knex, orderId: number): Promise<PaymentItem[]> {
  return (await db('payments').where({ order_id: orderId }).orderBy('id')).map(toPayment);
}
