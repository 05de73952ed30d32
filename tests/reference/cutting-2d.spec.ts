import { describe, expect, it } from 'vitest';
import { CuttingPlanRequest } from '../../shared/api/cutting-plan.js';
import { planCutting } from '../../services/calculator/src/domain/cutting/cutting-plan.js';
import { checkPlan } from '../../services/calculator/src/domain/cutting/layout-checker.js';
import { constructedInstance } from './data/constructed-2d.js';

// Source: tests/reference/data/constructed-2d.ts: sheets cut by random guillotine cuts with zero
// kerf, so the optimum is the number of sheets cut up (the pieces' area fills them exactly).
describe('two-dimensional optima known by construction', () => {
  it('the generator is reproducible and its pieces fill the sheets exactly', () => {
    const a = constructedInstance(5);
    expect(constructedInstance(5)).toEqual(a);
    const area = a.pieces.reduce((s, p) => s + p.length * p.width, 0);
    expect(area).toBeCloseTo(a.sheets * 96 * 48, 9);
  });

  it.each(Array.from({ length: 24 }, (_, i) => i + 1))('instance %i is solved to its optimum', (seed) => {
    const inst = constructedInstance(seed);
    const request = CuttingPlanRequest.parse({
      unit: 'in',
      kerf: 0,
      stock: [{ material: 'sheet', kind: 'sheet', length: inst.sheetLength, width: inst.sheetWidth }],
      parts: inst.pieces.map((p, i) => ({ name: `piece ${i + 1}`, material: 'sheet', length: p.length, width: p.width, canRotate: inst.canRotate })),
      timeLimitMs: 3000,
    });
    const plan = planCutting(request);
    expect(checkPlan(request, plan)).toEqual([]);
    expect(plan.materials[0].stockUsed).toBe(inst.sheets);
    expect(plan.materials[0].lowerBound).toBe(inst.sheets);
  });
});
