import { Router } from 'express';
import { IdParams } from '../../../../shared/api/common.js';
import type { Knex } from 'knex';
import { CreateOrderRequest, OrderListQuery, StageChangeRequest, UpdateOrderRequest, type OrderStatus } from '../../../../shared/api/orders.js';
import { json } from '../../../common/src/async-handler.js';
import { ApiError, ForbiddenError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import type { RecordsDeps } from '../app.js';
import { audit } from '../audit/audit-log.js';
import { nowIso } from '../db/knex.js';
import { removeFromTub } from '../collection/racks/racks-store.js';
import { itemToRow } from '../lib/resource-routes.js';
import { listPage } from '../lib/list.js';
import { idempotent } from './idempotency.js';
import { notifyOrder } from './mail-notices.js';
import { checkStageChange, CUSTOMER_NOTICES, isProductionStage } from './order-flow.js';
import { enterStage, findOrder, ORDER_COLUMNS, ordersQuery, toOrderSummary } from './orders-store.js';
import { acceptQuote, actorOf } from './quotes-routes.js';

export const ORDER_READ_ROLES = ['owner', 'sales', 'builder'] as const;
export const ORDER_WRITE_ROLES = ['owner', 'sales'] as const;

/** The order book and the production board: orders, their delivery details and stage changes. */
/**
 * Stock set aside for an order stops being held once the order is finished: a cancelled order's
 * pieces go back to free stock; a handed-over order used them, so they leave the stock count.
 */
async function settleReservations(trx: Knex, orderId: number, stage: OrderStatus): Promise<void> {
  if (stage !== 'cancelled' && stage !== 'delivered' && stage !== 'picked_up') return;
  const held = (await trx('stock_reservations').where({ order_id: orderId })) as { stock_item_id: number; quantity: number }[];
  if (stage !== 'cancelled') {
    for (const r of held) await trx('stock_items').where({ id: r.stock_item_id }).update({ quantity: trx.raw('CASE WHEN quantity > ? THEN quantity - ? ELSE 0 END', [r.quantity, r.quantity]), updated_at: nowIso() });
  }
  await trx('stock_reservations').where({ order_id: orderId }).delete();
}

/** Animals sold on the order leave the collection when it is handed over: sold, off the for-sale list, out of their tubs (history kept). */
async function handOverAnimals(trx: Knex, quoteId: number): Promise<void> {
  const lines = (await trx('quote_lines').where({ quote_id: quoteId }).whereNotNull('animal_id').select('animal_id')) as { animal_id: number }[];
  const now = nowIso();
  for (const { animal_id: animalId } of lines) {
    await trx('animals').where({ id: animalId }).update({ status: 'sold', for_sale: false, updated_at: now });
    await removeFromTub(trx, animalId, now);
  }
}

export function orderBookRoutes(deps: RecordsDeps): Router {
  const { db } = deps;
  const router = Router();
  const base = '/api/v1/orders';

  router.get(
    base,
    allow(...ORDER_READ_ROLES),
    json(async (req) => {
      const query = parseOrThrow(OrderListQuery, req.query, 'query');
      let rows = ordersQuery(db);
      if (query.status) rows = rows.where('orders.status', query.status);
      if (query.customerId) rows = rows.where('orders.customer_id', query.customerId);
      return listPage(rows, query, { columns: ORDER_COLUMNS, searchColumns: ['orders.number', 'customers.name'], defaultSort: '-createdAt', toItem: toOrderSummary });
    }),
  );

  router.post(
    base,
    allow(...ORDER_WRITE_ROLES),
    json(async (req, res) =>
      idempotent(db, req, res, async () => {
        const { quoteId, ...delivery } = parseOrThrow(CreateOrderRequest, req.body);
        return { status: 201, body: await acceptQuote(deps, req, quoteId, delivery) };
      }),
    ),
  );

  router.get(
    `${base}/:id`,
    allow(...ORDER_READ_ROLES),
    json(async (req) => findOrder(db, parseOrThrow(IdParams, req.params).id)),
  );

  router.patch(
    `${base}/:id`,
    allow(...ORDER_WRITE_ROLES),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const body = parseOrThrow(UpdateOrderRequest, req.body);
      await findOrder(db, id);
      await db('orders').where({ id }).update({ ...itemToRow(body), updated_at: nowIso() });
      await audit(db, req.identity, 'update', 'order', id, body);
      return findOrder(db, id);
    }),
  );

  router.post(
    `${base}/:id/stage`,
    allow(...ORDER_READ_ROLES),
    json(async (req) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const { stage, note } = parseOrThrow(StageChangeRequest, req.body);
      if (req.identity?.role === 'builder' && !isProductionStage(stage)) {
        throw new ForbiddenError(`A builder moves orders through ${['cutting', 'assembly', 'wiring', 'testing', 'ready'].join(', ')}; ${stage} is for owner or sales.`);
      }
      await db.transaction(async (trx) => {
        const order = await findOrder(trx, id);
        const refusal = checkStageChange(order, stage);
        if (refusal?.reason === 'out_of_order') {
          throw new ApiError(409, 'stage_out_of_order', `Order ${order.number} is ${order.status}; it can move to ${refusal.allowed.join(', ') || 'no other stage'}.`, 'stage', { allowed: refusal.allowed });
        }
        if (refusal?.reason === 'balance_due') {
          throw new ApiError(409, 'balance_due', `Order ${order.number} still owes ${refusal.balanceCents} cents; take the balance before closing it.`, 'stage', { balanceCents: refusal.balanceCents });
        }
        await enterStage(trx, id, stage, actorOf(req), note);
        await settleReservations(trx, id, stage);
        if (stage === 'delivered' || stage === 'picked_up') await handOverAnimals(trx, order.quoteId);
        // A cancelled order's unpaid invoice keeps its number (no gaps) and is voided.
        if (stage === 'cancelled') await trx('invoices').where({ order_id: id, status: 'open' }).update({ status: 'void', updated_at: nowIso() });
      });
      await audit(db, req.identity, 'stage', 'order', id, { stage });
      const order = await findOrder(db, id);
      const notice = CUSTOMER_NOTICES[stage];
      if (notice) await notifyOrder(db, deps.mailer, notice, order);
      return order;
    }),
  );

  return router;
}
