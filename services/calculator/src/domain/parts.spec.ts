import { describe, expect, it } from 'vitest';
import { RackPlanRequest, type RackPlanRequestInput } from '../../../../shared/api/rack-plan.js';
import { fitsSheet, rackGeometry } from './geometry.js';
import { analyseShelves } from './loads.js';
import { isSheetPart, rackParts } from './parts.js';
import { normaliseRequest } from './rack-spec.js';

function parts(input: RackPlanRequestInput) {
  const s = normaliseRequest(RackPlanRequest.parse(input));
  const g = rackGeometry(s);
  return { s, g, parts: rackParts(s, g, analyseShelves(s, g)) };
}
const get = (list: ReturnType<typeof parts>['parts'], key: string) => list.filter((p) => p.key === key);

describe('rackParts', () => {
  const { g, parts: list } = parts({ tub: { length: 16, width: 6, height: 4, loadedMass: 1 }, layout: { levels: 14, columns: 2, dividers: 1 }, sections: { maxSidePanelLength: 40 } });

  it('gives each section two side panels, its shelves and a top; the lowest a bottom', () => {
    expect(get(list, 'side-panel').map((p) => [p.section, p.quantity])).toEqual([[1, 2], [2, 2]]);
    expect(get(list, 'interior-shelf').map((p) => p.quantity)).toEqual([6, 6]);
    expect(get(list, 'top-panel')).toHaveLength(2);
    expect(get(list, 'bottom-panel').map((p) => [p.section, p.material])).toEqual([[1, 'plywood']]);
  });

  it('cuts the base from 2x4 at actual 1 1/2 x 3 1/2 in (PS 20)', () => {
    const rails = get(list, 'base-rail')[0];
    expect([rails.quantity, rails.lengthIn, rails.thicknessIn, rails.widthIn]).toEqual([2, g.outerShelfLengthIn, 1.5, 3.5]);
    expect(get(list, 'base-cross-member')[0]).toMatchObject({ quantity: 2, lengthIn: g.depthIn - 3, section: null });
    expect(get(list, 'base-centre-brace')[0]).toMatchObject({ quantity: 1, lengthIn: g.depthIn - 3 });
  });

  it('has no support blocks or back panel unless needed or asked', () => {
    expect(get(list, 'support-block-front')).toHaveLength(0);
    expect(get(list, 'back-panel')).toHaveLength(0);
  });

  it('splits a back panel wider than the sheet into strips that fit', () => {
    const r = parts({ tub: { length: 20, width: 17, height: 6 }, layout: { levels: 8, columns: 3, dividers: 2 }, construction: { backPanel: true } });
    const back = get(r.parts, 'back-panel');
    expect(back).toHaveLength(1);
    expect(back[0].quantity).toBe(2);
    expect(back[0].widthIn * 2).toBeCloseTo(r.g.outerShelfLengthIn, 9);
    expect(r.g.overallDepthIn).toBeCloseTo(r.g.depthIn + 0.5, 12);
  });

  it('every sheet part fits the sheet', () => {
    const r = parts({ tub: { length: 23, width: 16.25, height: 6.5 }, layout: { levels: 20, columns: 3 }, construction: { backPanel: true } });
    for (const p of r.parts.filter(isSheetPart)) expect(fitsSheet(p.lengthIn, p.widthIn, r.s.construction.sheet)).toBe(true);
  });
});
