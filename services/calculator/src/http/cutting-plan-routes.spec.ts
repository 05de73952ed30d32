import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { CUTTING_PLAN_EXAMPLE, CuttingPlanRequest, CuttingPlanResponse, MAX_PARTS } from '../../../../shared/api/cutting-plan.js';
import { RACK_PLAN_EXAMPLE, RackPlanResponse } from '../../../../shared/api/rack-plan.js';
import { checkPlan } from '../domain/cutting/layout-checker.js';
import { createApp } from '../app.js';
import { pooledCutting } from './cutting-runner.js';
import { asRole, CALC_TEST_SECRET, calculatorTestApp } from './test-support.js';

const app = calculatorTestApp();
const post = (path: string, body: unknown) => request(app).post(path).set(asRole('builder')).send(body as object);

describe('POST /api/v1/calc/cutting-plan', () => {
  it('answers valid guillotine layouts for the example', async () => {
    const res = await post('/api/v1/calc/cutting-plan', CUTTING_PLAN_EXAMPLE);
    expect(res.status).toBe(200);
    expect(CuttingPlanResponse.safeParse(res.body).success).toBe(true);
    expect(checkPlan(CuttingPlanRequest.parse(CUTTING_PLAN_EXAMPLE), res.body)).toEqual([]);
  });

  it('answers 422 naming a part larger than every stock, 400 for a part without stock, 413 past the part limit', async () => {
    const huge = await post('/api/v1/calc/cutting-plan', {
      unit: 'in', kerf: 0.125, stock: [{ material: 'pvc', kind: 'sheet', length: 96, width: 48 }],
      parts: [{ name: 'ok', material: 'pvc', length: 20, width: 20 }, { name: 'too big', material: 'pvc', length: 100, width: 50 }],
    });
    expect(huge.status).toBe(422);
    expect(huge.body.error.field).toBe('parts[1]');
    const orphan = await post('/api/v1/calc/cutting-plan', {
      unit: 'in', kerf: 0.125, stock: [{ material: 'pvc', kind: 'sheet', length: 96, width: 48 }],
      parts: [{ name: 'x', material: 'oak', length: 10, width: 10 }],
    });
    expect(orphan.status).toBe(400);
    expect(orphan.body.error.field).toBe('parts[0].material');
    const many = await post('/api/v1/calc/cutting-plan', {
      unit: 'in', kerf: 0.125, stock: [{ material: 'pvc', kind: 'sheet', length: 96, width: 48 }],
      parts: [{ name: 'x', material: 'pvc', length: 1, width: 1, quantity: MAX_PARTS }, { name: 'y', material: 'pvc', length: 1, width: 1 }],
    });
    expect(many.status).toBe(413);
    const negative = await post('/api/v1/calc/cutting-plan', { ...CUTTING_PLAN_EXAMPLE, kerf: -1 });
    expect(negative.status).toBe(400);
    expect(negative.body.error.field).toBe('kerf');
  });
});

describe('rack plans carry their cutting plan', () => {
  it('nests every part of the example rack and costs the nested sheet count', async () => {
    const res = await post('/api/v1/calc/rack-plan', RACK_PLAN_EXAMPLE);
    expect(res.status).toBe(200);
    expect(RackPlanResponse.safeParse(res.body).success).toBe(true);
    const cutting = res.body.cutting;
    const placed = cutting.materials.flatMap((m: { layouts: { count: number; placements: unknown[] }[] }) => m.layouts.flatMap((l) => Array(l.count).fill(l.placements.length))).reduce((a: number, b: number) => a + b, 0);
    const pieces = res.body.parts.reduce((sum: number, p: { quantity: number }) => sum + p.quantity, 0);
    expect(placed).toBe(pieces);
    const pvc = cutting.materials.find((m: { material: string }) => m.material.startsWith('pvc-rigid'));
    expect(pvc.stockUsed).toBeGreaterThanOrEqual(pvc.lowerBound);
    const sheetLine = res.body.cost.sheets.find((s: { material: string }) => s.material === 'pvc-rigid');
    expect(sheetLine).toMatchObject({ count: pvc.stockUsed, method: 'nested' });
  });

  it('skips nesting when asked, falling back to the area estimate', async () => {
    const res = await post('/api/v1/calc/rack-plan', { ...RACK_PLAN_EXAMPLE, cutting: { include: false } });
    expect(res.body.cutting).toBeUndefined();
    expect(res.body.cost.sheets[0].method).toBe('area-estimate');
  });
});

describe('the worker pool', () => {
  const pool = pooledCutting(1);
  afterAll(() => pool.close());

  it('plans on a worker thread and reports part errors from there as 422', async () => {
    const pooled = createApp({ internalSecret: CALC_TEST_SECRET, runCutting: pool.run });
    const ok = await request(pooled).post('/api/v1/calc/cutting-plan').set(asRole('owner')).send(CUTTING_PLAN_EXAMPLE);
    expect(ok.status).toBe(200);
    const huge = await request(pooled).post('/api/v1/calc/cutting-plan').set(asRole('owner')).send({
      unit: 'in', kerf: 0, stock: [{ material: 'pvc', kind: 'sheet', length: 96, width: 48 }],
      parts: [{ name: 'too big', material: 'pvc', length: 100, width: 50 }],
    });
    expect(huge.status).toBe(422);
    expect(huge.body.error.field).toBe('parts[0]');
  }, 30_000);
});
