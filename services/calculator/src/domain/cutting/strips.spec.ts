import { describe, expect, it } from 'vitest';
import { treeToLayout } from './cut-sequence.js';
import { checkLayout } from './layout-checker.js';
import { dominantWidth, planStrips } from './strips.js';
import type { Piece } from './types.js';

const many = (n: number, part: number, length: number, width: number): Piece[] =>
  Array.from({ length: n }, () => ({ part, length, width, canRotate: true }));

describe('strips', () => {
  // A 27-tub rack's panels: all 23 1/2 deep (tub length 23 + 1/2).
  const rack = [...many(4, 0, 63.625, 23.5), ...many(8, 1, 50.25, 23.5), ...many(2, 2, 51.25, 23.5), ...many(18, 3, 6.625, 23.5), ...many(2, 4, 20, 10)];
  const parts = [
    { length: 63.625, width: 23.5, canRotate: true },
    { length: 50.25, width: 23.5, canRotate: true },
    { length: 51.25, width: 23.5, canRotate: true },
    { length: 6.625, width: 23.5, canRotate: true },
    { length: 20, width: 10, canRotate: true },
  ];

  it('picks the width shared by most part area', () => {
    expect(dominantWidth(rack, 96, 48)).toBe(23.5);
  });

  it('rips two strips per sheet, one long part each plus dividers in the rest', () => {
    const plan = planStrips(rack, 0, 96, 48, 0.125, 23.5, Date.now() + 1000)!;
    // 14 long parts, none two to a 96 strip (50 1/4 x 2 > 96): 14 strips, 7 sheets; 18 dividers
    // 6 3/4 with kerf fit in the strips' remainders (hand-checked: 4 after a side, 6 after a shelf).
    expect(plan.packing.sheets).toHaveLength(7);
    expect(plan.rest.map((p) => p.part)).toEqual([4, 4]);
    for (const sheet of plan.packing.sheets) {
      const layout = treeToLayout(sheet, 0.125, 0);
      expect(checkLayout({ ...layout, offcuts: [] }, { length: 96, width: 48 }, parts, 0.125, 0)).toEqual([]);
      expect(layout.cuts[0].axis).toBe('y');
    }
    const placed = plan.packing.sheets.flatMap((s) => treeToLayout(s, 0.125, 0).placements);
    expect(placed).toHaveLength(32);
  });
});
