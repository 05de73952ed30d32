import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { recordsTestApp } from '../test-support.js';
import { acceptedOrder, builder, owner, sales } from './orders-test-helpers.js';

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

describe('an animal sold on an order', () => {
  it('is named on its quote line and leaves the collection as sold when the order is handed over', async () => {
    const animal = (await ctx.db('animals').where({ for_sale: true, status: 'active' }).whereNull('deleted_at').first()) as { id: number; code: string };
    expect(animal).toBeDefined();
    const { depositPercent } = (await request(ctx.app).get('/api/v1/order-settings').set(owner())).body;
    await request(ctx.app).patch('/api/v1/order-settings').set(owner()).send({ depositPercent: 0 });
    const { quote, order } = await acceptedOrder(ctx.app, [{ kind: 'item', description: `Hatchling ${animal.code}`, animalId: animal.id, quantity: 1, unitPriceCents: 15000 }]);
    await request(ctx.app).patch('/api/v1/order-settings').set(owner()).send({ depositPercent });
    expect(quote.lines[0].animalId).toBe(animal.id);
    for (const stage of ['cutting', 'assembly', 'wiring', 'testing', 'ready']) {
      await request(ctx.app).post(`/api/v1/orders/${order.id}/stage`).set(owner()).send({ stage }).expect(200);
    }
    expect((await ctx.db('animals').where({ id: animal.id }).first()).status).toBe('active');
    await request(ctx.app).post(`/api/v1/orders/${order.id}/stage`).set(sales()).send({ stage: 'picked_up' }).expect(200);
    const after = await ctx.db('animals').where({ id: animal.id }).first();
    expect([after.status, Boolean(after.for_sale)]).toEqual(['sold', false]);
    expect(await ctx.db('placements').where({ animal_id: animal.id }).whereNull('removed_at').first()).toBeUndefined();
  });

  it('is refused when the animal is not offered for sale, and only on item lines', async () => {
    const kept = (await ctx.db('animals').where({ for_sale: false }).first()) as { id: number };
    const notForSale = await request(ctx.app).post('/api/v1/quotes').set(sales()).send({ customerId: 1, lines: [{ kind: 'item', description: 'x', animalId: kept.id, unitPriceCents: 100 }] });
    expect([notForSale.status, notForSale.body.error.field]).toEqual([422, 'lines[0].animalId']);
    const onDelivery = await request(ctx.app).post('/api/v1/quotes').set(sales()).send({ customerId: 1, lines: [{ kind: 'delivery', description: 'x', animalId: kept.id }] });
    expect([onDelivery.status, onDelivery.body.error.field]).toEqual([400, 'lines[0].animalId']);
  });
});

describe('cancelling an invoiced order', () => {
  it('voids its open invoice, which keeps its number', async () => {
    const { order } = await acceptedOrder(ctx.app);
    const invoice = await request(ctx.app).post(`/api/v1/orders/${order.id}/invoices`).set(sales());
    expect([invoice.status, invoice.body.status]).toEqual([201, 'open']);
    await request(ctx.app).post(`/api/v1/orders/${order.id}/stage`).set(sales()).send({ stage: 'cancelled' }).expect(200);
    const after = await request(ctx.app).get(`/api/v1/invoices/${invoice.body.id}`).set(sales());
    expect([after.body.status, after.body.number]).toEqual(['void', invoice.body.number]);
  });
});
