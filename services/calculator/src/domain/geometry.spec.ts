import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { RackPlanRequest, type RackPlanRequestInput } from '../../../../shared/api/rack-plan.js';
import { UnbuildableSpecError } from './errors.js';
import { balancedSplit, baysOf, fewestBalancedSections, fitsSheet, longestOnSheet, rackGeometry, sidePanelHeight } from './geometry.js';
import { normaliseRequest } from './rack-spec.js';
import { arbitraryRequest } from './rack-arbitraries.js';

const spec = (input: RackPlanRequestInput) => normaliseRequest(RackPlanRequest.parse(input));
const tub = { length: 23, width: 16.25, height: 6.5 };

describe('sidePanelHeight', () => {
  it('is k openings plus k - 1 shelves (common practice)', () => {
    // 4 x 6 5/8 + 3 x 1/2 = 26.5 + 1.5
    expect(sidePanelHeight(4, 6.625, 0.5)).toBe(28);
    expect(sidePanelHeight(1, 6.625, 0.5)).toBe(6.625);
  });
});

describe('sections', () => {
  it('splits balanced, larger sections lowest', () => {
    expect(balancedSplit(12, 3)).toEqual([4, 4, 4]);
    expect(balancedSplit(12, 5)).toEqual([3, 3, 2, 2, 2]);
    expect(balancedSplit(9, 2)).toEqual([5, 4]);
  });

  it('uses the fewest sections under the limit', () => {
    // opening 6 5/8, shelf 1/2: k levels take 7 1/8 k - 1/2, so 96 in holds 13 levels (92.125) but not 14 (99.25)
    expect(fewestBalancedSections(13, 6.625, 0.5, 96)).toEqual([13]);
    expect(fewestBalancedSections(14, 6.625, 0.5, 96)).toEqual([7, 7]);
    expect(fewestBalancedSections(27, 6.625, 0.5, 96)).toEqual([9, 9, 9]);
    expect(fewestBalancedSections(12, 6.625, 0.5, 40)).toEqual([4, 4, 4]); // 5 levels take 35.125, 6 take 42.25
    expect(fewestBalancedSections(3, 6.625, 0.5, 6)).toEqual([]);
  });

  it('a section exactly at the limit is allowed', () => {
    expect(fewestBalancedSections(4, 6.625, 0.5, 28)).toEqual([4]);
  });

  it('places dowels only on upper sections and a bottom only on the lowest', () => {
    const g = rackGeometry(spec({ tub, layout: { levels: 14, columns: 2 } }));
    expect(g.sections.map((s) => [s.levels, s.hasBottomPanel, s.dowels, s.firstLevel])).toEqual([
      [7, true, 0, 1],
      [7, false, 2, 8],
    ]);
  });

  it('takes explicit levels per section as given', () => {
    const g = rackGeometry(spec({ tub, layout: { levels: 12, columns: 1 }, sections: { levelsPerSection: [5, 4, 3] } }));
    expect(g.sections.map((s) => s.levels)).toEqual([5, 4, 3]);
    expect(g.sections[2].sidePanelHeightIn).toBe(sidePanelHeight(3, 6.625, 0.5));
  });
});

describe('sheet fitting', () => {
  const sheet = { lengthIn: 96, widthIn: 48 };
  it('turns a part either way', () => {
    expect(fitsSheet(40, 90, sheet)).toBe(true);
    expect(fitsSheet(96, 48, sheet)).toBe(true);
    expect(fitsSheet(97, 10, sheet)).toBe(false);
    expect(fitsSheet(50, 50, sheet)).toBe(false);
  });
  it('knows the longest part of a width', () => {
    expect(longestOnSheet(23.5, sheet)).toBe(96);
    expect(longestOnSheet(60, sheet)).toBe(48);
    expect(longestOnSheet(100, sheet)).toBe(0);
  });
});

describe('bays', () => {
  it('splits columns between dividers', () => {
    expect(baysOf(3, 0)).toEqual([3]);
    expect(baysOf(3, 1)).toEqual([2, 1]);
    expect(baysOf(6, 2)).toEqual([2, 2, 2]);
  });
});

describe('unbuildable specs', () => {
  const fails = (input: RackPlanRequestInput, field: string) => {
    try {
      rackGeometry(spec(input));
    } catch (e) {
      expect(e).toBeInstanceOf(UnbuildableSpecError);
      expect((e as UnbuildableSpecError).field).toBe(field);
      return;
    }
    throw new Error('expected UnbuildableSpecError');
  };
  it('rejects a level opening taller than the sheet', () => {
    fails({ tub: { length: 23, width: 16, height: 100 }, layout: { levels: 1, columns: 1 } }, 'tub.height');
  });
  it('rejects panels deeper than the sheet', () => {
    fails({ tub: { length: 120, width: 16, height: 6 }, layout: { levels: 1, columns: 1 } }, 'tub.length');
  });
  it('rejects a single level above maxSidePanelLength', () => {
    fails({ tub, layout: { levels: 3, columns: 1 }, sections: { maxSidePanelLength: 6 } }, 'sections.maxSidePanelLength');
  });
  it('rejects an explicit section too tall for the sheet', () => {
    fails({ tub, layout: { levels: 15, columns: 1 }, sections: { levelsPerSection: [14, 1] } }, 'sections.levelsPerSection');
  });
});

describe('geometry properties', () => {
  it('stack-up: openings plus shelves make each side panel, sections make the carcass, n + 1 horizontal panels', () => {
    fc.assert(
      fc.property(arbitraryRequest, (input) => {
        const s = spec(input);
        const g = rackGeometry(s);
        const t = s.construction.panelThicknessIn;
        let horizontal = 1; // bottom panel
        let carcass = s.construction.bottomThicknessIn;
        for (const section of g.sections) {
          expect(section.sidePanelHeightIn).toBeCloseTo(section.levels * g.levelOpeningIn + (section.levels - 1) * t, 9);
          expect(section.sidePanelHeightIn).toBeLessThanOrEqual(s.construction.sheet.lengthIn + 1e-7);
          horizontal += section.levels - 1 + 1; // interior shelves + top
          carcass += section.sidePanelHeightIn + t;
        }
        expect(horizontal).toBe(input.layout.levels + 1);
        expect(g.sections.reduce((a, x) => a + x.levels, 0)).toBe(input.layout.levels);
        expect(g.carcassHeightIn).toBeCloseTo(carcass, 9);
        // balanced: sizes differ by at most one
        const sizes = g.sections.map((x) => x.levels);
        expect(Math.max(...sizes) - Math.min(...sizes)).toBeLessThanOrEqual(1);
      }),
    );
  });

  it('more levels never make a shorter rack', () => {
    fc.assert(
      fc.property(arbitraryRequest, (input) => {
        fc.pre(input.layout.levels < 30);
        const a = rackGeometry(spec(input));
        const b = rackGeometry(spec({ ...input, layout: { ...input.layout, levels: input.layout.levels + 1 } }));
        expect(b.overallHeightIn).toBeGreaterThan(a.overallHeightIn);
        expect(b.carcassHeightIn).toBeGreaterThan(a.carcassHeightIn);
      }),
    );
  });
});
