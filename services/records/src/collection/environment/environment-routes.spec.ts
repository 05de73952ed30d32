import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedCollectionDemo } from '../../seed/collection-demo.js';
import { asRole, recordsTestApp } from '../../test-support.js';

let ctx: Awaited<ReturnType<typeof recordsTestApp>>;
const keeper = () => asRole('keeper');
let rackId = 0;

beforeAll(async () => {
  ctx = await recordsTestApp({ seed: true });
  await seedCollectionDemo(ctx.db);
  rackId = (await request(ctx.app).post('/api/v1/racks').set(keeper()).send({ name: 'E1', levels: 1, columns: 1 })).body.id;
});
afterAll(() => ctx.close());

const upload = (csv: string, query = `rackId=${rackId}`) => request(ctx.app).post(`/api/v1/environment-readings/upload?${query}`).set(keeper()).set('content-type', 'text/csv').send(csv);

describe('environment readings', () => {
  it('takes a reading by hand, with °C and an alert when outside the warm-side range', async () => {
    const res = await request(ctx.app).post('/api/v1/environment-readings').set(keeper()).send({ rackId, takenAt: '2026-11-30T08:00:00Z', tempF: 95, humidityPct: 55, probe: 'warm' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ tempF: 95, tempC: 35, probe: 'warm', source: 'manual', alerts: ['warm side 95 °F is above 92 °F'] }); // (95 − 32)/1.8 = 35, NIST SP 811
    const fine = await request(ctx.app).post('/api/v1/environment-readings').set(keeper()).send({ rackId, takenAt: '2026-11-30T09:00:00Z', tempF: 78, probe: 'cool' });
    expect(fine.body.alerts).toEqual([]);
  });

  it('answers 400 naming the field and 422 for an unknown rack', async () => {
    const cases: [object, string][] = [
      [{ rackId, takenAt: '2099-01-01T00:00:00Z', tempF: 90, probe: 'warm' }, 'takenAt'],
      [{ rackId, takenAt: '2026-11-30T08:00:00Z', tempF: 90, probe: 'hot' }, 'probe'],
      [{ rackId, takenAt: '2026-11-30T08:00:00Z', humidityPct: 120, probe: 'warm' }, 'humidityPct'],
      [{ rackId, takenAt: '2026-11-30T08:00:00Z', probe: 'warm' }, 'tempF'],
    ];
    for (const [body, field] of cases) expect((await request(ctx.app).post('/api/v1/environment-readings').set(keeper()).send(body)).body.error.field, field).toBe(field);
    expect((await request(ctx.app).post('/api/v1/environment-readings').set(keeper()).send({ rackId: 99999, takenAt: '2026-11-30T08:00:00Z', tempF: 90, probe: 'warm' })).status).toBe(422);
  });

  it('imports a logger CSV all together and lists the readings outside their range', async () => {
    const res = await upload('takenAt,tempF,humidityPct,probe\r\n2026-11-29T08:00:00Z,89,55,warm\r\n2026-11-29T09:00:00Z,86,45,warm\r\n2026-11-29T10:00:00Z,77,,cool\r\n');
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ rackId, imported: 3, alerts: 1 });
    expect(res.body.caution).toMatch(/calibrated thermometer at tub level/);
    const alerts = await request(ctx.app).get(`/api/v1/environment-readings?rackId=${rackId}&alertsOnly=true`).set(keeper());
    expect(alerts.body.items.map((r: { tempF: number }) => r.tempF).sort()).toEqual([86, 95]);
    expect(alerts.body.caution).toMatch(/calibrated/);
    const all = await request(ctx.app).get(`/api/v1/environment-readings?rackId=${rackId}&sort=takenAt`).set(keeper());
    expect(all.body.total).toBe(5);
  });

  it('imports nothing from a CSV with a bad row, naming line and column', async () => {
    const before = await ctx.db('environment_readings').count({ n: '*' }).first();
    const res = await upload('takenAt,tempF,humidityPct,probe\n2026-11-29T08:00:00Z,89,55,warm\n2026-11-29T09:00:00Z,eighty,55,warm\n');
    expect(res.status).toBe(400);
    expect(res.body.error.field).toBe('csv[3].tempF');
    expect(res.body.error.details).toHaveLength(1);
    expect(await ctx.db('environment_readings').count({ n: '*' }).first()).toEqual(before);
    expect((await upload('when,tempF\nx,1\n')).body.error.field).toBe('csv');
    expect((await upload('takenAt,tempF\n2026-11-29T08:00:00Z,89\n', 'rackId=abc')).body.error.field).toBe('query.rackId');
    expect((await upload('takenAt,tempF\n2026-11-29T08:00:00Z,89\n', 'rackId=99999')).status).toBe(404);
    const json = await request(ctx.app).post(`/api/v1/environment-readings/upload?rackId=${rackId}`).set(keeper()).send({ rows: [] });
    expect(json.status).toBe(415);
    const big = await upload(`takenAt,tempF\n${'2026-11-29T08:00:00Z,89\n'.repeat(100_000)}`);
    expect(big.status).toBe(413);
  });

  it('answers 401 and 403, and gives the ranges', async () => {
    expect((await request(ctx.app).get('/api/v1/environment-readings')).status).toBe(401);
    expect((await request(ctx.app).get('/api/v1/environment-readings').set(asRole('sales'))).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/environment/ranges').set(asRole('builder'))).status).toBe(403);
    expect((await request(ctx.app).get('/api/v1/environment/ranges').set(keeper())).body).toMatchObject({ warmF: [88, 92], coolF: [76, 80], humidityPct: [50, 60] });
  });
});
