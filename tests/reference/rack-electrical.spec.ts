import { describe, expect, it } from 'vitest';
import { BRANCH_CIRCUIT_RATINGS_A, CONTINUOUS_LOAD_FACTOR, circuitShare } from '../../services/calculator/src/domain/heat.js';
import { RACK_PLAN_EXAMPLE, RackPlanRequest } from '../../shared/api/rack-plan.js';
import { planRack } from '../../services/calculator/src/domain/rack-plan.js';

describe('branch circuits against NFPA 70', () => {
  it('continuous loads use 80 % of the rating (NFPA 70, 210.19(A)(1) and 210.20(A))', () => {
    expect(CONTINUOUS_LOAD_FACTOR).toBe(0.8);
  });

  it('a 15 A, 120 V circuit is 1800 W, 1440 W continuous (NFPA 70)', () => {
    const c = circuitShare(15, 0);
    expect(c.capacityW).toBe(1800);
    expect(c.continuousLimitW).toBe(1440);
  });

  it('a 20 A, 120 V circuit is 2400 W, 1920 W continuous (NFPA 70)', () => {
    const c = circuitShare(20, 1920);
    expect(c.capacityW).toBe(2400);
    expect(c.continuousLimitW).toBe(1920);
    expect(c.share).toBe(1);
  });

  it('a plan reports both circuits and the caution', () => {
    expect(BRANCH_CIRCUIT_RATINGS_A).toEqual([15, 20]);
    const plan = planRack(RackPlanRequest.parse(RACK_PLAN_EXAMPLE));
    expect(plan.heat.circuits.map((c) => [c.ratingA, c.continuousLimitW])).toEqual([[15, 1440], [20, 1920]]);
    expect(plan.heat.cautions.join(' ')).toMatch(/local electrical code/);
  });
});
