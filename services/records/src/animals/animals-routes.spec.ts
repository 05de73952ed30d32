import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asRole, recordsTestApp } from '../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp();
});
afterAll(() => ctx.close());

const keeper = () => asRole('keeper');
const create = (body: object) => request(ctx.app).post('/api/v1/animals').set(keeper()).send(body);
const tomorrow = () => new Date(Date.now() + 86_400_000).toISOString().slice(0, 10);

describe('animal rules beyond the schema', () => {
  it('refuses a code in use, ignoring case, with 409 naming the field; also on a change', async () => {
    const first = await create({ code: 'AR-1', species: 'Python regius' });
    expect(first.status).toBe(201);
    const again = await create({ code: 'ar-1', species: 'Python regius' });
    expect(again.status).toBe(409);
    expect(again.body.error).toMatchObject({ code: 'conflict', field: 'code' });

    const second = await create({ code: 'AR-2', species: 'Python regius' });
    const clash = await request(ctx.app).patch(`/api/v1/animals/${second.body.id}`).set(keeper()).send({ code: 'AR-1' });
    expect(clash.status).toBe(409);
    expect(clash.body.error.field).toBe('code');
    // Its own code (in another case) is no clash.
    expect((await request(ctx.app).patch(`/api/v1/animals/${second.body.id}`).set(keeper()).send({ code: 'ar-2', name: 'Wren' })).body).toMatchObject({ code: 'ar-2', name: 'Wren' });
  });

  it('keeps a removed animal\'s code taken: its history still names it', async () => {
    const gone = await create({ code: 'AR-GONE', species: 'Python regius' });
    await request(ctx.app).delete(`/api/v1/animals/${gone.body.id}`).set(keeper());
    expect((await create({ code: 'AR-GONE', species: 'Python regius' })).status).toBe(409);
  });

  it('refuses a hatch date in the future with 400 naming the field, on create and on change', async () => {
    const future = await create({ code: 'AR-3', species: 'Python regius', hatchDate: tomorrow() });
    expect(future.status).toBe(400);
    expect(future.body.error.field).toBe('hatchDate');
    expect(await ctx.db('animals').where({ code: 'AR-3' }).first()).toBeUndefined();

    const today = new Date().toISOString().slice(0, 10);
    const ok = await create({ code: 'AR-3', species: 'Python regius', hatchDate: today });
    expect(ok.status).toBe(201);
    const change = await request(ctx.app).patch(`/api/v1/animals/${ok.body.id}`).set(keeper()).send({ hatchDate: tomorrow() });
    expect(change.status).toBe(400);
    expect(change.body.error.field).toBe('hatchDate');
    expect((await request(ctx.app).patch(`/api/v1/animals/${ok.body.id}`).set(keeper()).send({ hatchDate: '2026-02-30' })).body.error.field).toBe('hatchDate');
  });

  it('checks roles before the rules: sales learn nothing about codes', async () => {
    expect((await request(ctx.app).post('/api/v1/animals').set(asRole('sales')).send({ code: 'AR-1', species: 'Python regius' })).status).toBe(403);
  });
});
