import { describe, expect, it } from 'vitest';
import { RACK_PLAN_EXAMPLE, RACK_PLAN_RULES, RackPlanRequest, RackPlanResponse } from '../../../../shared/api/rack-plan.js';
import { LENGTH_DEFAULTS_IN, normaliseRequest } from './rack-spec.js';

const tub = { length: 23, width: 16.25, height: 6.5 };
const issuePath = (input: unknown) => {
  const r = RackPlanRequest.safeParse(input);
  return r.success ? null : r.error.issues.map((i) => i.path.join('.'));
};

describe('RackPlanRequest schema', () => {
  it('applies the defaults of the issue', () => {
    const r = RackPlanRequest.parse({ tub, layout: { levels: 9, columns: 3 } });
    expect(r.unit).toBe('in');
    expect(r.layout.dividers).toBe(0);
    expect(r.construction.backPanel).toBe(false);
    expect(r.construction.carcassMaterial).toBe('pvc-rigid');
    expect(r.joints).toEqual({ screwsPerCorner: 3, screwsPerShelfEnd: 2, screwsPerDividerEnd: 2, screwsPerBaseCorner: 2, screwsPerBraceEnd: 2, screwsPerCasterPlate: 3, dowelsPerJoint: 2 });
    expect(r.base.lockingCasters).toBe(2);
    expect(r.heat.supplyVoltage).toBe(120);
  });

  it.each([
    [{ tub: { ...tub, length: -1 }, layout: { levels: 2, columns: 1 } }, 'tub.length'],
    [{ tub: { ...tub, width: 0 }, layout: { levels: 2, columns: 1 } }, 'tub.width'],
    [{ tub: { ...tub, height: Infinity }, layout: { levels: 2, columns: 1 } }, 'tub.height'],
    [{ tub: { ...tub, height: '6' }, layout: { levels: 2, columns: 1 } }, 'tub.height'],
    [{ tub, layout: { levels: 31, columns: 1 } }, 'layout.levels'],
    [{ tub, layout: { levels: 0, columns: 1 } }, 'layout.levels'],
    [{ tub, layout: { levels: 2.5, columns: 1 } }, 'layout.levels'],
    [{ tub, layout: { levels: 2, columns: 13 } }, 'layout.columns'],
    [{ tub, layout: { levels: 2, columns: 3, dividers: 3 } }, 'layout.dividers'],
    [{ unit: 'cm', tub, layout: { levels: 2, columns: 1 } }, 'unit'],
    [{ tub, layout: { levels: 2, columns: 1 }, construction: { carcassMaterial: 'oak' } }, 'construction.carcassMaterial'],
    [{ tub, layout: { levels: 2, columns: 1 }, sections: { levelsPerSection: [1, 2] } }, 'sections.levelsPerSection'],
    [{ tub, layout: { levels: 3, columns: 1 }, sections: { levelsPerSection: [1, 2], maxSidePanelLength: 50 } }, 'sections.levelsPerSection'],
    [{ tub, layout: { levels: 2, columns: 1 }, prices: { unicorn: 3 } }, 'prices'],
    [{ tub, layout: { levels: 2, columns: 1 }, extra: 1 }, ''],
  ])('rejects bad input and names the field (%#)', (input, field) => {
    expect(issuePath(input)).toContain(field);
  });

  it('accepts the example, and the example is 9 x 3 of the 23 x 16.25 x 6.5 tub', () => {
    expect(issuePath(RACK_PLAN_EXAMPLE)).toBeNull();
    expect(RACK_PLAN_EXAMPLE.layout).toMatchObject({ levels: 9, columns: 3 });
    expect(RACK_PLAN_EXAMPLE.tub).toMatchObject(tub);
  });

  it('writes the geometry rules into the API description', () => {
    expect(RackPlanRequest.description).toContain(RACK_PLAN_RULES);
    expect(RackPlanResponse.description).toContain(RACK_PLAN_RULES);
    for (const rule of ['lid gap', 'k x levelOpening + (k - 1) x panelThickness', 'n + 1 horizontal panels', 'fewest sections', '5wL^4/384EI', '80 %']) {
      expect(RACK_PLAN_RULES).toContain(rule);
    }
  });
});

describe('normaliseRequest', () => {
  it('fills unit-dependent defaults in inches', () => {
    const s = normaliseRequest(RackPlanRequest.parse({ tub, layout: { levels: 2, columns: 1 } }));
    expect(s.allowances.lidGapIn).toBe(LENGTH_DEFAULTS_IN.lidGap);
    expect(s.construction.bottomThicknessIn).toBe(s.construction.panelThicknessIn);
    expect(s.sections).toEqual({ maxSidePanelLengthIn: 96 }); // the sheet length
    expect(s.tub.loadedMassLb).toBe(4.5);
  });

  it('converts a millimetre request exactly and keeps inch defaults', () => {
    const s = normaliseRequest(
      RackPlanRequest.parse({ unit: 'mm', tub: { length: 584.2, width: 412.75, height: 165.1, loadedMass: 2 }, layout: { levels: 2, columns: 1 }, allowances: { lidGap: 3 } }),
    );
    expect(s.tub.lengthIn).toBeCloseTo(23, 12);
    expect(s.allowances.lidGapIn).toBeCloseTo(3 / 25.4, 12);
    expect(s.allowances.sidePlayIn).toBe(0.5);
    expect(s.tub.loadedMassLb).toBeCloseTo(2 / 0.45359237, 12);
  });

  it('makes the side panel limit side panel limit follow a custom sheet', () => {
    const s = normaliseRequest(RackPlanRequest.parse({ tub, layout: { levels: 2, columns: 1 }, construction: { sheet: { length: 120, width: 60 } } }));
    expect(s.sections).toEqual({ maxSidePanelLengthIn: 120 });
  });
});
