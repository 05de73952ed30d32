import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asRole, recordsTestApp } from '../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
});
afterAll(() => ctx.close());

const keeper = () => asRole('keeper');

describe('business tables (animals, tub models, customers)', () => {
  it('pages through animals with a stable order and a total', async () => {
    const first = await request(ctx.app).get('/api/v1/animals?limit=15&offset=0').set(keeper());
    const second = await request(ctx.app).get('/api/v1/animals?limit=15&offset=15').set(keeper());
    expect(first.status).toBe(200);
    expect(first.body.total).toBe(40);
    const ids = [...first.body.items, ...second.body.items].map((a: { id: number }) => a.id);
    expect(new Set(ids).size).toBe(30);
  });

  it('sorts descending, filters by text and by status', async () => {
    const heavy = await request(ctx.app).get('/api/v1/animals?sort=-weightG&limit=3').set(keeper());
    const weights = heavy.body.items.map((a: { weightG: number }) => a.weightG);
    expect(weights).toEqual([...weights].sort((a, b) => b - a));
    const carpets = await request(ctx.app).get('/api/v1/animals?q=spilota').set(keeper());
    expect(carpets.body.total).toBeGreaterThan(0);
    expect(carpets.body.items.every((a: { species: string }) => a.species === 'Morelia spilota')).toBe(true);
    const sold = await request(ctx.app).get('/api/v1/animals?status=sold').set(keeper());
    expect(sold.body.items.every((a: { status: string }) => a.status === 'sold')).toBe(true);
  });

  it('treats % and _ in the text filter literally', async () => {
    const res = await request(ctx.app).get('/api/v1/animals?q=%25').set(keeper());
    expect(res.body.total).toBe(0);
  });

  it('answers 400 naming the query field for bad paging and sorting', async () => {
    for (const [query, field] of [['limit=0', 'query.limit'], ['limit=9999', 'query.limit'], ['offset=-1', 'query.offset'], ['sort=password', 'query.sort'], ['colour=red', 'query']] as const) {
      const res = await request(ctx.app).get(`/api/v1/animals?${query}`).set(keeper());
      expect(res.status, query).toBe(400);
      expect(res.body.error.field, query).toBe(field);
    }
  });

  it('creates, changes and softly removes an animal, keeping its row', async () => {
    const created = await request(ctx.app).post('/api/v1/animals').set(keeper()).send({ code: 'TEST-1', species: 'Python regius', weightG: 120 });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ code: 'TEST-1', sex: 'unknown', status: 'active', weightG: 120 });
    const changed = await request(ctx.app).patch(`/api/v1/animals/${created.body.id}`).set(keeper()).send({ weightG: 150 });
    expect(changed.body.weightG).toBe(150);
    expect((await request(ctx.app).delete(`/api/v1/animals/${created.body.id}`).set(keeper())).status).toBe(204);
    expect((await request(ctx.app).get(`/api/v1/animals/${created.body.id}`).set(keeper())).status).toBe(404);
    expect(await ctx.db('animals').where({ code: 'TEST-1' }).first()).toBeTruthy();
  });

  it('names the field of a bad body and never answers 500 to it', async () => {
    const cases: [unknown, string][] = [
      [{ species: 'Python regius' }, 'code'],
      [{ code: 'X', species: 'Python regius', weightG: -5 }, 'weightG'],
      [{ code: 'X', species: 'Python regius', hatchDate: '12/01/2026' }, 'hatchDate'],
      [{ code: 'X', species: 'Python regius', sex: 'm' }, 'sex'],
      [{ code: 'X', species: 'Python regius', owner: 'me' }, ''],
      [[1, 2], ''],
    ];
    for (const [body, field] of cases) {
      const res = await request(ctx.app).post('/api/v1/animals').set(keeper()).send(body as object);
      expect(res.status, JSON.stringify(body)).toBe(400);
      if (field) expect(res.body.error.field).toBe(field);
    }
  });

  it('enforces each table\'s roles', async () => {
    expect((await request(ctx.app).get('/api/v1/customers').set(keeper())).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/animals').set(asRole('builder'))).status).toBe(403);
    const offered = await request(ctx.app).get('/api/v1/animals').set(asRole('sales'));
    expect(offered.status).toBe(200);
    const forSale = await ctx.db('animals').where({ for_sale: true }).whereNull('deleted_at').count({ n: '*' }).first();
    // sales see exactly the animals offered for sale, not the whole collection
    expect(offered.body.total).toBe(Number(forSale!.n));
    expect(offered.body.total).toBeLessThan(40);
    expect((await request(ctx.app).post('/api/v1/animals').set(asRole('sales')).send({ code: 'S', species: 'x' })).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/tub-models').set(asRole('sales'))).status).toBe(200);
    expect((await request(ctx.app).post('/api/v1/tub-models').set(asRole('sales')).send({})).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/customers').set(asRole('sales'))).body.total).toBe(11);
  });
});
