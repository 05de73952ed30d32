import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { recordsTestApp } from '../test-support.js';
import { acceptedOrder, builder, sales } from './orders-test-helpers.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
});
afterAll(() => ctx.close());

describe('customer address and source', () => {
  it('keeps both, finds a customer by address, and names a bad source', async () => {
    const made = await request(ctx.app).post('/api/v1/customers').set(sales()).send({ name: 'Ivo Marsh', email: 'ivo.marsh@example.test', address: '14 Quarry Lane, Millbrook', source: 'event' });
    expect(made.status).toBe(201);
    expect(made.body).toMatchObject({ address: '14 Quarry Lane, Millbrook', source: 'event' });
    const plain = await request(ctx.app).post('/api/v1/customers').set(sales()).send({ name: 'Nell Ashby', email: 'nell.ashby@example.test' });
    expect(plain.body).toMatchObject({ address: '', source: 'walk-in' });
    const found = await request(ctx.app).get('/api/v1/customers').query({ q: 'Quarry Lane' }).set(sales());
    expect(found.body.items.map((c: { email: string }) => c.email)).toEqual(['ivo.marsh@example.test']);
    const bad = await request(ctx.app).patch(`/api/v1/customers/${made.body.id}`).set(sales()).send({ source: 'billboard' });
    expect([bad.status, bad.body.error.field]).toEqual([400, 'source']);
  });
});

describe("the customer's doorway on an order", () => {
  it('is kept in inches, checked for sense, and given to the builder with the racks', async () => {
    const { order } = await acceptedOrder(ctx.app);
    expect(order.doorwayHeightIn).toBeNull();
    const set = await request(ctx.app).patch(`/api/v1/orders/${order.id}`).set(sales()).send({ doorwayHeightIn: 78.5 });
    expect(set.status).toBe(200);
    expect(set.body.doorwayHeightIn).toBe(78.5);
    expect((await request(ctx.app).get(`/api/v1/orders/${order.id}`).set(builder())).body.doorwayHeightIn).toBe(78.5);
    for (const value of [0, -10, 300, '80']) {
      const res = await request(ctx.app).patch(`/api/v1/orders/${order.id}`).set(sales()).send({ doorwayHeightIn: value });
      expect([res.status, res.body.error.field]).toEqual([400, 'doorwayHeightIn']);
    }
    expect((await request(ctx.app).patch(`/api/v1/orders/${order.id}`).set(sales()).send({ doorwayHeightIn: null })).body.doorwayHeightIn).toBeNull();
  });
});
