import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { treeToLayout } from './cut-sequence.js';
import { FIT_RULES, SORT_RULES, SPLIT_RULES, bestGuillotine, packGuillotine } from './guillotine.js';
import { checkLayout } from './layout-checker.js';
import type { Piece } from './types.js';

const pieceArb = fc.record({
  length: fc.integer({ min: 8, max: 760 }).map((v) => v / 8),
  width: fc.integer({ min: 8, max: 380 }).map((v) => v / 8),
  canRotate: fc.boolean(),
});

describe('guillotine packing', () => {
  it('every rule gives layouts the checker accepts, with rotation only where allowed', () => {
    fc.assert(
      fc.property(fc.array(pieceArb, { minLength: 1, maxLength: 25 }), fc.constantFrom(0, 0.125, 0.25), (specs, kerf) => {
        const pieces: Piece[] = specs.map((s, part) => ({ part, ...s }));
        const rules = { sort: fc.sample(fc.constantFrom(...SORT_RULES), 1)[0], split: fc.sample(fc.constantFrom(...SPLIT_RULES), 1)[0], fit: fc.sample(fc.constantFrom(...FIT_RULES), 1)[0] };
        const packing = packGuillotine(pieces, 0, 96, 48, kerf, rules);
        expect(packing).not.toBeNull();
        const counted = new Array<number>(pieces.length).fill(0);
        for (const sheet of packing!.sheets) {
          const layout = treeToLayout(sheet, kerf, 0);
          expect(checkLayout({ ...layout, offcuts: layout.holes }, { length: 96, width: 48 }, pieces, kerf, 0)).toEqual([]);
          for (const p of layout.placements) counted[p.part]++;
        }
        expect(counted.every((c) => c === 1)).toBe(true);
      }),
      { numRuns: 80 },
    );
  });

  it('returns null when a piece fits no sheet', () => {
    const rules = { sort: 'area' as const, split: 'rip-first' as const, fit: 'best-area' as const };
    expect(packGuillotine([{ part: 0, length: 97, width: 10, canRotate: false }], 0, 96, 48, 0, rules)).toBeNull();
  });

  it('packs four quarter sheets on one sheet', () => {
    const quarter: Piece[] = Array.from({ length: 4 }, (_, part) => ({ part, length: 48, width: 24, canRotate: false }));
    expect(bestGuillotine(quarter, 0, 96, 48, 0)!.sheets).toHaveLength(1);
    // With a kerf no two fit on a sheet: 48 + 1/8 + 48 > 96 and 24 + 1/8 + 24 > 48.
    expect(bestGuillotine(quarter, 0, 96, 48, 0.125)!.sheets).toHaveLength(4);
  });
});
