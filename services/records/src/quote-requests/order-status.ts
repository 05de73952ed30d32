import type { Knex } from 'knex';
import type { z } from 'zod';
import type { OrderStatus } from '../../../../shared/api/quote-requests.js';
import { NotFoundError } from '../../../common/src/errors.js';
import { todayIso } from '../orders/quotes-store.js';

type OrderStatusItem = z.output<typeof OrderStatus>;

/**
 * Status of a quote or order by its number, with no names, addresses or amounts beyond the deposit.
 * `onlyCreatedBy` limits the answer to quotes that actor created (and orders made from them), so
 * an API key cannot walk the shop's sequential numbers; anything else reads as unknown.
 */
export async function statusByReference(db: Knex, reference: string, onlyCreatedBy?: string): Promise<OrderStatusItem> {
  const unknown = () => new NotFoundError(`No quote or order ${reference}.`);
  if (reference.startsWith('Q-')) {
    let rows = db('quotes').leftJoin('orders', 'orders.quote_id', 'quotes.id').where('quotes.number', reference).whereNull('quotes.deleted_at');
    if (onlyCreatedBy !== undefined) rows = rows.where('quotes.created_by', onlyCreatedBy);
    const row = (await rows.first('quotes.status', 'quotes.valid_until', 'quotes.updated_at', 'orders.number as order_number')) as
      | { status: string; valid_until: string; updated_at: string; order_number: string | null }
      | undefined;
    if (!row) throw unknown();
    // The orders area marks a sent quote expired only when someone tries to accept it; say so now.
    const status = row.status === 'sent' && row.valid_until < todayIso() ? 'expired' : row.status;
    return {
      reference,
      kind: 'quote',
      status: status as OrderStatusItem['status'],
      updatedAt: row.updated_at,
      ...(row.order_number && { orderReference: row.order_number }),
    };
  }
  let rows = db('orders').join('quotes', 'quotes.id', 'orders.quote_id').where('orders.number', reference).whereNull('orders.deleted_at');
  if (onlyCreatedBy !== undefined) rows = rows.where('quotes.created_by', onlyCreatedBy);
  const order = (await rows.first('orders.id', 'orders.status', 'orders.updated_at', 'orders.deposit_due_cents', 'orders.paid_cents')) as
    | { id: number; status: string; updated_at: string; deposit_due_cents: number; paid_cents: number }
    | undefined;
  if (!order) throw unknown();
  const stages = (await db('order_stages').where({ order_id: order.id }).orderBy('id').select('stage', 'started_at')) as { stage: string; started_at: string }[];
  return {
    reference,
    kind: 'order',
    status: order.status as OrderStatusItem['status'],
    updatedAt: order.updated_at,
    stages: stages.map((s) => ({ stage: s.stage as NonNullable<OrderStatusItem['stages']>[number]['stage'], at: s.started_at })),
    deposit: { dueCents: order.deposit_due_cents, paidCents: order.paid_cents },
  };
}
