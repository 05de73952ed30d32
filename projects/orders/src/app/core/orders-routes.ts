import { ListDefaults, ListQuery, Role, parseListPath, toListPath } from '@tubwright/kit';
import type { OrderStatus, QuoteStatus, StockKind } from './orders-types';
import { ORDER_STATUSES, QUOTE_STATUSES } from './statuses';
import { STOCK_KINDS } from './stock-materials';

/*
 * The module's pages as sub-paths the shell passes in `path` (the shell owns the address bar):
 *   '' | customers[?q&sort…]       customer list (a builder's home is the production board)
 *   customers/new                  new customer
 *   customers/12                   one customer: details, quotes, orders, payments, mail
 *   customers/12/edit              change a customer
 *   quotes[?q&sort&status]         quote list
 *   quotes/new[?customer=12]       new quote
 *   quotes/7                       one quote
 *   quotes/7/edit                  change a draft quote
 *   orders[?q&sort&status]         order list
 *   orders/5                       one order: stages, payments, invoice, doorway check
 *   production                     the production board
 *   cutting[?orders=5,6]           batch cutting plan for several orders
 *   stock[?kind=sheet]             sheets, boards and hardware on hand, set aside and free
 *   stock/new[?kind=sheet&offcut=1] add stock (or record an offcut)
 *   stock/9                        one stock item: change it, what is set aside, remove it
 *   settings                       tax, deposit, delivery fee, validity
 */

export type Section = 'customers' | 'quotes' | 'orders' | 'production' | 'cutting' | 'stock' | 'settings';

export type OrdersView =
  | { page: 'customers'; query: ListQuery }
  | { page: 'customer'; id: number }
  | { page: 'customer-form'; id: number | null }
  | { page: 'quotes'; query: ListQuery; status: QuoteStatus | null }
  | { page: 'quote'; id: number }
  | { page: 'quote-form'; id: number | null; customerId: number | null }
  | { page: 'orders'; query: ListQuery; status: OrderStatus | null }
  | { page: 'order'; id: number }
  | { page: 'production' }
  | { page: 'cutting'; orderIds: number[] }
  | { page: 'stock'; kind: StockKind | null }
  | { page: 'stock-item'; id: number | null; kind: StockKind | null; offcut: boolean }
  | { page: 'settings' }
  | { page: 'missing'; route: string };

export const CUSTOMER_LIST_DEFAULTS: ListDefaults = { sort: 'name', limit: 25 };
export const QUOTE_LIST_DEFAULTS: ListDefaults = { sort: '-createdAt', limit: 25 };
export const ORDER_LIST_DEFAULTS: ListDefaults = { sort: '-createdAt', limit: 25 };

/** Which sections each role sees, in navigation order; the API enforces the same. */
const ACCESS: Record<Role, readonly Section[]> = {
  owner: ['customers', 'quotes', 'orders', 'production', 'cutting', 'stock', 'settings'],
  sales: ['customers', 'quotes', 'orders', 'production', 'stock', 'settings'],
  builder: ['production', 'cutting', 'stock', 'orders'],
  keeper: [],
};

export function sectionsFor(role: Role | null): readonly Section[] {
  return role ? (ACCESS[role] ?? []) : [];
}

export function parseOrdersPath(path: string, role: Role | null = null): OrdersView {
  const [route = '', search = ''] = splitPath(path);
  const params = new URLSearchParams(search);
  const parts = route ? route.split('/') : [];
  const [head = '', second, third] = parts;
  const id = second !== undefined ? toId(second) : null;
  const missing: OrdersView = { page: 'missing', route };

  if (parts.length === 0) {
    return role === 'builder' ? { page: 'production' } : { page: 'customers', query: parseListPath(path, CUSTOMER_LIST_DEFAULTS).query };
  }
  switch (head) {
    case 'customers':
      if (parts.length === 1) return { page: 'customers', query: parseListPath(path, CUSTOMER_LIST_DEFAULTS).query };
      if (second === 'new' && parts.length === 2) return { page: 'customer-form', id: null };
      if (id === null) return missing;
      if (parts.length === 2) return { page: 'customer', id };
      return third === 'edit' && parts.length === 3 ? { page: 'customer-form', id } : missing;
    case 'quotes':
      if (parts.length === 1) {
        return { page: 'quotes', query: parseListPath(path, QUOTE_LIST_DEFAULTS).query, status: oneOf(params.get('status'), QUOTE_STATUSES) };
      }
      if (second === 'new' && parts.length === 2) return { page: 'quote-form', id: null, customerId: toId(params.get('customer') ?? '') };
      if (id === null) return missing;
      if (parts.length === 2) return { page: 'quote', id };
      return third === 'edit' && parts.length === 3 ? { page: 'quote-form', id, customerId: null } : missing;
    case 'orders':
      if (parts.length === 1) {
        return { page: 'orders', query: parseListPath(path, ORDER_LIST_DEFAULTS).query, status: oneOf(params.get('status'), ORDER_STATUSES) };
      }
      return id !== null && parts.length === 2 ? { page: 'order', id } : missing;
    case 'production':
      return parts.length === 1 ? { page: 'production' } : missing;
    case 'cutting':
      if (parts.length !== 1) return missing;
      return { page: 'cutting', orderIds: (params.get('orders') ?? '').split(',').map(toId).filter((n): n is number => n !== null) };
    case 'stock': {
      const kind = oneOf(params.get('kind'), STOCK_KINDS);
      if (parts.length === 1) return { page: 'stock', kind };
      if (second === 'new' && parts.length === 2) return { page: 'stock-item', id: null, kind, offcut: params.get('offcut') === '1' };
      return id !== null && parts.length === 2 ? { page: 'stock-item', id, kind: null, offcut: false } : missing;
    }
    case 'settings':
      return parts.length === 1 ? { page: 'settings' } : missing;
    default:
      return missing;
  }
}

/** The navigation entry a page belongs to. */
export function sectionOf(view: OrdersView): Section | null {
  switch (view.page) {
    case 'customers':
    case 'customer':
    case 'customer-form':
      return 'customers';
    case 'quotes':
    case 'quote':
    case 'quote-form':
      return 'quotes';
    case 'orders':
    case 'order':
      return 'orders';
    case 'stock':
    case 'stock-item':
      return 'stock';
    case 'missing':
      return null;
    default:
      return view.page;
  }
}

/** A list page's sub-path: its query (defaults left out), then its status filter. */
export function listPath(route: 'customers' | 'quotes' | 'orders', query: ListQuery, status: string | null = null): string {
  const defaults = route === 'customers' ? CUSTOMER_LIST_DEFAULTS : route === 'quotes' ? QUOTE_LIST_DEFAULTS : ORDER_LIST_DEFAULTS;
  const path = toListPath(route, query, defaults);
  if (!status) return path;
  return `${path}${path.includes('?') ? '&' : '?'}status=${encodeURIComponent(status)}`;
}

function splitPath(path: string): [string, string] {
  const at = path.indexOf('?');
  const route = (at < 0 ? path : path.slice(0, at)).replace(/^\/+|\/+$/g, '');
  return [route, at < 0 ? '' : path.slice(at + 1)];
}

function toId(text: string): number | null {
  return /^[1-9]\d{0,9}$/.test(text) ? Number(text) : null;
}

function oneOf<T extends string>(value: string | null, allowed: readonly T[]): T | null {
  return value !== null && (allowed as readonly string[]).includes(value) ? (value as T) : null;
}
