import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CREATE_STOCK_ITEM_EXAMPLE } from '../../../../shared/api/stock.js';
import { acceptedOrder, builder, keeper, owner, sales } from '../orders/orders-test-helpers.js';
import { recordsTestApp } from '../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
});
afterAll(() => ctx.close());

const stock = (body: unknown, who = builder()) => request(ctx.app).post('/api/v1/stock').set(who).send(body as object);
const reserve = (body: unknown, who = builder()) => request(ctx.app).post('/api/v1/stock-reservations').set(who).send(body as object);

describe('stock on hand', () => {
  it('keeps sheets, offcuts, boards and hardware, and lists them by kind', async () => {
    const sheet = await stock(CREATE_STOCK_ITEM_EXAMPLE);
    expect(sheet.status).toBe(201);
    expect(sheet.body).toMatchObject({ kind: 'sheet', material: 'pvc-rigid', lengthIn: 96, widthIn: 48, quantity: 12, offcut: false });
    const offcut = await stock({ kind: 'sheet', material: 'pvc-rigid', lengthIn: 40, widthIn: 24.5, quantity: 1, offcut: true, location: 'offcut bin' });
    expect(offcut.body.offcut).toBe(true);
    expect((await stock({ kind: 'board', material: 'lumber-2x4', lengthIn: 96, quantity: 20 }, owner())).status).toBe(201);
    expect((await stock({ kind: 'hardware', material: 'Caster, 3 in, locking', quantity: 16 })).status).toBe(201);
    const sheets = await request(ctx.app).get('/api/v1/stock').query({ kind: 'sheet', limit: 100 }).set(sales());
    const mine = sheets.body.items.filter((i: { id: number }) => [sheet.body.id, offcut.body.id].includes(i.id));
    expect(mine.map((i: { offcut: boolean }) => i.offcut).sort()).toEqual([false, true]);
    expect(sheets.body.items.every((i: { kind: string }) => i.kind === 'sheet')).toBe(true);
  });

  it('names the field of a stock item that makes no sense', async () => {
    for (const [body, field] of [
      [{ kind: 'sheet', material: 'pvc-rigid', lengthIn: 96, quantity: 1 }, 'widthIn'],
      [{ kind: 'sheet', material: 'glass', lengthIn: 96, widthIn: 48, quantity: 1 }, 'material'],
      [{ kind: 'board', material: 'lumber-2x4', quantity: 1 }, 'lengthIn'],
      [{ kind: 'board', material: 'lumber-2x4', lengthIn: 96, widthIn: 4, quantity: 1 }, 'widthIn'],
      [{ kind: 'hardware', material: 'Screw', quantity: -1 }, 'quantity'],
      [{ kind: 'hardware', material: 'Screw', quantity: 1.5 }, 'quantity'],
      [{ kind: 'crate', material: 'Screw', quantity: 1 }, 'kind'],
    ] as const) {
      const res = await stock(body);
      expect([res.status, res.body.error.field]).toEqual([400, field]);
    }
  });

  it('lets owner and builder write, sales read, and the keeper nothing', async () => {
    expect((await stock(CREATE_STOCK_ITEM_EXAMPLE, sales())).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/stock').set(keeper())).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/stock-reservations').set(keeper())).status).toBe(403);
    expect((await reserve({ stockItemId: 1, orderId: 1, quantity: 1 }, sales())).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/stock')).status).toBe(401);
  });
});

describe('setting stock aside for orders', () => {
  it('holds no more than is free, replaces an order\'s amount, and releases it', async () => {
    const item = (await stock({ kind: 'sheet', material: 'plywood', lengthIn: 96, widthIn: 48, quantity: 5 })).body;
    const first = (await acceptedOrder(ctx.app)).order;
    const second = (await acceptedOrder(ctx.app)).order;
    const held = await reserve({ stockItemId: item.id, orderId: first.id, quantity: 3 });
    expect(held.status).toBe(201);
    expect(held.body).toMatchObject({ stockItemId: item.id, orderId: first.id, orderNumber: first.number, quantity: 3 });
    const tooMany = await reserve({ stockItemId: item.id, orderId: second.id, quantity: 3 });
    expect([tooMany.status, tooMany.body.error.field]).toEqual([409, 'quantity']);
    expect((await reserve({ stockItemId: item.id, orderId: second.id, quantity: 2 })).status).toBe(201);
    // The first order's new total replaces its old one: 1 + 2 held of 5.
    const changed = await reserve({ stockItemId: item.id, orderId: first.id, quantity: 1 });
    expect([changed.status, changed.body.id]).toEqual([200, held.body.id]);
    const list = await request(ctx.app).get('/api/v1/stock-reservations').query({ stockItemId: item.id }).set(sales());
    expect(list.body.items.map((r: { quantity: number }) => r.quantity)).toEqual([1, 2]);
    expect((await request(ctx.app).delete(`/api/v1/stock-reservations/${held.body.id}`).set(builder())).status).toBe(204);
    expect((await request(ctx.app).get('/api/v1/stock-reservations').query({ orderId: first.id }).set(builder())).body.items).toEqual([]);
    expect((await request(ctx.app).delete(`/api/v1/stock-reservations/${held.body.id}`).set(builder())).status).toBe(404);
  });

  it('refuses unknown items and orders, and orders already finished', async () => {
    const item = (await stock({ kind: 'hardware', material: 'Dowel, 3/8 in', quantity: 40 })).body;
    const { order } = await acceptedOrder(ctx.app);
    expect((await reserve({ stockItemId: 99999, orderId: order.id, quantity: 1 })).status).toBe(404);
    expect((await reserve({ stockItemId: item.id, orderId: 99999, quantity: 1 })).status).toBe(404);
    await request(ctx.app).post(`/api/v1/orders/${order.id}/stage`).set(sales()).send({ stage: 'cancelled' });
    const late = await reserve({ stockItemId: item.id, orderId: order.id, quantity: 1 });
    expect([late.status, late.body.error.field]).toEqual([409, 'orderId']);
    const zero = await reserve({ stockItemId: item.id, orderId: order.id, quantity: 0 });
    expect([zero.status, zero.body.error.field]).toEqual([400, 'quantity']);
  });
});

describe('stock when an order is finished', () => {
  it('frees what a cancelled order held, and takes what a handed-over order used out of the count', async () => {
    const sheets = (await stock({ kind: 'sheet', material: 'pvc-expanded', lengthIn: 96, widthIn: 48, quantity: 10 })).body;
    const cancelled = (await acceptedOrder(ctx.app)).order;
    expect((await reserve({ stockItemId: sheets.id, orderId: cancelled.id, quantity: 4 })).status).toBe(201);
    await request(ctx.app).post(`/api/v1/orders/${cancelled.id}/stage`).set(sales()).send({ stage: 'cancelled' }).expect(200);
    expect((await request(ctx.app).get('/api/v1/stock-reservations').query({ stockItemId: sheets.id }).set(builder())).body.items).toEqual([]);
    expect((await request(ctx.app).get(`/api/v1/stock/${sheets.id}`).set(builder())).body.quantity).toBe(10);

    // No deposit asked, so the order can go straight through production to pickup.
    const { depositPercent } = (await request(ctx.app).get('/api/v1/order-settings').set(owner())).body;
    await request(ctx.app).patch('/api/v1/order-settings').set(owner()).send({ depositPercent: 0 });
    const used = (await acceptedOrder(ctx.app)).order;
    await request(ctx.app).patch('/api/v1/order-settings').set(owner()).send({ depositPercent });
    expect((await reserve({ stockItemId: sheets.id, orderId: used.id, quantity: 3 })).status).toBe(201);
    for (const stage of ['cutting', 'assembly', 'wiring', 'testing', 'ready', 'picked_up']) {
      await request(ctx.app).post(`/api/v1/orders/${used.id}/stage`).set(owner()).send({ stage }).expect(200);
    }
    expect((await request(ctx.app).get(`/api/v1/stock/${sheets.id}`).set(builder())).body.quantity).toBe(7);
    expect((await request(ctx.app).get('/api/v1/stock-reservations').query({ orderId: used.id }).set(builder())).body.items).toEqual([]);
  });

  it('lets a piece be marked as an offcut later', async () => {
    const piece = (await stock({ kind: 'sheet', material: 'pvc-rigid', lengthIn: 30, widthIn: 20, quantity: 1 })).body;
    const marked = await request(ctx.app).patch(`/api/v1/stock/${piece.id}`).set(builder()).send({ offcut: true });
    expect([marked.status, marked.body.offcut]).toEqual([200, true]);
  });
});
