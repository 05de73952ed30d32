import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asRole, recordsTestApp } from '../test-support.js';
import { seedCollectionDemo } from './collection-demo.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
  // true on a bare database, false when the main seed ran it already
  await seedCollectionDemo(ctx.db);
});
afterAll(() => ctx.close());

describe('collection demo seed', () => {
  it('fills three racks with the seeded animals where their location says, once', async () => {
    expect(await seedCollectionDemo(ctx.db)).toBe(false);
    const racks = await request(ctx.app).get('/api/v1/racks').set(asRole('keeper'));
    expect(racks.body.items.map((r: { name: string; tubCount: number }) => `${r.name}:${r.tubCount}`)).toEqual(['R1:15', 'R2:15', 'R3:15']);
    const occupied = racks.body.items.reduce((n: number, r: { occupiedCount: number }) => n + r.occupiedCount, 0);
    const living = await ctx.db('animals').whereIn('status', ['active', 'on-hold']).count({ n: '*' }).first();
    expect(occupied).toBe(Number((living as { n: number }).n));
  });

  it('gives the keeper a due list with flags, pairings with a clutch and readings with an alert', async () => {
    const due = await request(ctx.app).get('/api/v1/feeding/due').set(asRole('keeper'));
    expect(due.body.total).toBeGreaterThan(5);
    const flagged = due.body.racks.flatMap((r: { animals: { refusalFlag: boolean; weightLossFlag: boolean }[] }) => r.animals).filter((a: { refusalFlag: boolean; weightLossFlag: boolean }) => a.refusalFlag || a.weightLossFlag);
    expect(flagged.length).toBeGreaterThan(0);
    expect((await request(ctx.app).get('/api/v1/pairings').set(asRole('keeper'))).body.total).toBe(2);
    expect((await request(ctx.app).get('/api/v1/clutches').set(asRole('keeper'))).body.total).toBe(1);
    expect((await request(ctx.app).get('/api/v1/environment-readings?alertsOnly=true').set(asRole('keeper'))).body.total).toBe(1);
    const pairing = (await request(ctx.app).get('/api/v1/pairings').set(asRole('keeper'))).body.items.find((p: { status: string }) => p.status === 'laid');
    expect((await request(ctx.app).get(`/api/v1/pairings/${pairing.id}/outcomes`).set(asRole('keeper'))).status).toBe(200);
  });
});
