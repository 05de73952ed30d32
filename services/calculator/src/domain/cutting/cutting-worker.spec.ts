import { afterAll, describe, expect, it } from 'vitest';
import { CUTTING_PLAN_EXAMPLE } from '../../../../../shared/api/cutting-plan.js';
import { planCutting } from './cutting-plan.js';
import runCuttingTask, { createCuttingPool } from './cutting-worker.js';

describe('cutting worker', () => {
  const pool = createCuttingPool({ maxThreads: 1 });
  afterAll(() => pool.destroy());

  it('the task function plans like planCutting', () => {
    const direct = planCutting(CUTTING_PLAN_EXAMPLE);
    const viaTask = runCuttingTask({ request: CUTTING_PLAN_EXAMPLE, queuedAt: Date.now() });
    expect(viaTask.materials.map((m) => m.stockUsed)).toEqual(direct.materials.map((m) => m.stockUsed));
  });

  it('runs a plan on a worker thread', async () => {
    const plan = await pool.run({ request: CUTTING_PLAN_EXAMPLE, queuedAt: Date.now() });
    expect(plan.materials.map((m) => m.stockUsed)).toEqual([5, 2]);
  }, 20_000);
});
