import { describe, expect, it } from 'vitest';
import { RACK_PLAN_EXAMPLE, RackPlanRequest } from '../../shared/api/rack-plan.js';
import { planRack } from '../../services/calculator/src/domain/rack-plan.js';
import { LUMBER_2X4_IN } from '../../services/calculator/src/domain/rack-spec.js';

describe('2x4 lumber against PS 20', () => {
  it('a nominal 2x4 is 1-1/2 x 3-1/2 in dry (American Softwood Lumber Standard PS 20)', () => {
    expect(LUMBER_2X4_IN).toEqual({ thickness: 1.5, width: 3.5 });
  });

  it('the base lumber in a plan uses the actual size', () => {
    const plan = planRack(RackPlanRequest.parse(RACK_PLAN_EXAMPLE));
    const base = plan.parts.filter((p) => p.material === 'lumber-2x4');
    expect(base.map((p) => p.key).sort()).toEqual(['base-centre-brace', 'base-cross-member', 'base-rail']);
    for (const p of base) {
      expect(p.thickness).toBe(1.5); // PS 20
      expect(p.width).toBe(3.5); // PS 20
    }
    expect(base.find((p) => p.key === 'base-rail')!.quantity).toBe(2); // two rails (the issue)
  });
});
