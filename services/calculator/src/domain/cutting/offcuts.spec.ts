import { describe, expect, it } from 'vitest';
import { fillOneSheet, smallestSide, usableOffcuts } from './offcuts.js';

describe('offcuts', () => {
  it('keeps leftovers whose both sides reach the minimum', () => {
    const holes = [
      { x: 0, y: 0, length: 30, width: 20 },
      { x: 0, y: 0, length: 30, width: 5 },
    ];
    expect(usableOffcuts(holes, 6)).toEqual([holes[0]]);
  });

  it('smallest side of the pieces', () => {
    expect(smallestSide([{ part: 0, length: 10, width: 4, canRotate: true }, { part: 1, length: 5, width: 6, canRotate: true }])).toBe(4);
  });

  it('fills an offcut with as much part area as fits and returns the rest', () => {
    // A 30 x 24 offcut takes the 24 x 20 part (turned or not) but not the 40 x 10 one.
    const pieces = [
      { part: 0, length: 40, width: 10, canRotate: true },
      { part: 1, length: 24, width: 20, canRotate: true },
      { part: 2, length: 5, width: 5, canRotate: false },
    ];
    const fill = fillOneSheet(pieces, 1, 30, 24, 0.125);
    expect(fill.placed.map((p) => p.part).sort()).toEqual([1, 2]);
    expect(fill.rest.map((p) => p.part)).toEqual([0]);
    expect(fill.packing.sheets).toHaveLength(1);
  });
});
