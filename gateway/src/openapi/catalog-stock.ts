import { IdParams } from '../../../shared/api/common.js';
import {
  CreateStockItemRequest,
  CreateStockReservationRequest,
  StockItem,
  StockListQuery,
  StockPage,
  StockReservation,
  StockReservationList,
  StockReservationQuery,
  UpdateStockItemRequest,
} from '../../../shared/api/stock.js';
import { resourceDocs } from './catalog-foundation.js';
import { documentRoutes } from './route-catalog.js';

const READ = ['owner', 'builder', 'sales'] as const;
const WRITE = ['owner', 'builder'] as const;

documentRoutes(
  ...resourceDocs({ path: 'stock', tag: 'stock', noun: 'stock item', item: StockItem, page: StockPage, listQuery: StockListQuery, create: CreateStockItemRequest, update: UpdateStockItemRequest, read: [...READ], write: [...WRITE] }),
  {
    method: 'get', path: '/api/v1/stock-reservations', tag: 'stock', summary: 'What is set aside for orders', roles: [...READ], query: StockReservationQuery,
    success: { status: 200, schema: StockReservationList, description: 'Oldest first; filter by order or stock item' },
  },
  {
    method: 'post', path: '/api/v1/stock-reservations', tag: 'stock', summary: 'Set stock aside for an order', roles: [...WRITE], body: CreateStockReservationRequest,
    bodyExample: { stockItemId: 1, orderId: 1, quantity: 4 },
    success: { status: 201, schema: StockReservation, description: 'Set aside (200 when it replaced what the order had of this item)' }, errors: [404, 409],
    description: 'The quantity is the order\'s new total of this item. 409 naming `quantity` when more is asked than is free (on hand less what other orders hold), or naming `orderId` for an order already handed over, closed or cancelled.',
  },
  { method: 'delete', path: '/api/v1/stock-reservations/:id', tag: 'stock', summary: 'Release what was set aside', roles: [...WRITE], params: IdParams, success: { status: 204, description: 'Released' }, errors: [404] },
);
