import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedCollectionDemo } from '../../seed/collection-demo.js';
import { asRole, recordsTestApp } from '../../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
const keeper = () => asRole('keeper');
const DAY = '2026-11-28';
let rackId = 0;
let tubs: { id: number }[] = [];
const ids: Record<string, number> = {};

const post = (animal: number, body: object) => request(ctx.app).post(`/api/v1/animals/${animal}/events`).set(keeper()).send(body);

beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
  await seedCollectionDemo(ctx.db);
  // Dates lie before the real today: the service refuses future events. Four adults of known dates in one rack; every other animal of the seed is out of the way.
  await ctx.db('animals').update({ status: 'on-hold' }).where({ status: 'active' });
  const rack = await request(ctx.app).post('/api/v1/racks').set(keeper()).send({ name: 'S1', levels: 2, columns: 2 });
  rackId = rack.body.id;
  tubs = rack.body.tubs;
  for (const [i, code] of ['S-FED', 'S-DUE', 'S-REFUSER', 'S-LOSER'].entries()) {
    const made = await request(ctx.app).post('/api/v1/animals').set(keeper()).send({ code, species: 'Python regius', hatchDate: '2020-05-01' });
    ids[code] = made.body.id;
    await request(ctx.app).put(`/api/v1/animals/${made.body.id}/tub`).set(keeper()).send({ tubId: tubs[i]!.id, at: '2026-10-01T00:00:00Z' });
  }
  await ctx.db('animals').update({ status: 'deceased' }).where({ status: 'on-hold' });
  await post(ids['S-FED']!, { kind: 'feeding', occurredAt: '2026-11-24T18:00:00Z', preyKind: 'rat', result: 'accepted' }); // due 12-08
  await post(ids['S-DUE']!, { kind: 'feeding', occurredAt: '2026-11-08T18:00:00Z', preyKind: 'rat', result: 'accepted' }); // due 11-22
  for (const day of ['2026-10-20', '2026-10-30', '2026-11-08']) await post(ids['S-REFUSER']!, { kind: 'feeding', occurredAt: `${day}T18:00:00Z`, preyKind: 'rat', result: 'refused' });
  await post(ids['S-LOSER']!, { kind: 'weight', occurredAt: '2026-10-20T10:00:00Z', weightG: 1500 });
  await post(ids['S-LOSER']!, { kind: 'weight', occurredAt: '2026-11-20T10:00:00Z', weightG: 1320 });
});
afterAll(() => ctx.close());

describe('feeding due list', () => {
  it('lists adults due after 14 days, grouped by rack, with refusal and weight-loss flags', async () => {
    const res = await request(ctx.app).get(`/api/v1/feeding/due?date=${DAY}`).set(keeper());
    expect(res.status).toBe(200);
    expect(res.body.total).toBe(3);
    expect(res.body.unplaced).toEqual([]);
    const [rack] = res.body.racks;
    expect(rack.rackId).toBe(rackId);
    expect(rack.animals.map((a: { code: string }) => a.code)).toEqual(['S-DUE', 'S-REFUSER', 'S-LOSER']);
    const [due, refuser, loser] = rack.animals;
    expect(due).toMatchObject({ stage: 'adult', intervalDays: 14, dueOn: '2026-11-22', daysOverdue: 6, refusalFlag: false, tubLabel: 'S1-1B' });
    expect(refuser).toMatchObject({ refusalStreak: 3, refusalFlag: true, lastResult: 'refused' });
    expect(loser).toMatchObject({ weightLossPct: 12, weightLossFlag: true, latestWeightG: 1320, suggestedPreyMassG: 132 }); // (1500-1320)/1500 = 12 %
  });

  it('drops an animal from the list once it is fed on the day', async () => {
    await request(ctx.app).post(`/api/v1/racks/${rackId}/feeding`).set(keeper()).send({ occurredAt: `${DAY}T19:00:00Z`, preyKind: 'rat', entries: [{ tubId: tubs[1]!.id, result: 'accepted' }] });
    const res = await request(ctx.app).get(`/api/v1/feeding/due?date=${DAY}`).set(keeper());
    expect(res.body.total).toBe(2);
    // events after the asked day do not count
    const earlier = await request(ctx.app).get('/api/v1/feeding/due?date=2026-11-27').set(keeper());
    expect(earlier.body.racks[0].animals.map((a: { code: string }) => a.code)).toContain('S-DUE');
  });

  it('answers 400 for a bad date, 401 and 403', async () => {
    expect((await request(ctx.app).get('/api/v1/feeding/due?date=10-12-2026').set(keeper())).body.error.field).toBe('query.date');
    expect((await request(ctx.app).get('/api/v1/feeding/due?date=2026-02-30').set(keeper())).body.error.field).toBe('query.date');
    expect((await request(ctx.app).get('/api/v1/feeding/due')).status).toBe(401);
    expect((await request(ctx.app).get('/api/v1/feeding/due').set(asRole('sales'))).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/feeding/due').set(asRole('owner'))).status).toBe(200);
  });
});

describe('daily digest', () => {
  it('mails the due list to the keepers through the mail catcher and logs it', async () => {
    const res = await request(ctx.app).post('/api/v1/feeding/digest').set(asRole('owner')).send({ date: DAY });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ date: DAY, sentTo: ['keeper@demo.tubwright.test'], dueCount: 2, flaggedCount: 2 });
    const mail = ctx.mailStore.list().find((m) => m.subject.startsWith(`Feeding due ${DAY}`));
    expect(mail?.to).toEqual(['keeper@demo.tubwright.test']);
    expect(mail?.text).toContain('S1-2A  S-REFUSER');
    expect(await ctx.db('mail_log').where({ kind: 'feeding-digest', status: 'sent' }).first()).toBeTruthy();
  });

  it('answers 400 for a bad date and 403 for sales and builders', async () => {
    expect((await request(ctx.app).post('/api/v1/feeding/digest').set(keeper()).send({ date: 'today' })).body.error.field).toBe('date');
    expect((await request(ctx.app).post('/api/v1/feeding/digest').set(keeper()).send({ when: DAY })).status).toBe(400);
    expect((await request(ctx.app).post('/api/v1/feeding/digest').set(asRole('builder')).send({})).status).toBe(403);
    expect((await request(ctx.app).post('/api/v1/feeding/digest').send({})).status).toBe(401);
  });
});
