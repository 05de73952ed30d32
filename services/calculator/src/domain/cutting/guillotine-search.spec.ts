import { describe, expect, it } from 'vitest';
import { treeToLayout } from './cut-sequence.js';
import { searchGuillotine } from './guillotine-search.js';
import { checkLayout } from './layout-checker.js';
import type { Piece } from './types.js';

describe('guillotine search', () => {
  it('rebuilds a sheet cut into a nested guillotine pattern (zero kerf)', () => {
    // 10 x 6 cut at x = 4; the left 4 x 6 cut at y = 2; the right 6 x 6 cut at y = 3 and its top at x = 2.
    const sizes = [
      [4, 2],
      [4, 4],
      [6, 3],
      [2, 3],
      [4, 3],
    ];
    const pieces: Piece[] = sizes.map(([length, width], part) => ({ part, length, width, canRotate: false }));
    const found = searchGuillotine(pieces, 0, 10, 6, 0, 1, { deadline: Date.now() + 2000 });
    expect(found?.sheets).toHaveLength(1);
    const layout = treeToLayout(found!.sheets[0], 0, 0);
    expect(checkLayout({ ...layout, offcuts: [] }, { length: 10, width: 6 }, pieces, 0, 0)).toEqual([]);
    expect(layout.placements).toHaveLength(5);
  });

  it('gives up at once when the parts outweigh the target sheets', () => {
    const pieces: Piece[] = [0, 1].map((part) => ({ part, length: 6, width: 6, canRotate: true }));
    const started = Date.now();
    expect(searchGuillotine(pieces, 0, 10, 6, 0, 1, { deadline: Date.now() + 2000 })).toBeNull();
    expect(Date.now() - started).toBeLessThan(500);
  });
});
