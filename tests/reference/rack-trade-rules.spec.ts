import { describe, expect, it } from 'vitest';
import { RackPlanRequest, type RackPlanRequestInput } from '../../shared/api/rack-plan.js';
import { planRack } from '../../services/calculator/src/domain/rack-plan.js';

// The builders' rules of thumb from issue 3, marked common practice; each value worked by hand.
const plan = (input: RackPlanRequestInput) => planRack(RackPlanRequest.parse(input));
const tub = { length: 23, width: 16.25, height: 6.5, loadedMass: 4.5 };

describe('trade rules (common practice)', () => {
  // dividers between every column leave one-column bays, so no support blocks change the width
  const p = plan({ tub, layout: { levels: 9, columns: 3, dividers: 2 } });

  it('a level opening is the tub height plus a 1/8 in lid gap: 6.5 + 0.125 = 6 5/8', () => {
    expect(p.dimensions.levelOpening).toBe(6.625);
    expect(p.display.dimensions.levelOpening).toBe('6 5/8');
  });

  it('the interior shelf for 3 columns is 3 x 16.25 + 0.5 + 2 x 0.5 = 50.25, outer 51.25', () => {
    expect(p.dimensions.interiorShelfLength).toBe(50.25);
    expect(p.dimensions.outerShelfLength).toBe(51.25);
    expect(p.display.dimensions.outerShelfLength).toBe('51 1/4');
  });

  it('every panel is the tub length plus 1/2 in deep: 23.5', () => {
    expect(p.dimensions.depth).toBe(23.5);
    for (const part of p.parts.filter((x) => x.material !== 'lumber-2x4' && !x.key.startsWith('support'))) {
      expect(part.width).toBe(23.5);
    }
  });

  it('a 33 in interior shelf gives a 34 in top', () => {
    // 2 x 16 + 0.5 play + 1 divider x 0.5 = 33
    const q = plan({ tub: { ...tub, width: 16 }, layout: { levels: 4, columns: 2, dividers: 1 } });
    expect(q.dimensions.interiorShelfLength).toBe(33);
    expect(q.parts.find((x) => x.key === 'top-panel')!.length).toBe(34);
    expect(q.parts.find((x) => x.key === 'bottom-panel')!.length).toBe(34);
  });

  it('side panels are the openings plus the shelves between them: 9 x 6.625 + 8 x 0.5 = 63.625', () => {
    expect(p.sections[0].sidePanelHeight).toBe(63.625);
    expect(p.display.sections[0].sidePanelHeight).toBe('63 5/8');
  });

  it('stacked sections: only the lowest has a bottom, two dowels per joint', () => {
    // 14 levels: 14 x 6.625 + 13 x 0.5 = 99.25 > 96, so two sections of 7 (7 x 6.625 + 6 x 0.5 = 49.375)
    const q = plan({ tub, layout: { levels: 14, columns: 3, dividers: 2 } });
    expect(q.sections.map((s) => [s.levels, s.sidePanelHeight, s.hasBottomPanel, s.dowels])).toEqual([
      [7, 49.375, true, 0],
      [7, 49.375, false, 2],
    ]);
    // bottom + 2 x (side + top) = 0.5 + 2 x 49.875
    expect(q.dimensions.carcassHeight).toBe(100.25);
  });
});
