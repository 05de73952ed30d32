import {
  FIT_RULES,
  SORT_RULES,
  SPLIT_RULES,
  emptyPacking,
  openSheet,
  placePiece,
  sortPieces,
  type Packing,
} from './guillotine.js';
import { EPS, type Piece, type Rect } from './types.js';

/**
 * Leftovers worth keeping: both sides at least `minSide` (by default the smallest side of any part
 * of the material, since anything smaller cannot become one of these parts).
 */
export function usableOffcuts(holes: readonly Rect[], minSide: number): Rect[] {
  return holes.filter((h) => Math.min(h.length, h.width) >= minSide - EPS);
}

/** Smallest side among the pieces (boards: the shortest length). */
export function smallestSide(pieces: readonly Piece[]): number {
  let min = Infinity;
  for (const p of pieces) min = Math.min(min, p.width > 0 ? Math.min(p.length, p.width) : p.length);
  return min;
}

/**
 * Fills one limited stock piece (typically a recorded offcut) with as much part area as the guillotine
 * rules can fit; the pieces that did not fit are returned for the next stock.
 */
export function fillOneSheet(
  pieces: readonly Piece[],
  stock: number,
  length: number,
  width: number,
  kerf: number,
): { packing: Packing; placed: Piece[]; rest: Piece[] } {
  let best: { packing: Packing; placed: Piece[]; rest: Piece[]; area: number } | null = null;
  for (const sort of SORT_RULES) {
    for (const split of SPLIT_RULES) {
      for (const fit of FIT_RULES) {
        const packing = emptyPacking();
        openSheet(packing, stock, length, width);
        const placed: Piece[] = [];
        const rest: Piece[] = [];
        for (const p of sortPieces(pieces, sort)) (placePiece(packing, p, kerf, { sort, split, fit }) ? placed : rest).push(p);
        const area = placed.reduce((s, p) => s + p.length * Math.max(p.width, 1), 0);
        if (!best || area > best.area + EPS) best = { packing, placed, rest, area };
      }
    }
  }
  return best!;
}
