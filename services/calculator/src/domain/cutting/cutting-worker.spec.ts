import { afterAll, describe, expect, it } from 'vitest';
import { CUTTING_PLAN_EXAMPLE } from '../../../../../shared/api/cutting-plan.js';
import { planCutting } from './cutting-plan.js';
import runCuttingTask, { createCuttingPool, unwrapCuttingResult } from './cutting-worker.js';
import { PartTooLargeError } from './types.js';

describe('cutting worker', () => {
  const pool = createCuttingPool({ maxThreads: 1 });
  afterAll(() => pool.destroy());
  const direct = planCutting(CUTTING_PLAN_EXAMPLE);

  it('the task function plans like planCutting', () => {
    const viaTask = unwrapCuttingResult(runCuttingTask({ request: CUTTING_PLAN_EXAMPLE, queuedAt: Date.now() }));
    expect(viaTask.materials.map((m) => m.stockUsed)).toEqual(direct.materials.map((m) => m.stockUsed));
  });

  it('runs a plan on a worker thread', async () => {
    const plan = unwrapCuttingResult(await pool.run({ request: CUTTING_PLAN_EXAMPLE, queuedAt: Date.now() }));
    expect(plan.materials.map((m) => m.stockUsed)).toEqual(direct.materials.map((m) => m.stockUsed));
  }, 20_000);

  it('brings a part that fits no stock back as the same typed error', () => {
    const tooBig = { unit: 'in' as const, kerf: 0, stock: [{ material: 'pvc', kind: 'sheet' as const, length: 10, width: 10 }], parts: [{ name: 'slab', material: 'pvc', length: 20, width: 20 }] };
    expect(() => unwrapCuttingResult(runCuttingTask({ request: tooBig }))).toThrow(PartTooLargeError);
  });
});
