import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { RACK_PLAN_EXAMPLE, RackPlanResponse } from '../../../../shared/api/rack-plan.js';
import { asRole, calculatorTestApp } from './test-support.js';

const app = calculatorTestApp();
const post = (body: unknown, role: Parameters<typeof asRole>[0] = 'builder') =>
  request(app).post('/api/v1/calc/rack-plan').set(asRole(role)).send(body as object);

describe('POST /api/v1/calc/rack-plan', () => {
  it('answers a plan that matches the documented response schema', async () => {
    const res = await post(RACK_PLAN_EXAMPLE);
    expect(res.status).toBe(200);
    expect(RackPlanResponse.safeParse(res.body).success).toBe(true);
    // common practice: opening = tub height + 1/8 in lid gap
    expect(res.body.dimensions.levelOpening).toBe(6.625);
    expect(res.body.display.dimensions.levelOpening).toBe('6 5/8');
  });

  it('answers in millimetres for a millimetre request', async () => {
    const res = await post({ unit: 'mm', tub: { length: 584.2, width: 412.75, height: 165.1, loadedMass: 2 }, layout: { levels: 9, columns: 3 } });
    expect(res.status).toBe(200);
    expect(res.body.unit).toBe('mm');
    // 6 5/8 in = 168.275 mm (1 in = 25.4 mm exactly, NIST SP 811)
    expect(res.body.dimensions.levelOpening).toBeCloseTo(168.275, 6);
  });

  it('names the field of bad input with 400', async () => {
    const cases: [unknown, string][] = [
      [{ ...RACK_PLAN_EXAMPLE, tub: { ...RACK_PLAN_EXAMPLE.tub, length: -1 } }, 'tub.length'],
      [{ ...RACK_PLAN_EXAMPLE, tub: { ...RACK_PLAN_EXAMPLE.tub, height: 'tall' } }, 'tub.height'],
      [{ ...RACK_PLAN_EXAMPLE, tub: { ...RACK_PLAN_EXAMPLE.tub, width: 0 } }, 'tub.width'],
      [{ ...RACK_PLAN_EXAMPLE, layout: { levels: 0, columns: 3 } }, 'layout.levels'],
      [{ ...RACK_PLAN_EXAMPLE, layout: { levels: 500, columns: 3 } }, 'layout.levels'],
      [{ ...RACK_PLAN_EXAMPLE, layout: { levels: 5, columns: 3, dividers: 3 } }, 'layout.dividers'],
      [{ ...RACK_PLAN_EXAMPLE, unit: 'cubits' }, 'unit'],
      [{ ...RACK_PLAN_EXAMPLE, construction: { carcassMaterial: 'unobtainium' } }, 'construction.carcassMaterial'],
      [{ layout: { levels: 5, columns: 3 } }, 'tub'],
    ];
    for (const [body, field] of cases) {
      const res = await post(body);
      expect(res.status, field).toBe(400);
      expect(res.body.error.field, field).toBe(field);
    }
  });

  it('answers 422 with the reason for a spec that cannot be built', async () => {
    const res = await post({ ...RACK_PLAN_EXAMPLE, tub: { ...RACK_PLAN_EXAMPLE.tub, height: 100 } });
    expect(res.status).toBe(422);
    expect(res.body.error.field).toBe('tub.height');
    expect(res.body.error.message).toMatch(/cannot be built/);
  });

  it('answers 413 to an oversized body and 400 to malformed JSON, never 500', async () => {
    const big = await post({ ...RACK_PLAN_EXAMPLE, padding: 'x'.repeat(1_100_000) });
    expect(big.status).toBe(413);
    const broken = await request(app).post('/api/v1/calc/rack-plan').set(asRole('builder')).set('content-type', 'application/json').send('{"tub":');
    expect(broken.status).toBe(400);
  });

  it('checks the role: keepers do not size racks, requests without the gateway identity are refused', async () => {
    expect((await post(RACK_PLAN_EXAMPLE, 'keeper')).status).toBe(403);
    expect((await request(app).post('/api/v1/calc/rack-plan').send(RACK_PLAN_EXAMPLE)).status).toBe(401);
  });
});
