import { describe, expect, it } from 'vitest';
import { CUTTING_PLAN_EXAMPLE, CuttingPlanRequest, MAX_PARTS, TOO_MANY_PARTS } from '../../../../../shared/api/cutting-plan.js';

const base = structuredClone(CUTTING_PLAN_EXAMPLE);

describe('cutting-plan request schema', () => {
  it('accepts the example and fills defaults', () => {
    const r = CuttingPlanRequest.parse(base);
    expect(r.parts[0].canRotate).toBe(true);
    expect(r.stock[1].quantity).toBeNull();
  });

  it.each([
    ['zero length', { length: 0 }, 'length'],
    ['negative width', { width: -1 }, 'width'],
    ['infinite length', { length: Infinity }, 'length'],
  ])('rejects a part with %s, naming the field', (_, change, field) => {
    const input = structuredClone(base);
    Object.assign(input.parts[0], change);
    const result = CuttingPlanRequest.safeParse(input);
    expect(result.success).toBe(false);
    expect(result.error!.issues[0].path).toEqual(['parts', 0, field]);
  });

  it('rejects a part whose material has no stock', () => {
    const input = structuredClone(base);
    input.parts[1].material = 'oak';
    const result = CuttingPlanRequest.safeParse(input);
    expect(result.error!.issues.map((i) => i.path)).toContainEqual(['parts', 1, 'material']);
  });

  it('rejects unknown members', () => {
    expect(CuttingPlanRequest.safeParse({ ...base, colour: 'red' }).success).toBe(false);
  });

  it('flags more than MAX_PARTS pieces so the HTTP layer can answer 413', () => {
    const input = structuredClone(base);
    input.parts[0].quantity = MAX_PARTS;
    const result = CuttingPlanRequest.safeParse(input);
    const issue = result.error!.issues.find((i) => i.path.join('.') === 'parts');
    expect(issue).toBeDefined();
    expect((issue as { params?: { reason?: string; limit?: number } }).params).toEqual({ reason: TOO_MANY_PARTS, limit: MAX_PARTS });
  });
});
