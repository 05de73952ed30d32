import { describe, expect, it } from 'vitest';
import { RackPlanRequest, type RackPlanRequestInput } from '../../../../shared/api/rack-plan.js';
import { rackGeometry } from './geometry.js';
import { casterCount, rackHardware } from './hardware.js';
import { analyseShelves } from './loads.js';
import { rackParts } from './parts.js';
import { normaliseRequest } from './rack-spec.js';

function hardware(input: RackPlanRequestInput) {
  const s = normaliseRequest(RackPlanRequest.parse(input));
  const g = rackGeometry(s);
  const items = rackHardware(s, g, rackParts(s, g, analyseShelves(s, g)));
  const total = (key: string) => items.filter((i) => i.key === key).reduce((a, i) => a + i.quantity, 0);
  return { items, total, casters: casterCount(s, g) };
}

// A narrow, stiff rack so that no support blocks appear: 14 levels in two sections of 7, one divider.
const input: RackPlanRequestInput = {
  tub: { length: 16, width: 6, height: 4, loadedMass: 1 },
  layout: { levels: 14, columns: 2, dividers: 1 },
  sections: { maxSidePanelLength: 40 },
};

describe('rackHardware with the default joint rules (common practice)', () => {
  const { items, total, casters } = hardware(input);

  it('counts the carcass screws by hand', () => {
    // sections: 14 levels of 4 1/8 in, 40 in max -> 8 levels (36.5) fit, so [7, 7]
    // tops: 3 x 2 corners x 2 = 12; bottom: 3 x 2 = 6; shelves: 2 x 2 ends x 12 = 48; dividers: 2 x 2 x 14 = 56
    expect(total('screw.carcass')).toBe(12 + 6 + 48 + 56);
  });

  it('counts base, caster and dowel hardware by hand', () => {
    expect(casters).toBe(4); // 13.5 in wide
    expect(total('screw.base')).toBe(2 * 4 + 2 * 2);
    expect(total('screw.caster')).toBe(3 * 4);
    expect(total('dowel')).toBe(2); // one joint
    expect(total('caster')).toBe(2);
    expect(total('caster.locking')).toBe(2);
    expect(total('pvc-cement')).toBe(1);
  });

  it('notes countersunk pilot holes in the plywood bottom', () => {
    expect(items.find((i) => i.name.includes('bottom'))!.note).toMatch(/countersunk pilot holes in the plywood/);
  });

  it('follows changed joint rules', () => {
    const h = hardware({ ...input, joints: { screwsPerCorner: 4, dowelsPerJoint: 3 }, base: { casterCount: 6, lockingCasters: 4 } });
    expect(h.total('dowel')).toBe(3);
    expect(h.total('caster.locking')).toBe(4);
    expect(h.total('caster')).toBe(2);
    expect(h.total('screw.caster')).toBe(18);
    expect(h.total('screw.carcass')).toBe(16 + 8 + 48 + 56);
  });
});
