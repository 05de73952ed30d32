import { describe, expect, it } from 'vitest';
import { CUTTING_PLAN_EXAMPLE, CuttingPlanRequest, CuttingPlanResponse, type CuttingPlanRequestInput } from '../../../../../shared/api/cutting-plan.js';
import { planCutting } from './cutting-plan.js';
import { checkPlan } from './layout-checker.js';
import { PartTooLargeError, StockExhaustedError } from './types.js';

function planChecked(input: CuttingPlanRequestInput) {
  const request = CuttingPlanRequest.parse(input);
  const plan = planCutting(request);
  expect(checkPlan(request, plan)).toEqual([]);
  expect(CuttingPlanResponse.safeParse(plan).success).toBe(true);
  return plan;
}

const sheet = { material: 'pvc', kind: 'sheet' as const, length: 96, width: 48 };

describe('planCutting', () => {
  it('plans the example: sheets and boards, each at its bound', () => {
    const plan = planChecked(CUTTING_PLAN_EXAMPLE);
    const [pvc, lumber] = plan.materials;
    // 10 panels longer than 48 and 23 1/2 deep: two per sheet (centre-line bound), so 5 sheets.
    expect(pvc).toMatchObject({ material: 'pvc-1/2', kind: 'sheet', stockUsed: 5, lowerBound: 5, optimal: true });
    // Two 50 1/4 rails: no two on a 96 board.
    expect(lumber).toMatchObject({ kind: 'board', stockUsed: 2, lowerBound: 2, optimal: true });
    expect(plan.svg).toHaveLength(pvc.layouts.length + lumber.layouts.length);
    expect(pvc.yield).toBeCloseTo((2 * 63.625 + 8 * 50.25) * 23.5 / (5 * 96 * 48), 6);
  });

  it('lists offcuts of the sheets as free pieces of the cut sequence', () => {
    const plan = planChecked({ unit: 'in', kerf: 0.125, stock: [sheet], parts: [{ name: 'shelf', material: 'pvc', length: 50.25, width: 23.5 }] });
    const offcuts = plan.materials[0].layouts[0].offcuts;
    // Hand-computed, for either first cut: rip first leaves 45 5/8 x 23 1/2 beside the shelf and
    // 96 x 24 3/8 across; cross-cut first leaves 45 5/8 x 48 and 50 1/4 x 24 3/8.
    const ripFirst = [
      { x: 0, y: 23.625, length: 96, width: 24.375 },
      { x: 50.375, y: 0, length: 45.625, width: 23.5 },
    ];
    const crossFirst = [
      { x: 50.375, y: 0, length: 45.625, width: 48 },
      { x: 0, y: 23.625, length: 50.25, width: 24.375 },
    ];
    expect([ripFirst, crossFirst]).toContainEqual(offcuts);
  });

  it('uses offcut stock with a quantity first', () => {
    const plan = planChecked({
      unit: 'in',
      kerf: 0.125,
      stock: [sheet, { material: 'pvc', kind: 'sheet', length: 30, width: 24, quantity: 1 }],
      parts: [
        { name: 'divider', material: 'pvc', length: 23.5, width: 6.625, quantity: 3 },
        { name: 'side', material: 'pvc', length: 63.625, width: 23.5 },
      ],
    });
    const layouts = plan.materials[0].layouts;
    const onOffcut = layouts.find((l) => l.stock === 1)!;
    expect(onOffcut.placements.length).toBe(3);
    expect(plan.materials[0].stockUsed).toBe(2);
  });

  it('respects trim and forbidden rotation', () => {
    const plan = planChecked({
      unit: 'mm',
      kerf: 3,
      trim: 10,
      stock: [{ material: 'ply', kind: 'sheet', length: 2440, width: 1220 }],
      parts: [{ name: 'bottom', material: 'ply', length: 1200, width: 600, quantity: 5, canRotate: false }],
    });
    for (const l of plan.materials[0].layouts) {
      for (const p of l.placements) {
        expect(p.rotated).toBe(false);
        expect(p.x).toBeGreaterThanOrEqual(10);
        expect(p.y).toBeGreaterThanOrEqual(10);
      }
    }
    // 1200 + 3 + 1200 = 2403 <= 2420 and 600 + 3 + 600 > 1200: two per sheet, three sheets.
    expect(plan.materials[0].stockUsed).toBe(3);
  });

  it('plans a batch of parts from several racks in one go', () => {
    const parts = ['rack A', 'rack B', 'rack C'].flatMap((source) => [
      { name: 'side', material: 'pvc', length: 63.625, width: 23.5, quantity: 2, source },
      { name: 'shelf', material: 'pvc', length: 50.25, width: 23.5, quantity: 8, source },
      { name: 'divider', material: 'pvc', length: 6.625, width: 23.5, quantity: 18, source },
    ]);
    const plan = planChecked({ unit: 'in', kerf: 0.125, stock: [sheet], parts });
    // 30 long parts, two per sheet: 15 (centre-line bound); dividers go in the strips' rest.
    expect(plan.materials[0]).toMatchObject({ stockUsed: 15, lowerBound: 15, optimal: true });
  });

  it('throws PartTooLargeError naming the part', () => {
    const input = { unit: 'in' as const, kerf: 0, stock: [sheet], parts: [{ name: 'huge', material: 'pvc', length: 97, width: 49 }] };
    expect(() => planCutting(input)).toThrow(PartTooLargeError);
    expect(() => planCutting(input)).toThrow(/huge/);
    // Fits only when turned, and turning is forbidden.
    const turned = { ...input, parts: [{ name: 'tall', material: 'pvc', length: 40, width: 60, canRotate: false }] };
    expect(() => planCutting(turned)).toThrow(PartTooLargeError);
  });

  it('throws StockExhaustedError when the limited stock runs out', () => {
    const input = {
      unit: 'in' as const,
      kerf: 0,
      stock: [{ ...sheet, quantity: 1 }],
      parts: [{ name: 'half', material: 'pvc', length: 96, width: 30, quantity: 2 }],
    };
    expect(() => planCutting(input)).toThrow(StockExhaustedError);
  });

  it('stops at the time limit with the best plan and its bound', () => {
    const parts = Array.from({ length: 60 }, (_, i) => ({ name: `p${i}`, material: 'pvc', length: 10 + ((i * 37) % 70), width: 5 + ((i * 53) % 40) }));
    const started = Date.now();
    const plan = planChecked({ unit: 'in', kerf: 0.125, stock: [sheet], parts, timeLimitMs: 300 });
    expect(Date.now() - started).toBeLessThan(1500);
    expect(plan.materials[0].stockUsed).toBeGreaterThanOrEqual(plan.materials[0].lowerBound);
  });
});
