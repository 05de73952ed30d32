import { Router } from 'express';
import type { Knex } from 'knex';
import { IdParams } from '../../../../shared/api/common.js';
import { CreateStockItemRequest, CreateStockReservationRequest, StockItem, StockListQuery, StockReservationQuery, UpdateStockItemRequest } from '../../../../shared/api/stock.js';
import { json } from '../../../common/src/async-handler.js';
import { ConflictError, NotFoundError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import { audit } from '../audit/audit-log.js';
import { insertId, nowIso } from '../db/knex.js';
import { resourceRoutes } from '../lib/resource-routes.js';
import { actorOf } from '../orders/quotes-routes.js';

const READ = ['owner', 'builder', 'sales'] as const;
const WRITE = ['owner', 'builder'] as const;
type Row = Record<string, any>;

const toReservation = (row: Row) => ({
  id: row.id,
  stockItemId: row.stock_item_id,
  orderId: row.order_id,
  orderNumber: row.order_number,
  quantity: row.quantity,
  createdBy: row.created_by,
  createdAt: row.created_at,
});

async function reservedOf(db: Knex, stockItemId: number, exceptOrderId?: number): Promise<number> {
  const query = db('stock_reservations').where({ stock_item_id: stockItemId });
  if (exceptOrderId !== undefined) query.whereNot({ order_id: exceptOrderId });
  const row = (await query.sum({ n: 'quantity' }).first()) as { n: number | string | null } | undefined;
  return Number(row?.n ?? 0);
}

/**
 * The shop's stock of sheets, boards (offcuts among them) and hardware, and what is set aside for
 * each order. Batch cutting reads it to use offcuts first and to say what still has to be bought.
 */
export function stockRoutes(db: Knex): Router {
  const router = Router();
  router.use(
    resourceRoutes(db, {
      path: 'stock',
      table: 'stock_items',
      entity: 'stock item',
      fields: Object.keys(StockItem.shape),
      searchFields: ['material', 'description', 'location'],
      defaultSort: 'kind',
      read: [...READ],
      write: [...WRITE],
      listQuery: StockListQuery,
      filterFields: ['kind'],
      create: CreateStockItemRequest,
      update: UpdateStockItemRequest,
      fromRow: (item) => ({ ...item, offcut: Boolean(item.offcut) }),
    }),
  );

  router.get(
    '/api/v1/stock-reservations',
    allow(...READ),
    json(async (req) => {
      const query = parseOrThrow(StockReservationQuery, req.query);
      const rows = db('stock_reservations')
        .join('orders', 'orders.id', 'stock_reservations.order_id')
        .select('stock_reservations.*', 'orders.number as order_number')
        .orderBy('stock_reservations.id');
      if (query.orderId) rows.where('stock_reservations.order_id', query.orderId);
      if (query.stockItemId) rows.where('stock_reservations.stock_item_id', query.stockItemId);
      return { items: ((await rows) as Row[]).map(toReservation) };
    }),
  );

  // Setting aside for an order replaces what that order had of the item: the quantity is the new total.
  router.post(
    '/api/v1/stock-reservations',
    allow(...WRITE),
    json(async (req, res) => {
      const body = parseOrThrow(CreateStockReservationRequest, req.body ?? {});
      const item = (await db('stock_items').where({ id: body.stockItemId }).whereNull('deleted_at').first()) as Row | undefined;
      if (!item) throw new NotFoundError(`No stock item with id ${body.stockItemId}.`);
      const order = (await db('orders').where({ id: body.orderId }).whereNull('deleted_at').first('id', 'status', 'number')) as Row | undefined;
      if (!order) throw new NotFoundError(`No order with id ${body.orderId}.`);
      if (['closed', 'cancelled', 'delivered', 'picked_up'].includes(order.status)) throw new ConflictError(`Order ${order.number} is ${order.status}; nothing can be set aside for it.`, 'orderId');
      const free = item.quantity - (await reservedOf(db, item.id, order.id));
      if (body.quantity > free) throw new ConflictError(`Only ${free} of stock item ${item.id} are free to set aside.`, 'quantity');
      const now = nowIso();
      const existing = (await db('stock_reservations').where({ stock_item_id: item.id, order_id: order.id }).first('id')) as { id: number } | undefined;
      const id = existing
        ? (await db('stock_reservations').where({ id: existing.id }).update({ quantity: body.quantity, updated_at: now }), existing.id)
        : await insertId(db('stock_reservations'), { stock_item_id: item.id, order_id: order.id, quantity: body.quantity, created_by: actorOf(req), created_at: now, updated_at: now });
      await audit(db, req.identity, 'reserve', 'stock item', item.id, { orderId: order.id, quantity: body.quantity });
      res.status(existing ? 200 : 201);
      const row = await db('stock_reservations').join('orders', 'orders.id', 'stock_reservations.order_id').select('stock_reservations.*', 'orders.number as order_number').where('stock_reservations.id', id).first();
      return toReservation(row as Row);
    }),
  );

  router.delete(
    '/api/v1/stock-reservations/:id',
    allow(...WRITE),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const row = (await db('stock_reservations').where({ id }).first()) as Row | undefined;
      if (!row) throw new NotFoundError(`No stock reservation with id ${id}.`);
      await db('stock_reservations').where({ id }).delete();
      await audit(db, req.identity, 'release', 'stock item', row.stock_item_id, { orderId: row.order_id, quantity: row.quantity });
      res.status(204).end();
    }),
  );

  return router;
}
