import { describe, expect, it } from 'vitest';
import { treeKey, treeToLayout } from './cut-sequence.js';
import { cutNode, hole, partLeaf, type SheetTree } from './types.js';

describe('cut sequence', () => {
  // A 10 x 6 sheet, kerf 0.5: rip at y = 3, then cross-cut the lower strip at x = 4.
  const sheet: SheetTree = {
    stock: 0,
    length: 10,
    width: 6,
    root: cutNode('y', 3, cutNode('x', 4, partLeaf(0, false), hole()), partLeaf(1, true)),
  };

  it('lists rips before cross-cuts and numbers the pieces in order', () => {
    const out = treeToLayout(sheet, 0.5, 0);
    expect(out.cuts).toEqual([
      { step: 1, axis: 'y', at: 3, piece: 0 },
      { step: 2, axis: 'x', at: 4, piece: 1 },
    ]);
    // Hand-computed: part 1 starts past the kerf at 3.5 and is 6 - 3.5 = 2.5 wide.
    expect(out.placements).toEqual([
      { part: 1, x: 0, y: 3.5, length: 10, width: 2.5, rotated: true },
      { part: 0, x: 0, y: 0, length: 4, width: 3, rotated: false },
    ]);
    expect(out.holes).toEqual([{ x: 4.5, y: 0, length: 5.5, width: 3 }]);
  });

  it('offsets everything by the trim', () => {
    const out = treeToLayout(sheet, 0.5, 1);
    expect(out.cuts[0]).toEqual({ step: 1, axis: 'y', at: 4, piece: 0 });
    expect(out.placements[1]).toMatchObject({ x: 1, y: 1 });
  });

  it('gives equal trees equal keys', () => {
    expect(treeKey(sheet.root)).toBe(treeKey(structuredClone(sheet.root)));
    expect(treeKey(sheet.root)).not.toBe(treeKey(cutNode('y', 3, hole(), hole())));
  });
});
