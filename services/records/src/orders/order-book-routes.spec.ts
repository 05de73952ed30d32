import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RACK_PLAN_EXAMPLE } from '../../../../shared/api/rack-plan.js';
import { recordsTestApp } from '../test-support.js';
import { acceptedOrder, builder, keeper, owner, payDeposit, sales } from './orders-test-helpers.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
  await request(ctx.app).patch('/api/v1/order-settings').set(owner()).send({ taxRatePercent: 0, depositPercent: 50, invoiceDueDays: 14 });
});
afterAll(() => ctx.close());

const stage = (id: number, who: Record<string, string>, to: string) => request(ctx.app).post(`/api/v1/orders/${id}/stage`).set(who).send({ stage: to });

describe('production stages', () => {
  it('refuses any stage but cancelling before the deposit, naming the allowed ones', async () => {
    const { order } = await acceptedOrder(ctx.app);
    const res = await stage(order.id, owner(), 'delivered');
    expect(res.status).toBe(409);
    expect(res.body.error).toMatchObject({ code: 'stage_out_of_order', field: 'stage', details: { allowed: ['cancelled'] } });
    expect((await stage(order.id, builder(), 'cutting')).status).toBe(409);
  });

  it('moves a paid order through the shop with who and when, and e-mails when ready and handed over', async () => {
    const { order } = await acceptedOrder(ctx.app);
    await payDeposit(ctx.app, ctx.stripeWebhookSecret, order.id);
    for (const next of ['cutting', 'assembly', 'wiring', 'testing', 'ready']) {
      const res = await stage(order.id, builder(), next);
      expect(res.status, next).toBe(200);
      expect(res.body.status).toBe(next);
    }
    expect(ctx.mailStore.list().some((m) => m.subject.includes(`order ${order.number} is ready`) && m.text.includes('ready for pickup'))).toBe(true);
    // Handing over is for owner or sales.
    expect((await stage(order.id, builder(), 'picked_up')).status).toBe(403);
    const handed = await stage(order.id, sales(), 'picked_up');
    expect(handed.body.nextStages).toEqual(['closed']);
    const timeline = handed.body.stages as { stage: string; by: string; startedAt: string; finishedAt: string | null }[];
    expect(timeline.map((s) => s.stage)).toEqual(['awaiting_deposit', 'deposit_paid', 'cutting', 'assembly', 'wiring', 'testing', 'ready', 'picked_up']);
    expect(timeline.filter((s) => s.stage === 'cutting')[0]!.by).toBe('builder@example.test');
    expect(timeline.slice(0, -1).every((s, i) => s.finishedAt === timeline[i + 1]!.startedAt)).toBe(true);
    expect(timeline.at(-1)!.finishedAt).toBeNull();
    // $500.00 order, $250.00 deposit paid: the rest is owed.
    const closing = await stage(order.id, sales(), 'closed');
    expect(closing.status).toBe(409);
    expect(closing.body.error).toMatchObject({ code: 'balance_due', details: { balanceCents: 25000 } });
    expect(ctx.mailStore.list().some((m) => m.subject.includes(`order ${order.number} handed over`))).toBe(true);
  });

  it('lets sales cancel an open order and nothing move after', async () => {
    const { order } = await acceptedOrder(ctx.app);
    expect((await stage(order.id, builder(), 'cancelled')).status).toBe(403);
    expect((await stage(order.id, sales(), 'cancelled')).body.status).toBe('cancelled');
    const after = await stage(order.id, owner(), 'cutting');
    expect(after.body.error.details.allowed).toEqual([]);
    expect((await request(ctx.app).post(`/api/v1/orders/${order.id}/payments`).set(sales()).send({})).status).toBe(409);
  });

  it('answers 400, 401, 403 and 404 on the stage route', async () => {
    const { order } = await acceptedOrder(ctx.app);
    const bad = await request(ctx.app).post(`/api/v1/orders/${order.id}/stage`).set(owner()).send({ stage: 'painting' });
    expect([bad.status, bad.body.error.field]).toEqual([400, 'stage']);
    expect((await request(ctx.app).post(`/api/v1/orders/${order.id}/stage`).send({ stage: 'cutting' })).status).toBe(401);
    expect((await stage(order.id, keeper(), 'cutting')).status).toBe(403);
    expect((await stage(99999, owner(), 'cutting')).status).toBe(404);
  });
});

describe('the order book', () => {
  it("shows the builder an order's racks with their specs, for batch cutting and the doorway check", async () => {
    const spec = { ...RACK_PLAN_EXAMPLE, cutting: { include: false } };
    const { order } = await acceptedOrder(ctx.app, [
      { kind: 'rack', spec, quantity: 2 },
      { kind: 'item', description: 'Spare thermostat', quantity: 1, unitPriceCents: 4500 },
    ]);
    const res = await request(ctx.app).get(`/api/v1/orders/${order.id}`).set(builder());
    expect(res.status).toBe(200);
    // Only rack lines: the builder cuts racks, not thermostats.
    expect(res.body.racks).toHaveLength(1);
    expect(res.body.racks[0]).toMatchObject({ planId: null, quantity: 2, spec: { layout: RACK_PLAN_EXAMPLE.layout } });
    expect(res.body.racks[0].description).toContain('9 x 3 tubs');
  });

  it('lists orders for the production board by stage, readable by the builder and not the keeper', async () => {
    const { order } = await acceptedOrder(ctx.app);
    await payDeposit(ctx.app, ctx.stripeWebhookSecret, order.id);
    const board = await request(ctx.app).get('/api/v1/orders?status=deposit_paid').set(builder());
    expect(board.status).toBe(200);
    expect(board.body.items.map((o: { id: number }) => o.id)).toContain(order.id);
    expect(board.body.items.every((o: { status: string }) => o.status === 'deposit_paid')).toBe(true);
    expect((await request(ctx.app).get('/api/v1/orders').set(keeper())).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/orders?sort=secret').set(owner())).body.error.field).toBe('query.sort');
    expect((await request(ctx.app).get('/api/v1/orders/99999').set(owner())).status).toBe(404);
  });

  it('changes delivery details (owner and sales only)', async () => {
    const { order } = await acceptedOrder(ctx.app);
    const res = await request(ctx.app).patch(`/api/v1/orders/${order.id}`).set(sales()).send({ deliveryMethod: 'delivery', deliveryDate: '2026-12-22', deliveryAddress: '4 Quarry Lane' });
    expect(res.body).toMatchObject({ deliveryMethod: 'delivery', deliveryDate: '2026-12-22', deliveryAddress: '4 Quarry Lane' });
    expect((await request(ctx.app).patch(`/api/v1/orders/${order.id}`).set(builder()).send({ notes: 'x' })).status).toBe(403);
    const bad = await request(ctx.app).patch(`/api/v1/orders/${order.id}`).set(sales()).send({ deliveryDate: 'soon' });
    expect([bad.status, bad.body.error.field]).toEqual([400, 'deliveryDate']);
    expect((await request(ctx.app).post('/api/v1/orders').set(sales()).send({ quoteId: 99999 })).status).toBe(404);
    expect((await request(ctx.app).post('/api/v1/orders').set(sales()).send({})).body.error.field).toBe('quoteId');
  });
});

describe('invoices', () => {
  it('numbers invoices without gaps and shows the balance after the deposit', async () => {
    const a = await acceptedOrder(ctx.app, [{ kind: 'item', description: 'Rack, 5 x 1', quantity: 1, unitPriceCents: 30000 }]);
    await payDeposit(ctx.app, ctx.stripeWebhookSecret, a.order.id);
    const first = await request(ctx.app).post(`/api/v1/orders/${a.order.id}/invoices`).set(sales());
    expect(first.status).toBe(201);
    // $300.00 total, 50 % deposit paid: $150.00 due.
    expect(first.body).toMatchObject({ totalCents: 30000, paidCents: 15000, balanceCents: 15000, status: 'open', orderNumber: a.order.number });
    const sequence = (number: string) => Number(/^INV-\d{4}-(\d{4})$/.exec(number)?.[1]);
    expect(sequence(first.body.number)).toBeGreaterThan(0);
    expect(first.body.payments).toHaveLength(1);
    expect(first.body.lines[0].description).toBe('Rack, 5 x 1');
    expect((await request(ctx.app).post(`/api/v1/orders/${a.order.id}/invoices`).set(sales())).status).toBe(409);
    const b = await acceptedOrder(ctx.app);
    const second = await request(ctx.app).post(`/api/v1/orders/${b.order.id}/invoices`).set(owner());
    // gapless: the next invoice takes the next number, whatever the demo data used before
    expect(sequence(second.body.number)).toBe(sequence(first.body.number) + 1);
    expect(ctx.mailStore.list().some((m) => m.subject.includes(`invoice ${first.body.number}`))).toBe(true);
    const list = await request(ctx.app).get(`/api/v1/invoices?orderId=${a.order.id}`).set(sales());
    expect(list.body.items.map((i: { id: number }) => i.id)).toEqual([first.body.id]);
    expect((await request(ctx.app).get(`/api/v1/invoices/${first.body.id}`).set(sales())).body.balanceCents).toBe(15000);
    const pdf = await request(ctx.app).get(`/api/v1/invoices/${first.body.id}/pdf`).set(sales());
    expect(pdf.headers['content-type']).toBe('application/pdf');
  });

  it('answers 401, 403 and 404 on invoices', async () => {
    expect((await request(ctx.app).get('/api/v1/invoices')).status).toBe(401);
    expect((await request(ctx.app).get('/api/v1/invoices').set(builder())).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/invoices/99999').set(owner())).status).toBe(404);
    expect((await request(ctx.app).post('/api/v1/orders/99999/invoices').set(owner())).status).toBe(404);
    expect((await request(ctx.app).get('/api/v1/invoices?status=late').set(owner())).body.error.field).toBe('query.status');
  });
});

describe('mail log', () => {
  it('lists what was sent to one customer, for owner and sales', async () => {
    const res = await request(ctx.app).get('/api/v1/mail-log?customerId=1').set(sales());
    expect(res.status).toBe(200);
    expect(res.body.total).toBeGreaterThan(0);
    expect(res.body.items.every((m: { customerId: number; status: string }) => m.customerId === 1 && m.status === 'sent')).toBe(true);
    expect((await request(ctx.app).get('/api/v1/mail-log').set(builder())).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/mail-log?entity=animal').set(owner())).body.error.field).toBe('query.entity');
  });
});
