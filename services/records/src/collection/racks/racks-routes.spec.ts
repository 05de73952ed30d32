import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedCollectionDemo } from '../../seed/collection-demo.js';
import { asRole, recordsTestApp } from '../../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
  // The same state whether or not the main seed already ran the collection's (it does nothing twice).
  await seedCollectionDemo(ctx.db);
});
afterAll(() => ctx.close());

const keeper = () => asRole('keeper');
const animalId = async (code: string) => (await ctx.db('animals').where({ code }).first()).id as number;

describe('racks and tubs', () => {
  let rack: { id: number; tubs: { id: number; label: string; occupant: unknown }[] };

  it('builds a rack with levels x columns labelled tubs', async () => {
    const res = await request(ctx.app).post('/api/v1/racks').set(keeper()).send({ name: 'T1', levels: 3, columns: 2, planId: 7, location: 'test wall' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ name: 'T1', levels: 3, columns: 2, planId: 7, tubCount: 6, occupiedCount: 0 });
    expect(res.body.tubs.map((t: { label: string }) => t.label)).toEqual(['T1-1A', 'T1-1B', 'T1-2A', 'T1-2B', 'T1-3A', 'T1-3B']);
    rack = res.body;
  });

  it('refuses a second rack of the same name (labels would clash) and bad sizes naming the field', async () => {
    expect((await request(ctx.app).post('/api/v1/racks').set(keeper()).send({ name: 't1', levels: 1, columns: 1 })).status).toBe(409);
    for (const [body, field] of [
      [{ name: 'X', levels: 0, columns: 2 }, 'levels'],
      [{ name: 'X', levels: 2, columns: 99 }, 'columns'],
      [{ name: '', levels: 2, columns: 2 }, 'name'],
      [{ name: 'X', levels: 2.5, columns: 2 }, 'levels'],
      [{ name: 'X', levels: 2, columns: 2, colour: 'red' }, 'body'],
    ] as const) {
      const res = await request(ctx.app).post('/api/v1/racks').set(keeper()).send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.field ?? '').toBe(field);
    }
  });

  it('places an animal, refuses an occupied tub with 409 and keeps the history of moves', async () => {
    const a = await animalId('PR-001');
    const b = await animalId('PR-002');
    const [first, second] = rack.tubs;
    const placed = await request(ctx.app).put(`/api/v1/animals/${a}/tub`).set(keeper()).send({ tubId: first!.id, at: '2026-11-01T10:00:00Z' });
    expect(placed.status).toBe(200);
    expect(placed.body.current).toMatchObject({ tubId: first!.id, label: 'T1-1A', removedAt: null });
    const clash = await request(ctx.app).put(`/api/v1/animals/${b}/tub`).set(keeper()).send({ tubId: first!.id });
    expect(clash.status).toBe(409);
    expect(clash.body.error.field).toBe('tubId');
    const moved = await request(ctx.app).put(`/api/v1/animals/${a}/tub`).set(keeper()).send({ tubId: second!.id });
    // the demo seed had PR-001 in R1-1A
    expect(moved.body.items.map((p: { label: string }) => p.label)).toEqual(['T1-1B', 'T1-1A', 'R1-1A']);
    expect(moved.body.items[1].removedAt).not.toBeNull();
    expect(moved.body.current.label).toBe('T1-1B');
    expect((await ctx.db('animals').where({ id: a }).first()).location).toBe('T1-1B');
    const map = await request(ctx.app).get(`/api/v1/racks/${rack.id}`).set(keeper());
    expect(map.body.occupiedCount).toBe(1);
    expect(map.body.tubs[1].occupant).toMatchObject({ animalId: a, code: 'PR-001' });
    expect(map.body.tubs[0].occupant).toBeNull();
  });

  it('lists empty tubs and frees a tub when an animal is taken out', async () => {
    const before = await request(ctx.app).get(`/api/v1/tubs/empty?rackId=${rack.id}`).set(keeper());
    expect(before.body.total).toBe(5);
    const a = await animalId('PR-001');
    expect((await request(ctx.app).delete(`/api/v1/animals/${a}/tub`).set(keeper())).status).toBe(204);
    expect((await request(ctx.app).delete(`/api/v1/animals/${a}/tub`).set(keeper())).status).toBe(404);
    const after = await request(ctx.app).get(`/api/v1/tubs/empty?rackId=${rack.id}`).set(keeper());
    expect(after.body.total).toBe(6);
    const history = await request(ctx.app).get(`/api/v1/animals/${a}/placements`).set(keeper());
    expect(history.body.current).toBeNull();
    expect(history.body.items).toHaveLength(3);
  });

  it('refuses future moves, unknown tubs and animals, and a sold animal', async () => {
    const a = await animalId('PR-003');
    const future = await request(ctx.app).put(`/api/v1/animals/${a}/tub`).set(keeper()).send({ tubId: rack.tubs[2]!.id, at: '2099-01-01T00:00:00Z' });
    expect(future.status).toBe(400);
    expect(future.body.error.field).toBe('at');
    expect((await request(ctx.app).put(`/api/v1/animals/${a}/tub`).set(keeper()).send({ tubId: 999999 })).status).toBe(422);
    expect((await request(ctx.app).put(`/api/v1/animals/999999/tub`).set(keeper()).send({ tubId: rack.tubs[2]!.id })).status).toBe(404);
    expect((await request(ctx.app).put(`/api/v1/animals/${a}/tub`).set(keeper()).send({ tubId: 'one' })).body.error.field).toBe('tubId');
    const sold = await ctx.db('animals').where({ status: 'sold' }).first();
    expect((await request(ctx.app).put(`/api/v1/animals/${sold.id}/tub`).set(keeper()).send({ tubId: rack.tubs[2]!.id })).status).toBe(422);
  });

  it('frees the tub of an animal sold through the animals API, so another can move in', async () => {
    const sold = await animalId('PR-005');
    const next = await animalId('PR-006');
    const tub = rack.tubs[4]!;
    await request(ctx.app).put(`/api/v1/animals/${sold}/tub`).set(keeper()).send({ tubId: tub.id });
    await request(ctx.app).patch(`/api/v1/animals/${sold}`).set(keeper()).send({ status: 'sold' });
    const map = await request(ctx.app).get(`/api/v1/racks/${rack.id}`).set(keeper());
    expect(map.body.tubs[4].occupant).toBeNull();
    expect((await request(ctx.app).put(`/api/v1/animals/${next}/tub`).set(keeper()).send({ tubId: tub.id })).status).toBe(200);
    expect((await request(ctx.app).get(`/api/v1/animals/${sold}/placements`).set(keeper())).body.current).toBeNull();
    await request(ctx.app).delete(`/api/v1/animals/${next}/tub`).set(keeper());
  });

  it('lists, changes and removes racks; an occupied rack stays', async () => {
    const list = await request(ctx.app).get('/api/v1/racks?q=T1').set(keeper());
    expect(list.status).toBe(200);
    expect(list.body.items.map((r: { name: string }) => r.name)).toContain('T1');
    const changed = await request(ctx.app).patch(`/api/v1/racks/${rack.id}`).set(keeper()).send({ notes: 'heat tape replaced' });
    expect(changed.body.notes).toBe('heat tape replaced');
    expect((await request(ctx.app).patch(`/api/v1/racks/${rack.id}`).set(keeper()).send({ levels: 9 })).status).toBe(400);
    await request(ctx.app).put(`/api/v1/animals/${await animalId('PR-004')}/tub`).set(keeper()).send({ tubId: rack.tubs[0]!.id });
    expect((await request(ctx.app).delete(`/api/v1/racks/${rack.id}`).set(keeper())).status).toBe(409);
    const spare = await request(ctx.app).post('/api/v1/racks').set(keeper()).send({ name: 'T9', levels: 1, columns: 1 });
    expect((await request(ctx.app).delete(`/api/v1/racks/${spare.body.id}`).set(keeper())).status).toBe(204);
    expect((await request(ctx.app).get(`/api/v1/racks/${spare.body.id}`).set(keeper())).status).toBe(404);
  });

  it('answers 401 without identity, 403 to builders and sales, 404 and 400 for bad ids', async () => {
    expect((await request(ctx.app).get('/api/v1/racks')).status).toBe(401);
    for (const role of ['builder', 'sales'] as const) {
      expect((await request(ctx.app).get('/api/v1/racks').set(asRole(role))).status).toBe(403);
      expect((await request(ctx.app).get('/api/v1/tubs/empty').set(asRole(role))).status).toBe(403);
      expect((await request(ctx.app).post('/api/v1/racks').set(asRole(role)).send({ name: 'Z', levels: 1, columns: 1 })).status).toBe(403);
    }
    expect((await request(ctx.app).get('/api/v1/racks/424242').set(keeper())).status).toBe(404);
    expect((await request(ctx.app).get('/api/v1/racks/abc').set(keeper())).body.error.field).toBe('id');
    expect((await request(ctx.app).get('/api/v1/tubs/empty?rackId=x').set(keeper())).body.error.field).toBe('query.rackId');
    expect((await request(ctx.app).get('/api/v1/racks?sort=secret').set(asRole('owner'))).status).toBe(400);
  });
});
