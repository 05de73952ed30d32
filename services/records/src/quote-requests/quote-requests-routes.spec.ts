import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RACK_PLAN_EXAMPLE, RackPlanRequest } from '../../../../shared/api/rack-plan.js';
import { planRack } from '../../../calculator/src/domain/rack-plan.js';
import { IDENTITY_HEADER, signIdentity } from '../../../common/src/internal-identity.js';
import { DEMO_SHOP } from '../seed/demo-data.js';
import { asRole, recordsTestApp, TEST_INTERNAL_SECRET } from '../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
});
afterAll(() => ctx.close());

/** What the gateway forwards for an API key with these scopes. */
const asKey = (scopes: string[], id = 7) => ({ [IDENTITY_HEADER]: signIdentity({ kind: 'api-key', sub: `key:${id}`, role: 'integrator', scopes }, TEST_INTERNAL_SECRET) });

// Area-estimate sheets (no nesting) so the price can be checked against the calculator's domain.
const spec = { ...RACK_PLAN_EXAMPLE, layout: { levels: 6, columns: 2, dividers: 0 }, cutting: { include: false } };
const visitor = (email: string, extra: Record<string, unknown> = {}) => ({ name: 'Wren Talbot', email, phone: '555-0142', note: 'Hatchlings.', consent: true, spec, source: 'https://shop.example/sizer', ...extra });
const post = (body: unknown, who: Record<string, string> = asKey(['quote-requests'])) => request(ctx.app).post('/api/v1/quote-requests').set(who).send(body as object);
const count = async (table: string, where: Record<string, unknown> = {}) => Number(((await ctx.db(table).where(where).count({ n: '*' }).first()) as { n: number }).n);
const mailsTo = (address: string) => ctx.mailStore.list().filter((m) => m.to.some((t) => t.includes(address)));

describe('POST /api/v1/quote-requests', () => {
  it("marks a new customer from a partner's secret key as a partner lead", async () => {
    const key = await request(ctx.app).post('/api/v1/api-keys').set(asRole('owner')).send({ name: 'Partner shop', kind: 'secret', scopes: ['quote-requests'] });
    expect(key.status).toBe(201);
    expect((await post(visitor('partner.lead@example.test'), asKey(['quote-requests'], key.body.id))).status).toBe(201);
    expect(await ctx.db('customers').where({ email: 'partner.lead@example.test' }).first()).toMatchObject({ source: 'partner-api' });
  });

  it('creates a lead and a draft quote, e-mails the shop and the visitor, and hides ids from a key', async () => {
    const res = await post(visitor('Wren.Talbot@Example.test'));
    expect(res.status).toBe(201);
    expect(res.body.reference).toMatch(/^Q-\d{4}-\d{4}$/);
    expect(res.body.status).toBe('received');
    expect(res.body).not.toHaveProperty('customerId');
    expect(res.body).not.toHaveProperty('quoteId');

    // Outside width by the documented rules (shared/api/rack-plan.ts): 2 x 16.25 tubs + 1/2 side play
    // + one support-block column of 1/2 + two 1/2 side panels = 34.5 in; depth 23 + 1/2 play = 23.5 in.
    const plan = planRack(RackPlanRequest.parse(spec));
    expect(res.body.dimensions).toEqual({ overallWidth: 34.5, overallDepth: 23.5, overallHeight: plan.dimensions.overallHeight, unit: 'in' });
    // The seeded demo shop charges 6.5 % tax, rounded half-up to the cent.
    const priceCents = Math.round(plan.cost.total * 100);
    expect(res.body.estimate).toEqual({ totalCents: priceCents + Math.round(priceCents * 0.065), currency: 'usd' });

    const customer = await ctx.db('customers').where({ email: 'wren.talbot@example.test' }).first();
    // Key 7 is not a partner's secret key, so the lead came through the website widget.
    expect(customer).toMatchObject({ name: 'Wren Talbot', phone: '555-0142', source: 'website-widget' });
    expect(customer.notes).toMatch(/^Website lead from https:\/\/shop\.example\/sizer/);
    const quote = await ctx.db('quotes').where({ number: res.body.reference }).first();
    expect(quote).toMatchObject({ customer_id: customer.id, status: 'draft', created_by: 'api-key:key:7' });
    const lines = await ctx.db('quote_lines').where({ quote_id: quote.id });
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatchObject({ kind: 'rack', quantity: 1, unit_price_cents: priceCents });
    expect(lines[0].description).toContain('6 x 2 tubs');

    const toShop = mailsTo(DEMO_SHOP.email).filter((m) => m.subject.includes(res.body.reference));
    const toVisitor = mailsTo('wren.talbot@example.test').filter((m) => m.subject.includes(res.body.reference));
    expect(toShop).toHaveLength(1);
    expect(toShop[0]!.text).toContain('555-0142');
    expect(toVisitor).toHaveLength(1);
    expect(toVisitor[0]!.text).toContain('34 1/2 in wide x 23 1/2 in deep');
    expect(toVisitor[0]!.text).toContain('$');
    expect(await count('mail_log', { entity: 'quote', entity_id: quote.id, status: 'sent' })).toBe(2);
    expect(await count('audit_log', { entity: 'quote request', entity_id: String(quote.id) })).toBe(1);
  });

  it('files a request from a known e-mail under that customer without changing them, and shows staff the ids', async () => {
    const before = await ctx.db('customers').where({ email: 'priya.v@example.test' }).first();
    const customers = await count('customers');
    const res = await post(visitor('priya.v@example.test', { name: 'Someone Else', phone: '000' }), asRole('sales'));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ customerId: before.id, quoteId: expect.any(Number) });
    expect(await count('customers')).toBe(customers);
    expect(await ctx.db('customers').where({ id: before.id }).first()).toEqual(before);
    expect(await ctx.db('quotes').where({ id: res.body.quoteId }).first()).toMatchObject({ number: res.body.reference, customer_id: before.id });
  });

  it('answers a replay with the same Idempotency-Key with the same answer and one lead', async () => {
    const body = visitor('replay@example.test');
    const first = await post(body).set('idempotency-key', 'widget-req-1');
    const again = await post(body).set('idempotency-key', 'widget-req-1');
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toEqual(first.body);
    const customer = await ctx.db('customers').where({ email: 'replay@example.test' });
    expect(customer).toHaveLength(1);
    expect(await count('quotes', { customer_id: customer[0].id })).toBe(1);
    expect(mailsTo('replay@example.test')).toHaveLength(1);
    const other = await post({ ...body, note: 'changed' }).set('idempotency-key', 'widget-req-1');
    expect([other.status, other.body.error.field]).toEqual([422, 'Idempotency-Key']);
  });

  it('answers 400 naming the field and writes nothing', async () => {
    const customers = await count('customers');
    const quotes = await count('quotes');
    const cases: [unknown, string][] = [
      [visitor('not-an-address'), 'email'],
      [visitor('a@example.test', { name: ' ' }), 'name'],
      [visitor('a@example.test', { consent: false }), 'consent'],
      [visitor('a@example.test', { consent: 'true' }), 'consent'],
      [{ ...visitor('a@example.test'), consent: undefined }, 'consent'],
      [visitor('a@example.test', { spec: { ...spec, tub: { ...spec.tub, height: -1 } } }), 'spec.tub.height'],
      [visitor('a@example.test', { spec: { ...spec, layout: { levels: 0, columns: 2 } } }), 'spec.layout.levels'],
      [visitor('a@example.test', { spec: undefined }), 'spec'],
      [visitor('a@example.test', { unit: 'mm' }), 'unit'],
      [visitor('a@example.test', { extra: 1 }), 'body'],
    ];
    for (const [body, field] of cases) {
      const res = await post(body);
      expect(res.status, field).toBe(400);
      expect(res.body.error.field, field).toBe(field);
    }
    expect(await count('customers')).toBe(customers);
    expect(await count('quotes')).toBe(quotes);
  });

  it('takes the unit from outside the spec when the spec has none', async () => {
    // Only tub and layout: every other default is converted exactly for mm by the calculator.
    const inMm = { tub: { length: 584.2, width: 412.75, height: 165.1 }, layout: { levels: 6, columns: 2 }, cutting: { include: false } };
    const res = await post(visitor('metric@example.test', { spec: inMm, unit: 'mm' }));
    expect(res.status).toBe(201);
    // The tub of the inch case (23 x 16 1/4 in; 25.4 mm per inch, exact) with the same default
    // allowances and panels (1/2 in): 34.5 in = 876.3 mm.
    expect(res.body.dimensions.unit).toBe('mm');
    expect(res.body.dimensions.overallWidth).toBeCloseTo(876.3, 6);
  });

  it('passes on the calculator\'s 422 with the field under spec, and keeps no lead', async () => {
    const res = await post(visitor('too-tall@example.test', { spec: { ...spec, tub: { ...spec.tub, height: 100 } } }));
    expect(res.status).toBe(422);
    expect(res.body.error.field).toBe('spec.tub.height');
    expect(await count('customers', { email: 'too-tall@example.test' })).toBe(0);
    expect(mailsTo('too-tall@example.test')).toHaveLength(0);
  });

  it('is refused to keeper, builder and a key without the scope (403), and without identity (401)', async () => {
    for (const who of [asRole('keeper'), asRole('builder'), asKey(['calculations', 'order-status'])]) {
      expect((await post(visitor('x@example.test'), who)).status).toBe(403);
    }
    expect((await request(ctx.app).post('/api/v1/quote-requests').send(visitor('x@example.test'))).status).toBe(401);
  });
});

describe('widget settings', () => {
  it('default to showing prices; the owner can hide them from requests and confirmations', async () => {
    expect((await request(ctx.app).get('/api/v1/widget-settings').set(asRole('sales'))).body).toEqual({ showPrices: true });
    expect((await request(ctx.app).put('/api/v1/widget-settings').set(asRole('sales')).send({ showPrices: false })).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/widget-settings').set(asRole('keeper'))).status).toBe(403);
    const bad = await request(ctx.app).put('/api/v1/widget-settings').set(asRole('owner')).send({ showPrices: 'no' });
    expect([bad.status, bad.body.error.field]).toEqual([400, 'showPrices']);
    const put = await request(ctx.app).put('/api/v1/widget-settings').set(asRole('owner')).send({ showPrices: false });
    expect([put.status, put.body]).toEqual([200, { showPrices: false }]);
    try {
      const res = await post(visitor('no-prices@example.test'));
      expect(res.status).toBe(201);
      expect(res.body.estimate).toBeNull();
      const [mail] = mailsTo('no-prices@example.test');
      expect(mail!.text).not.toContain('$');
      // The shop still sees its estimate.
      expect(mailsTo(DEMO_SHOP.email).find((m) => m.subject.includes(res.body.reference))!.text).toContain('$');
    } finally {
      await request(ctx.app).put('/api/v1/widget-settings').set(asRole('owner')).send({ showPrices: true });
    }
  });
});

describe('GET /api/v1/order-status/:reference', () => {
  const status = (reference: string, who: Record<string, string>) => request(ctx.app).get(`/api/v1/order-status/${reference}`).set(who);

  it('tells staff where a seeded order stands, without personal data', async () => {
    // The demo book has one order in assembly (seed/orders-demo.ts).
    const order = await ctx.db('orders').where({ status: 'assembly' }).first();
    const customer = await ctx.db('customers').where({ id: order.customer_id }).first();
    const res = await status(order.number, asRole('sales'));
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ reference: order.number, kind: 'order', status: 'assembly', updatedAt: order.updated_at });
    expect(res.body.stages.map((s: { stage: string }) => s.stage)).toEqual(['awaiting_deposit', 'deposit_paid', 'cutting', 'assembly']);
    // The demo pays exactly the deposit.
    expect(res.body.deposit).toEqual({ dueCents: order.deposit_due_cents, paidCents: order.deposit_due_cents });
    const text = JSON.stringify(res.body);
    for (const personal of [customer.name, customer.email, String(order.total_cents)]) expect(text).not.toContain(personal);
  });

  it('tells a quote\'s status and, once accepted, its order', async () => {
    const quote = await ctx.db('quotes').join('orders', 'orders.quote_id', 'quotes.id').where('orders.status', 'assembly').first('quotes.number', 'orders.number as order_number');
    const res = await status(quote.number, asRole('owner'));
    expect(res.body).toMatchObject({ reference: quote.number, kind: 'quote', status: 'accepted', orderReference: quote.order_number });
  });

  it('lets a key read the requests it made itself, and nothing else', async () => {
    const made = await post(visitor('tracker@example.test'), asKey(['quote-requests', 'order-status'], 8));
    const mine = await status(made.body.reference, asKey(['order-status'], 8));
    expect(mine.status).toBe(200);
    expect(mine.body).toMatchObject({ reference: made.body.reference, kind: 'quote', status: 'draft' });
    expect((await status(made.body.reference, asKey(['order-status'], 9))).status).toBe(404);
    const seeded = await ctx.db('orders').first('number');
    expect((await status(seeded.number, asKey(['order-status'], 8))).status).toBe(404);
  });

  it('answers 404 for an unknown reference, 400 for a malformed one, 403 and 401 for the wrong caller', async () => {
    expect((await status('O-2026-9999', asRole('owner'))).status).toBe(404);
    expect((await status('Q-1999-0001', asRole('sales'))).status).toBe(404);
    const bad = await status('not-a-number', asRole('owner'));
    expect([bad.status, bad.body.error.field]).toEqual([400, 'reference']);
    const seeded = await ctx.db('orders').first('number');
    expect((await status(seeded.number, asRole('keeper'))).status).toBe(403);
    expect((await status(seeded.number, asRole('builder'))).status).toBe(403);
    expect((await status(seeded.number, asKey(['quote-requests']))).status).toBe(403);
    expect((await request(ctx.app).get(`/api/v1/order-status/${seeded.number}`)).status).toBe(401);
  });
});
