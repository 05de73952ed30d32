import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RACK_PLAN_EXAMPLE, RackPlanRequest } from '../../../../shared/api/rack-plan.js';
import { planRack } from '../../../calculator/src/domain/rack-plan.js';
import { insertId, nowIso } from '../db/knex.js';
import { recordsTestApp } from '../test-support.js';
import { builder, keeper, owner, sales } from './orders-test-helpers.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
  // Invented shop rates for these tests.
  const res = await request(ctx.app).patch('/api/v1/order-settings').set(owner()).send({ taxRatePercent: 6.5, depositPercent: 50, deliveryFeeCents: 6000 });
  expect(res.status).toBe(200);
});
afterAll(() => ctx.close());

const plainQuote = {
  customerId: 1,
  discountPercent: 10,
  lines: [
    { kind: 'item', description: 'Thermostat, 500 W', quantity: 2, unitPriceCents: 4500 },
    { kind: 'delivery', description: 'Delivery within 40 miles', quantity: 1 },
  ],
};

describe('order settings', () => {
  it('are read by sales and changed by the owner only', async () => {
    const read = await request(ctx.app).get('/api/v1/order-settings').set(sales());
    expect(read.body).toMatchObject({ taxRatePercent: 6.5, depositPercent: 50, deliveryFeeCents: 6000, currency: 'usd' });
    expect((await request(ctx.app).patch('/api/v1/order-settings').set(sales()).send({ taxRatePercent: 1 })).status).toBe(403);
    const bad = await request(ctx.app).patch('/api/v1/order-settings').set(owner()).send({ depositPercent: 120 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.field).toBe('depositPercent');
  });
});

describe('quotes', () => {
  it('creates a quote with totals in cents worked by hand', async () => {
    const res = await request(ctx.app).post('/api/v1/quotes').set(sales()).send(plainQuote);
    expect(res.status).toBe(201);
    // items 2 x $45 + $60 delivery (shop fee) = $150.00; 10 % off = $15.00; taxable $135.00;
    // 6.5 % tax = 877.5 cents -> 878 (half-up); total $143.78; deposit 50 % = 7189.
    expect(res.body).toMatchObject({ status: 'draft', itemsCents: 15000, discountCents: 1500, taxCents: 878, totalCents: 14378, depositCents: 7189, currency: 'usd' });
    expect(res.body.number).toMatch(/^Q-\d{4}-\d{4}$/);
    expect(res.body.lines.map((l: { amountCents: number }) => l.amountCents)).toEqual([9000, 6000]);
    expect(res.body.customerName).toBe('Priya Venkataraman');
  });

  it('prices a rack spec through the calculator', async () => {
    // Area-estimate sheets (no nesting) so the price can be checked against the domain function.
    const spec = { ...RACK_PLAN_EXAMPLE, cutting: { include: false } };
    const res = await request(ctx.app).post('/api/v1/quotes').set(sales()).send({ customerId: 2, lines: [{ kind: 'rack', spec, quantity: 2 }] });
    expect(res.status).toBe(201);
    // Same spec through the calculator's domain directly, not over HTTP.
    const expected = Math.round(planRack(RackPlanRequest.parse(spec)).cost.total * 100);
    expect(res.body.lines[0]).toMatchObject({ kind: 'rack', quantity: 2, unitPriceCents: expected, amountCents: 2 * expected, planId: null });
    expect(res.body.lines[0].description).toContain('9 x 3 tubs');
    expect(res.body.lines[0].spec.layout).toEqual(RACK_PLAN_EXAMPLE.layout);
  });

  it('prices a saved plan from its stored result', async () => {
    // Written straight into the plans area's table, as a saved plan would be.
    const result = { unit: 'in', dimensions: { overallWidth: 60, overallDepth: 24, overallHeight: 70 }, cost: { total: 1234.565 } };
    const planId = await insertId(ctx.db('plans'), { name: 'Breeder wall', spec_json: JSON.stringify(RACK_PLAN_EXAMPLE), result_json: JSON.stringify(result), summary_json: '{}', unit: 'in', created_at: nowIso(), updated_at: nowIso() });
    const res = await request(ctx.app).post('/api/v1/quotes').set(sales()).send({ customerId: 3, lines: [{ kind: 'rack', planId }] });
    expect(res.status).toBe(201);
    // $1,234.565 -> 123 456.5 cents -> 123 457
    expect(res.body.lines[0]).toMatchObject({ planId, unitPriceCents: 123457 });
    expect(res.body.lines[0].description).toMatch(/^Breeder wall/);
  });

  it('answers 400 naming the field of a bad line and never 500', async () => {
    const cases: [unknown, string][] = [
      [{ customerId: 1, lines: [{ kind: 'item', description: 'x', quantity: -1, unitPriceCents: 100 }] }, 'lines[0].quantity'],
      [{ customerId: 1, lines: [{ kind: 'item', description: 'x', quantity: 1, unitPriceCents: -100 }] }, 'lines[0].unitPriceCents'],
      [{ customerId: 1, lines: [{ kind: 'item', description: 'x', quantity: 1, unitPriceCents: 10.5 }] }, 'lines[0].unitPriceCents'],
      [{ customerId: 1, lines: [{ kind: 'item', quantity: 1, unitPriceCents: 100 }] }, 'lines[0].description'],
      [{ customerId: 1, lines: [{ kind: 'rack', planId: 1, spec: RACK_PLAN_EXAMPLE }] }, 'lines[0].planId'],
      [{ customerId: 1, lines: [{ kind: 'crate', description: 'x', unitPriceCents: 1 }] }, 'lines[0].kind'],
      [{ customerId: 1, lines: [] }, 'lines'],
      [{ lines: plainQuote.lines }, 'customerId'],
      [{ ...plainQuote, discountPercent: 12.345 }, 'discountPercent'],
      [{ ...plainQuote, validUntil: '31/12/2026' }, 'validUntil'],
      [{ ...plainQuote, colour: 'red' }, ''],
    ];
    for (const [body, field] of cases) {
      const res = await request(ctx.app).post('/api/v1/quotes').set(sales()).send(body as object);
      expect(res.status, JSON.stringify(body)).toBe(400);
      if (field) expect(res.body.error.field, JSON.stringify(body)).toBe(field);
    }
    const badSpec = await request(ctx.app).post('/api/v1/quotes').set(sales()).send({ customerId: 1, lines: [{ kind: 'rack', spec: { tub: RACK_PLAN_EXAMPLE.tub } }] });
    expect(badSpec.status).toBe(400);
    expect(badSpec.body.error.field).toMatch(/^lines\[0\]\.spec\.layout/);
  });

  it('answers 422 for a customer or plan that does not exist', async () => {
    const noCustomer = await request(ctx.app).post('/api/v1/quotes').set(sales()).send({ ...plainQuote, customerId: 9999 });
    expect([noCustomer.status, noCustomer.body.error.field]).toEqual([422, 'customerId']);
    const noPlan = await request(ctx.app).post('/api/v1/quotes').set(sales()).send({ customerId: 1, lines: [{ kind: 'rack', planId: 9999 }] });
    expect([noPlan.status, noPlan.body.error.field]).toEqual([422, 'lines[0].planId']);
  });

  it('checks identity and roles, and answers 404 for an unknown quote', async () => {
    expect((await request(ctx.app).get('/api/v1/quotes')).status).toBe(401);
    expect((await request(ctx.app).get('/api/v1/quotes').set(keeper())).status).toBe(403);
    expect((await request(ctx.app).post('/api/v1/quotes').set(builder()).send(plainQuote)).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/quotes/99999').set(owner())).status).toBe(404);
    expect((await request(ctx.app).post('/api/v1/quotes/99999/send').set(owner())).status).toBe(404);
    expect((await request(ctx.app).get('/api/v1/quotes/abc').set(owner())).status).toBe(400);
  });

  it('replays a retried create with the same Idempotency-Key and refuses the key with another body', async () => {
    const first = await request(ctx.app).post('/api/v1/quotes').set(sales()).set('Idempotency-Key', 'quote-retry-1').send(plainQuote);
    const again = await request(ctx.app).post('/api/v1/quotes').set(sales()).set('Idempotency-Key', 'quote-retry-1').send(plainQuote);
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.body.id).toBe(first.body.id);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(await ctx.db('quotes').where({ id: first.body.id }).count({ n: '*' }).first()).toEqual({ n: 1 });
    const other = await request(ctx.app).post('/api/v1/quotes').set(sales()).set('Idempotency-Key', 'quote-retry-1').send({ ...plainQuote, notes: 'changed' });
    expect([other.status, other.body.error.field]).toEqual([422, 'Idempotency-Key']);
  });

  it('lists quotes by status and customer, and finds them by number', async () => {
    const drafts = await request(ctx.app).get('/api/v1/quotes?status=draft&customerId=1').set(sales());
    expect(drafts.status).toBe(200);
    expect(drafts.body.total).toBeGreaterThan(0);
    expect(drafts.body.items.every((q: { status: string; customerId: number }) => q.status === 'draft' && q.customerId === 1)).toBe(true);
    const number = drafts.body.items[0].number;
    const found = await request(ctx.app).get(`/api/v1/quotes?q=${number}`).set(sales());
    expect(found.body.items.map((q: { number: string }) => q.number)).toEqual([number]);
    expect((await request(ctx.app).get('/api/v1/quotes?status=lost').set(sales())).body.error.field).toBe('query.status');
  });

  it('changes a draft, then sends it by e-mail with text, HTML and the PDF, and logs it', async () => {
    const created = await request(ctx.app).post('/api/v1/quotes').set(sales()).send(plainQuote);
    const changed = await request(ctx.app).patch(`/api/v1/quotes/${created.body.id}`).set(sales()).send({ discountPercent: 0 });
    // Without the discount: $150.00 + 6.5 % ($9.75) = $159.75
    expect(changed.body).toMatchObject({ discountCents: 0, taxCents: 975, totalCents: 15975 });
    const sent = await request(ctx.app).post(`/api/v1/quotes/${created.body.id}/send`).set(sales());
    expect(sent.status).toBe(200);
    expect(sent.body.status).toBe('sent');
    expect(sent.body.sentAt).toMatch(/Z$/);
    const message = ctx.mailStore.list().find((m) => m.subject.includes(created.body.number));
    expect(message?.to).toEqual(['priya.v@example.test']);
    expect(message?.text).toContain('Total: $159.75');
    expect(message?.html).toContain('<table');
    const log = await request(ctx.app).get(`/api/v1/mail-log?entity=quote&entityId=${created.body.id}`).set(sales());
    expect(log.body.items).toEqual([expect.objectContaining({ kind: 'quote_sent', status: 'sent', to: 'priya.v@example.test', customerId: 1 })]);
    const pdf = await request(ctx.app).get(`/api/v1/quotes/${created.body.id}/pdf`).set(sales()).buffer(true).parse((res, cb) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(pdf.headers['content-type']).toBe('application/pdf');
    expect((pdf.body as Buffer).subarray(0, 5).toString()).toBe('%PDF-');
    const late = await request(ctx.app).patch(`/api/v1/quotes/${created.body.id}`).set(sales()).send({ notes: 'late' });
    expect(late.status).toBe(409);
  });

  it('accepts a sent quote into one order and refuses a second acceptance', async () => {
    const created = await request(ctx.app).post('/api/v1/quotes').set(sales()).send(plainQuote);
    const draftAccept = await request(ctx.app).post(`/api/v1/quotes/${created.body.id}/accept`).set(sales()).send({});
    expect(draftAccept.status).toBe(409);
    await request(ctx.app).post(`/api/v1/quotes/${created.body.id}/send`).set(sales());
    const accepted = await request(ctx.app).post(`/api/v1/quotes/${created.body.id}/accept`).set(sales()).send({ deliveryMethod: 'delivery', deliveryDate: '2026-12-20', deliveryAddress: '12 Elm Row' });
    expect(accepted.status).toBe(201);
    expect(accepted.body).toMatchObject({ status: 'awaiting_deposit', depositDueCents: 7189, balanceCents: 14378, paidCents: 0, deliveryMethod: 'delivery', nextStages: ['cancelled'] });
    expect(accepted.body.stages).toEqual([expect.objectContaining({ stage: 'awaiting_deposit', finishedAt: null, by: 'sales@example.test' })]);
    const quote = await request(ctx.app).get(`/api/v1/quotes/${created.body.id}`).set(sales());
    expect(quote.body).toMatchObject({ status: 'accepted', orderId: accepted.body.id });
    expect((await request(ctx.app).post(`/api/v1/quotes/${created.body.id}/accept`).set(sales()).send({})).status).toBe(409);
    expect((await request(ctx.app).post(`/api/v1/quotes/${created.body.id}/decline`).set(sales())).status).toBe(409);
    expect(ctx.mailStore.list().some((m) => m.subject.includes(`order ${accepted.body.number} confirmed`))).toBe(true);
  });

  it('marks a quote past its date expired instead of accepting it', async () => {
    const created = await request(ctx.app).post('/api/v1/quotes').set(sales()).send({ ...plainQuote, validUntil: '2020-01-31' });
    await request(ctx.app).post(`/api/v1/quotes/${created.body.id}/send`).set(sales());
    const res = await request(ctx.app).post('/api/v1/orders').set(sales()).send({ quoteId: created.body.id });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toContain('expired');
    expect((await request(ctx.app).get(`/api/v1/quotes/${created.body.id}`).set(sales())).body.status).toBe('expired');
  });

  it('declines a sent quote', async () => {
    const created = await request(ctx.app).post('/api/v1/quotes').set(sales()).send(plainQuote);
    const res = await request(ctx.app).post(`/api/v1/quotes/${created.body.id}/decline`).set(owner());
    expect(res.body.status).toBe('declined');
  });
});
