import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { asRole, recordsTestApp } from '../../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;

beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
});
afterAll(() => ctx.close());

describe('GET /api/v1/environment/species', () => {
  it('lists the collection\'s species with counts, ranges where on record, and the caution', async () => {
    const res = await request(ctx.app).get('/api/v1/environment/species').set(asRole('keeper'));
    expect(res.status).toBe(200);
    const inCollection = (await ctx.db('animals').whereNull('deleted_at').whereIn('status', ['active', 'on-hold']).where({ species: 'Python regius' }).count({ n: '*' }).first())!;
    const ball = res.body.items.find((s: { name: string }) => s.name === 'Python regius');
    // Common practice for the ball python: warm 88 to 92 °F, cool 76 to 80 °F, humidity 50 to 60 %.
    expect(ball).toEqual({ name: 'Python regius', commonName: 'ball python', animalCount: Number(inCollection.n), ranges: { warmF: [88, 92], coolF: [76, 80], humidityPct: [50, 60] } });
    expect(res.body.items.map((s: { name: string }) => s.name)).toEqual(['Antaresia childreni', 'Morelia spilota', 'Python regius']);
    expect(res.body.items.find((s: { name: string }) => s.name === 'Morelia spilota').ranges).toBeNull();
    expect(res.body.total).toBe(3);
    expect(res.body.caution).toMatch(/calibrated thermometer at tub level/);
  });

  it('does not count sold, deceased or removed animals', async () => {
    await ctx.db('animals').insert([
      { code: 'SP-1', species: 'Liasis olivaceus', status: 'sold', created_at: '2026-12-01T00:00:00.000Z', updated_at: '2026-12-01T00:00:00.000Z' },
      { code: 'SP-2', species: 'Liasis olivaceus', status: 'active', deleted_at: '2026-12-01T00:00:00.000Z', created_at: '2026-12-01T00:00:00.000Z', updated_at: '2026-12-01T00:00:00.000Z' },
    ]);
    const res = await request(ctx.app).get('/api/v1/environment/species').set(asRole('owner'));
    expect(res.body.items.map((s: { name: string }) => s.name)).not.toContain('Liasis olivaceus');
  });

  it('is for keepers and the owner only', async () => {
    for (const role of ['sales', 'builder'] as const) expect((await request(ctx.app).get('/api/v1/environment/species').set(asRole(role))).status).toBe(403);
  });
});
