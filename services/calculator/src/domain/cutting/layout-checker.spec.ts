import { describe, expect, it } from 'vitest';
import { checkLayout, checkPlan, type CheckedLayout } from './layout-checker.js';
import { CuttingPlanRequest } from '../../../../../shared/api/cutting-plan.js';

const parts = [
  { length: 4, width: 3, canRotate: false },
  { length: 10, width: 2.5, canRotate: true },
];
const stock = { length: 10, width: 6 };
// Hand-made sound layout: rip at y = 3 (kerf 0.5), cross-cut the lower strip at x = 4.
const sound = (): CheckedLayout => ({
  placements: [
    { part: 0, x: 0, y: 0, length: 4, width: 3, rotated: false },
    { part: 1, x: 0, y: 3.5, length: 10, width: 2.5, rotated: false },
  ],
  cuts: [
    { step: 1, axis: 'y', at: 3, piece: 0 },
    { step: 2, axis: 'x', at: 4, piece: 1 },
  ],
  offcuts: [{ x: 4.5, y: 0, length: 5.5, width: 3 }],
});

describe('layout checker', () => {
  it('accepts a sound layout', () => {
    expect(checkLayout(sound(), stock, parts, 0.5, 0)).toEqual([]);
  });

  it('finds parts closer than the kerf', () => {
    const l = sound();
    l.placements[1].y = 3.25;
    expect(checkLayout(l, stock, parts, 0.5, 0).join()).toMatch(/closer than the kerf/);
  });

  it('finds parts outside the stock or inside the trim', () => {
    const l = sound();
    expect(checkLayout(l, stock, parts, 0.5, 0.25).join()).toMatch(/outside the stock/);
  });

  it('finds a cut sequence that does not produce the placements', () => {
    const l = sound();
    l.cuts[1].at = 5;
    expect(checkLayout(l, stock, parts, 0.5, 0).join()).toMatch(/no piece of the cut sequence/);
    const m = sound();
    m.cuts.pop();
    expect(checkLayout(m, stock, parts, 0.5, 0).join()).toMatch(/no piece of the cut sequence/);
  });

  it('rejects a pinwheel, which no edge-to-edge cut can separate', () => {
    // Four 6 x 4 parts around a 4 x 4 hole... in a 10 x 10 sheet, kerf 0: there is no first cut.
    const pin = [{ length: 6, width: 4, canRotate: true }];
    const layout: CheckedLayout = {
      placements: [
        { part: 0, x: 0, y: 0, length: 6, width: 4, rotated: false },
        { part: 0, x: 6, y: 0, length: 4, width: 6, rotated: true },
        { part: 0, x: 4, y: 6, length: 6, width: 4, rotated: false },
        { part: 0, x: 0, y: 4, length: 4, width: 6, rotated: true },
      ],
      cuts: [],
      offcuts: [],
    };
    expect(checkLayout(layout, { length: 10, width: 10 }, pin, 0, 0)).not.toEqual([]);
  });

  it('finds a turned part that may not turn, and a wrong size', () => {
    const l = sound();
    l.placements[0] = { part: 0, x: 0, y: 0, length: 3, width: 4, rotated: true };
    const errors = checkLayout(l, stock, parts, 0.5, 0).join();
    expect(errors).toMatch(/may not be rotated/);
    const m = sound();
    m.placements[0].length = 3.9;
    expect(checkLayout(m, stock, parts, 0.5, 0).join()).toMatch(/is not part 0/);
  });

  it('checks quantities across a plan', () => {
    const request = CuttingPlanRequest.parse({
      unit: 'in',
      kerf: 0.5,
      stock: [{ material: 'm', kind: 'sheet', length: 10, width: 6 }],
      parts: [
        { name: 'a', material: 'm', length: 4, width: 3, canRotate: false },
        { name: 'b', material: 'm', length: 10, width: 2.5, quantity: 2 },
      ],
    });
    const plan = {
      unit: 'in' as const,
      timedOut: false,
      svg: [''],
      materials: [{ material: 'm', kind: 'sheet' as const, stockUsed: 1, lowerBound: 1, optimal: true, yield: 0.6, layouts: [{ stock: 0, count: 1, ...sound() }] }],
    };
    expect(checkPlan(request, plan).join()).toMatch(/part 1 \(b\): 1 cut, 2 asked/);
  });
});
