import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedCollectionDemo } from '../../seed/collection-demo.js';
import { asRole, recordsTestApp } from '../../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
const keeper = () => asRole('keeper');
let rack: { id: number; tubs: { id: number; occupant: { animalId: number } | null }[] };
let animalId = 0;

beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
  await seedCollectionDemo(ctx.db);
  const made = await request(ctx.app).post('/api/v1/racks').set(keeper()).send({ name: 'H1', levels: 2, columns: 2 });
  // New animals, so the demo seed's events do not mix in.
  const ids: number[] = [];
  for (const code of ['H-1', 'H-2', 'H-3']) ids.push((await request(ctx.app).post('/api/v1/animals').set(keeper()).send({ code, species: 'Python regius' })).body.id);
  for (const [i, id] of ids.entries()) await request(ctx.app).put(`/api/v1/animals/${id}/tub`).set(keeper()).send({ tubId: made.body.tubs[i].id });
  rack = (await request(ctx.app).get(`/api/v1/racks/${made.body.id}`).set(keeper())).body;
  animalId = ids[0]!;
});
afterAll(() => ctx.close());

describe('single events', () => {
  it('records a feeding and a weight; the weight becomes the animal\'s latest', async () => {
    const fed = await request(ctx.app).post(`/api/v1/animals/${animalId}/events`).set(keeper()).send({ kind: 'feeding', occurredAt: '2026-11-20T18:00:00-05:00', preyKind: 'rat', preySize: 'small', preyMassG: 40, result: 'accepted' });
    expect(fed.status).toBe(201);
    expect(fed.body).toMatchObject({ kind: 'feeding', occurredAt: '2026-11-20T23:00:00.000Z', preyKind: 'rat', preyMassG: 40, result: 'accepted', weightG: null, createdBy: 'user:keeper@example.test' });
    await request(ctx.app).post(`/api/v1/animals/${animalId}/events`).set(keeper()).send({ kind: 'weight', occurredAt: '2026-11-01T10:00:00Z', weightG: 380 });
    const weighed = await request(ctx.app).post(`/api/v1/animals/${animalId}/events`).set(keeper()).send({ kind: 'weight', occurredAt: '2026-11-21T10:00:00Z', weightG: 400 });
    expect(weighed.status).toBe(201);
    expect((await ctx.db('animals').where({ id: animalId }).first()).weight_g).toBe(400);
    const weights = await request(ctx.app).get(`/api/v1/animals/${animalId}/weights`).set(keeper());
    expect(weights.body.points.map((p: { weightG: number }) => p.weightG)).toEqual([380, 400]);
    expect(weights.body).toMatchObject({ latestWeightG: 400, suggestedPreyMassG: 40 }); // about 10 % of body mass, common practice
    // undoing the latest weight restores the earlier one
    expect((await request(ctx.app).delete(`/api/v1/events/${weighed.body.id}`).set(keeper())).status).toBe(204);
    expect((await ctx.db('animals').where({ id: animalId }).first()).weight_g).toBe(380);
    expect((await request(ctx.app).delete(`/api/v1/events/${weighed.body.id}`).set(keeper())).status).toBe(404);
  });

  it('records sheds, cleaning, health and notes, and lists them by kind, newest first', async () => {
    for (const body of [
      { kind: 'shed', occurredAt: '2026-11-22T08:00:00Z', shed: 'in-pieces' },
      { kind: 'cleaning', occurredAt: '2026-11-23T08:00:00Z' },
      { kind: 'health', occurredAt: '2026-11-24T08:00:00Z', note: 'stuck shed on tail tip, soaked' },
      { kind: 'note', occurredAt: '2026-11-25T08:00:00Z', note: 'moved hide' },
    ]) {
      expect((await request(ctx.app).post(`/api/v1/animals/${animalId}/events`).set(keeper()).send(body)).status, body.kind).toBe(201);
    }
    const sheds = await request(ctx.app).get(`/api/v1/animals/${animalId}/events?kinds=shed,health`).set(keeper());
    expect(sheds.body.items.map((e: { kind: string }) => e.kind)).toEqual(['health', 'shed']);
    expect(sheds.body.items[1].shed).toBe('in-pieces');
    const all = await request(ctx.app).get(`/api/v1/animals/${animalId}/events?sort=occurredAt&limit=2`).set(keeper());
    expect(all.body.total).toBe(6);
    expect(all.body.items[0].occurredAt <= all.body.items[1].occurredAt).toBe(true);
  });

  it('answers 400 naming the field: future dates, negative weights, wrong kind fields', async () => {
    const cases: [object, string][] = [
      [{ kind: 'weight', occurredAt: '2099-01-01T00:00:00Z', weightG: 100 }, 'occurredAt'],
      [{ kind: 'weight', occurredAt: '2026-11-01T00:00:00Z', weightG: -5 }, 'weightG'],
      [{ kind: 'weight', occurredAt: '2026-11-01T00:00:00Z', weightG: 0 }, 'weightG'],
      [{ kind: 'feeding', occurredAt: '2026-11-01T00:00:00Z', preyKind: 'rat', result: 'ate' }, 'result'],
      [{ kind: 'feeding', occurredAt: '2026-11-01T00:00:00Z', preyKind: 'rat', result: 'accepted', preyMassG: -1 }, 'preyMassG'],
      [{ kind: 'shed', occurredAt: 'yesterday', shed: 'complete' }, 'occurredAt'],
      [{ kind: 'note', occurredAt: '2026-11-01T00:00:00Z' }, 'note'],
      [{ kind: 'bath', occurredAt: '2026-11-01T00:00:00Z' }, 'kind'],
      [{ kind: 'cleaning', occurredAt: '2026-11-01T00:00:00Z', weightG: 5 }, 'body'],
    ];
    for (const [body, field] of cases) {
      const res = await request(ctx.app).post(`/api/v1/animals/${animalId}/events`).set(keeper()).send(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.field, JSON.stringify(body)).toBe(field);
    }
    expect((await request(ctx.app).get(`/api/v1/animals/${animalId}/events?kinds=feeding,bath`).set(keeper())).body.error.field).toBe('query.kinds');
  });

  it('answers 404, 401 and 403', async () => {
    expect((await request(ctx.app).post('/api/v1/animals/999999/events').set(keeper()).send({ kind: 'cleaning', occurredAt: '2026-11-01T00:00:00Z' })).status).toBe(404);
    expect((await request(ctx.app).get('/api/v1/animals/999999/weights').set(keeper())).status).toBe(404);
    expect((await request(ctx.app).get(`/api/v1/animals/${animalId}/events`)).status).toBe(401);
    for (const role of ['sales', 'builder'] as const) {
      expect((await request(ctx.app).get(`/api/v1/animals/${animalId}/events`).set(asRole(role))).status).toBe(403);
      expect((await request(ctx.app).post(`/api/v1/racks/${rack.id}/feeding`).set(asRole(role)).send({})).status).toBe(403);
    }
  });
});

describe('feeding day for a rack', () => {
  it('writes one result per tub together, and undoes the whole entry', async () => {
    const occupied = rack.tubs.filter((t) => t.occupant);
    const entry = await request(ctx.app)
      .post(`/api/v1/racks/${rack.id}/feeding`)
      .set(keeper())
      .send({ occurredAt: '2026-11-28T19:00:00Z', preyKind: 'rat', preySize: 'small', entries: occupied.map((t, i) => ({ tubId: t.id, result: i === 1 ? 'refused' : 'accepted' })) });
    expect(entry.status).toBe(201);
    expect(entry.body).toMatchObject({ rackId: rack.id, kind: 'feeding', eventCount: 3, undoneAt: null });
    expect(entry.body.events.map((e: { animalId: number; result: string }) => [e.animalId, e.result])).toEqual(occupied.map((t, i) => [t.occupant!.animalId, i === 1 ? 'refused' : 'accepted']));
    const undone = await request(ctx.app).delete(`/api/v1/event-batches/${entry.body.id}`).set(keeper());
    expect(undone.status).toBe(200);
    expect(undone.body.undoneAt).not.toBeNull();
    const left = await ctx.db('events').where({ batch_id: entry.body.id }).whereNull('deleted_at');
    expect(left).toHaveLength(0);
    expect((await request(ctx.app).delete(`/api/v1/event-batches/${entry.body.id}`).set(keeper())).status).toBe(409);
    expect((await request(ctx.app).delete('/api/v1/event-batches/999999').set(keeper())).status).toBe(404);
  });

  it('writes a retried entry once when it carries the same Idempotency-Key', async () => {
    const tub = rack.tubs.find((t) => t.occupant)!;
    const body = { occurredAt: '2026-11-27T19:00:00Z', preyKind: 'mouse', entries: [{ tubId: tub.id, result: 'accepted' }] };
    const first = await request(ctx.app).post(`/api/v1/racks/${rack.id}/feeding`).set(keeper()).set('idempotency-key', 'feed-r-1').send(body);
    const again = await request(ctx.app).post(`/api/v1/racks/${rack.id}/feeding`).set(keeper()).set('idempotency-key', 'feed-r-1').send(body);
    expect(first.status).toBe(201);
    expect(again.status).toBe(201);
    expect(again.body.id).toBe(first.body.id);
    expect(await ctx.db('event_batches').where({ occurred_at: '2026-11-27T19:00:00.000Z' })).toHaveLength(1);
    const changed = await request(ctx.app).post(`/api/v1/racks/${rack.id}/feeding`).set(keeper()).set('idempotency-key', 'feed-r-1').send({ ...body, preyKind: 'rat' });
    expect(changed.status).toBe(422);
    expect(changed.body.error.field).toBe('Idempotency-Key');
  });

  it('writes nothing when one tub is wrong, naming the entry', async () => {
    const before = await ctx.db('events').count({ n: '*' }).first();
    const empty = rack.tubs.find((t) => !t.occupant)!;
    const occupied = rack.tubs.find((t) => t.occupant)!;
    const res = await request(ctx.app).post(`/api/v1/racks/${rack.id}/feeding`).set(keeper()).send({ occurredAt: '2026-11-28T19:00:00Z', preyKind: 'rat', entries: [{ tubId: occupied.id, result: 'accepted' }, { tubId: empty.id, result: 'accepted' }] });
    expect(res.status).toBe(422);
    expect(res.body.error.field).toBe('entries[1].tubId');
    expect(await ctx.db('events').count({ n: '*' }).first()).toEqual(before);
    const bad = await request(ctx.app).post(`/api/v1/racks/${rack.id}/feeding`).set(keeper()).send({ occurredAt: '2026-11-28T19:00:00Z', preyKind: 'rat', entries: [{ tubId: occupied.id, result: 'maybe' }] });
    expect(bad.body.error.field).toBe('entries[0].result');
    const future = await request(ctx.app).post(`/api/v1/racks/${rack.id}/feeding`).set(keeper()).send({ occurredAt: '2099-11-28T19:00:00Z', preyKind: 'rat', entries: [{ tubId: occupied.id, result: 'accepted' }] });
    expect(future.body.error.field).toBe('occurredAt');
    expect((await request(ctx.app).post('/api/v1/racks/999999/feeding').set(keeper()).send({ occurredAt: '2026-11-28T19:00:00Z', preyKind: 'rat', entries: [{ tubId: 1, result: 'accepted' }] })).status).toBe(404);
  });
});
