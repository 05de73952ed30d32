import { Router } from 'express';
import { IdParams } from '../../../../shared/api/common.js';
import { CreateOrderRequest, OrderListQuery, StageChangeRequest, UpdateOrderRequest } from '../../../../shared/api/orders.js';
import { json } from '../../../common/src/async-handler.js';
import { ApiError, ForbiddenError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import type { RecordsDeps } from '../app.js';
import { audit } from '../audit/audit-log.js';
import { nowIso } from '../db/knex.js';
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
