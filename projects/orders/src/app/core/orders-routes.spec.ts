import { listPath, parseOrdersPath, sectionOf, sectionsFor } from './orders-routes';

const query = { q: '', sort: 'name', offset: 0, limit: 25 };

describe('parseOrdersPath', () => {
  it('opens customers at the root for sales, the production board for a builder', () => {
    expect(parseOrdersPath('', 'sales')).toEqual({ page: 'customers', query });
    expect(parseOrdersPath('', 'builder')).toEqual({ page: 'production' });
    expect(parseOrdersPath('customers?q=priya&sort=-createdAt', 'owner')).toEqual({ page: 'customers', query: { ...query, q: 'priya', sort: '-createdAt' } });
  });

  it('reads record pages and forms', () => {
    expect(parseOrdersPath('customers/new')).toEqual({ page: 'customer-form', id: null });
    expect(parseOrdersPath('customers/12')).toEqual({ page: 'customer', id: 12 });
    expect(parseOrdersPath('customers/12/edit')).toEqual({ page: 'customer-form', id: 12 });
    expect(parseOrdersPath('quotes/new?customer=3')).toEqual({ page: 'quote-form', id: null, customerId: 3 });
    expect(parseOrdersPath('quotes/7/edit')).toEqual({ page: 'quote-form', id: 7, customerId: null });
    expect(parseOrdersPath('orders/5')).toEqual({ page: 'order', id: 5 });
  });

  it('keeps list filters the API knows and drops the rest', () => {
    expect(parseOrdersPath('quotes?status=sent')).toMatchObject({ page: 'quotes', status: 'sent' });
    expect(parseOrdersPath('quotes?status=lost')).toMatchObject({ page: 'quotes', status: null });
    expect(parseOrdersPath('orders?status=cutting&offset=25')).toMatchObject({ page: 'orders', status: 'cutting', query: { offset: 25 } });
  });

  it('reads the orders picked for batch cutting', () => {
    expect(parseOrdersPath('cutting?orders=5,6,x,0')).toEqual({ page: 'cutting', orderIds: [5, 6] });
    expect(parseOrdersPath('cutting')).toEqual({ page: 'cutting', orderIds: [] });
  });

  it('reads the stock pages', () => {
    expect(parseOrdersPath('stock')).toEqual({ page: 'stock', kind: null });
    expect(parseOrdersPath('stock?kind=board')).toEqual({ page: 'stock', kind: 'board' });
    expect(parseOrdersPath('stock?kind=lumber')).toEqual({ page: 'stock', kind: null });
    expect(parseOrdersPath('stock/new?kind=sheet&offcut=1')).toEqual({ page: 'stock-item', id: null, kind: 'sheet', offcut: true });
    expect(parseOrdersPath('stock/9')).toEqual({ page: 'stock-item', id: 9, kind: null, offcut: false });
    expect(parseOrdersPath('stock/9/edit')).toEqual({ page: 'missing', route: 'stock/9/edit' });
    expect(sectionOf(parseOrdersPath('stock/9'))).toBe('stock');
  });

  it('refuses paths that are not pages', () => {
    expect(parseOrdersPath('customers/0')).toEqual({ page: 'missing', route: 'customers/0' });
    expect(parseOrdersPath('orders/5/edit')).toEqual({ page: 'missing', route: 'orders/5/edit' });
    expect(parseOrdersPath('invoices')).toEqual({ page: 'missing', route: 'invoices' });
  });
});

describe('sections', () => {
  it('puts each page under its navigation entry', () => {
    expect(sectionOf(parseOrdersPath('quotes/7/edit'))).toBe('quotes');
    expect(sectionOf(parseOrdersPath('orders/5'))).toBe('orders');
    expect(sectionOf(parseOrdersPath('nowhere'))).toBeNull();
  });

  it('shows each role only what the API lets it do', () => {
    expect(sectionsFor('builder')).toEqual(['production', 'cutting', 'stock', 'orders']);
    expect(sectionsFor('sales')).toContain('stock');
    expect(sectionsFor('sales')).not.toContain('cutting');
    expect(sectionsFor('keeper')).toEqual([]);
  });
});

describe('listPath', () => {
  it('writes the status filter after the list query', () => {
    expect(listPath('quotes', { q: '', sort: '-createdAt', offset: 0, limit: 25 }, 'sent')).toBe('quotes?status=sent');
    expect(listPath('orders', { q: 'ada', sort: '-createdAt', offset: 0, limit: 25 }, null)).toBe('orders?q=ada');
    expect(parseOrdersPath(listPath('orders', { q: 'ada', sort: 'number', offset: 25, limit: 50 }, 'ready'))).toEqual({
      page: 'orders',
      query: { q: 'ada', sort: 'number', offset: 25, limit: 50 },
      status: 'ready',
    });
  });
});
