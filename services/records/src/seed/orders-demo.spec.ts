import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asRole, recordsTestApp } from '../test-support.js';
import { InvoiceDetail, InvoicePage, MailLogPage, Order, OrderPage, OrderSettings, Quote, QuotePage } from '../../../../shared/api/orders.js';
import { seedOrdersDemo } from './orders-demo.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
});
afterAll(() => ctx.close());

describe('demo order book', () => {
  it('seeds quotes and orders in several states once, readable through the API', async () => {
    // The main seed may already call it; a second call must change nothing.
    await seedOrdersDemo(ctx.db);
    expect(await seedOrdersDemo(ctx.db)).toBe(false);
    const quotes = await request(ctx.app).get('/api/v1/quotes?limit=50').set(asRole('sales'));
    expect(new Set(quotes.body.items.map((q: { status: string }) => q.status))).toEqual(new Set(['draft', 'sent', 'declined', 'accepted']));
    const orders = await request(ctx.app).get('/api/v1/orders?limit=50').set(asRole('builder'));
    expect(orders.body.items.map((o: { status: string }) => o.status).sort()).toEqual(['assembly', 'awaiting_deposit', 'closed']);
    const closed = orders.body.items.find((o: { status: string }) => o.status === 'closed');
    expect(closed.balanceCents).toBe(0);
    const open = orders.body.items.find((o: { status: string }) => o.status === 'assembly');
    expect(open.paidCents).toBe(open.depositDueCents);
    const invoices = await request(ctx.app).get('/api/v1/invoices').set(asRole('owner'));
    expect(invoices.body.items).toEqual([expect.objectContaining({ status: 'paid', balanceCents: 0 })]);
  });

  it('answers the documented schemas for its lists and records (what the contract test checks through the gateway)', async () => {
    const owner = asRole('owner');
    for (const [path, list, one] of [['quotes', QuotePage, Quote], ['orders', OrderPage, Order], ['invoices', InvoicePage, InvoiceDetail]] as const) {
      const page = await request(ctx.app).get(`/api/v1/${path}`).set(owner);
      expect(list.safeParse(page.body).success, path).toBe(true);
      const record = await request(ctx.app).get(`/api/v1/${path}/${page.body.items[0].id}`).set(owner);
      const parsed = one.safeParse(record.body);
      expect(parsed.success, `${path}: ${parsed.error?.message}`).toBe(true);
    }
    expect(MailLogPage.safeParse((await request(ctx.app).get('/api/v1/mail-log').set(owner)).body).success).toBe(true);
    expect(OrderSettings.safeParse((await request(ctx.app).get('/api/v1/order-settings').set(owner)).body).success).toBe(true);
  });
});
