import { describe, expect, it } from 'vitest';
import { areaBound, boardLowerBound, centreLineBound, continuousBound, martelloTothL2, sheetLowerBound } from './lower-bounds.js';
import type { Piece } from './types.js';

const pieces = (n: number, length: number, width: number, canRotate = true): Piece[] =>
  Array.from({ length: n }, () => ({ part: 0, length, width, canRotate }));

describe('lower bounds (hand-computed)', () => {
  it('L2 beats the continuous bound when large items cannot pair', () => {
    // 60+45 > 100: each 60 needs its own bin, the three 45s need two more; sum 315 only says 4.
    const sizes = [60, 60, 60, 45, 45, 45];
    expect(continuousBound(sizes, 100)).toBe(4);
    expect(martelloTothL2(sizes, 100)).toBe(5);
  });

  it('L2 counts items above half the capacity', () => {
    expect(martelloTothL2([51, 51, 51, 10], 100)).toBe(3);
    expect(martelloTothL2([], 100)).toBe(0);
  });

  it('the kerf makes two half-length pieces need two boards', () => {
    // 48 + 1/8 + 48 = 96 1/8 > 96.
    expect(boardLowerBound([48, 48], 96, 0.125)).toBe(2);
    expect(boardLowerBound([48, 48], 96, 0)).toBe(1);
  });

  it('area bound rounds up and forgives decimal noise', () => {
    expect(areaBound(pieces(2, 50, 30), 96, 48)).toBe(1);
    // Ten 48 x 9.6 pieces are exactly one 96 x 48 sheet, whatever binary rounding says.
    expect(areaBound(pieces(10, 48, 9.6), 96, 48)).toBe(1);
    expect(areaBound(pieces(11, 48, 9.6), 96, 48)).toBe(2);
  });

  it('centre-line bound: parts longer than half a sheet that cannot turn stack two per sheet', () => {
    // 12 shelves 50 1/4 x 23 1/2 on 96 x 48: turned they are 50 1/4 across a 48 sheet, so every
    // one spans the middle of the length; two fit across 48 (47 1/8 with kerf), three do not: 6.
    const shelves = pieces(12, 50.25, 23.5);
    expect(areaBound(shelves, 96, 48)).toBe(4);
    expect(centreLineBound(shelves, 96, 48, 0.125)).toBe(6);
    expect(sheetLowerBound(shelves, 96, 48, 0.125)).toBe(6);
  });

  it('centre-line bound ignores parts that could turn to lie short along x', () => {
    // On an 80 x 48 sheet a 45 x 20 part turned is 20 along x and 45 across, so it need not span
    // the middle of the length.
    expect(centreLineBound(pieces(6, 45, 20, true), 80, 48, 0)).toBe(0);
    // Not allowed to turn: 45 > 40 along x always, 20 across; two per 48 width: 6 parts, 3 sheets.
    expect(centreLineBound(pieces(6, 45, 20, false), 80, 48, 0)).toBe(3);
  });
});
