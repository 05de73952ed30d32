import { EPS, cutNode, hole, partLeaf, type GNode, type Piece, type SheetTree } from './types.js';

/** A free rectangle: a hole node of some sheet's tree with its position in usable coordinates. */
export interface FreeRect {
  sheet: number;
  node: GNode;
  x: number;
  y: number;
  length: number;
  width: number;
}

export type FitRule = 'best-area' | 'best-short-side' | 'best-long-side' | 'first';
export type SplitRule = 'shorter-leftover' | 'longer-leftover' | 'max-area' | 'rip-first' | 'cross-first';
export type SortRule = 'area' | 'long-side' | 'length' | 'width' | 'perimeter';

export interface GuillotineRules {
  fit: FitRule;
  split: SplitRule;
  sort: SortRule;
}

export const FIT_RULES: FitRule[] = ['best-area', 'best-short-side', 'best-long-side', 'first'];
export const SPLIT_RULES: SplitRule[] = ['shorter-leftover', 'longer-leftover', 'max-area', 'rip-first', 'cross-first'];
export const SORT_RULES: SortRule[] = ['area', 'long-side', 'length', 'width', 'perimeter'];

/** Working state of a guillotine packing: the sheets' trees and their free rectangles. */
export interface Packing {
  sheets: SheetTree[];
  free: FreeRect[];
}

export function emptyPacking(): Packing {
  return { sheets: [], free: [] };
}

export function openSheet(packing: Packing, stock: number, length: number, width: number): FreeRect {
  const root = hole();
  packing.sheets.push({ stock, length, width, root });
  const rect: FreeRect = { sheet: packing.sheets.length - 1, node: root, x: 0, y: 0, length, width };
  packing.free.push(rect);
  return rect;
}

const sortKey: Record<SortRule, (p: Piece) => number[]> = {
  area: (p) => [p.length * p.width, Math.max(p.length, p.width)],
  'long-side': (p) => [Math.max(p.length, p.width), Math.min(p.length, p.width)],
  length: (p) => [p.length, p.width],
  width: (p) => [p.width, p.length],
  perimeter: (p) => [p.length + p.width, p.length],
};

export function sortPieces(pieces: readonly Piece[], rule: SortRule): Piece[] {
  const key = sortKey[rule];
  return [...pieces].sort((a, b) => {
    const ka = key(a);
    const kb = key(b);
    return kb[0] - ka[0] || kb[1] - ka[1] || a.part - b.part;
  });
}

function fitScore(rule: FitRule, free: FreeRect, l: number, w: number): number {
  switch (rule) {
    case 'best-area':
      return free.length * free.width - l * w;
    case 'best-short-side':
      return Math.min(free.length - l, free.width - w);
    case 'best-long-side':
      return Math.max(free.length - l, free.width - w);
    case 'first':
      return 0;
  }
}

/** Whether to rip first (cut along y at the part's width across the whole free rectangle). */
function ripFirst(rule: SplitRule, free: FreeRect, l: number, w: number): boolean {
  const leftX = free.length - l;
  const leftY = free.width - w;
  switch (rule) {
    case 'shorter-leftover':
      return leftX <= leftY;
    case 'longer-leftover':
      return leftX > leftY;
    case 'max-area':
      // Keep the single largest free rectangle as large as possible.
      return Math.max(leftX * w, free.length * leftY) >= Math.max(leftX * free.width, l * leftY);
    case 'rip-first':
      return true;
    case 'cross-first':
      return false;
  }
}

/**
 * Puts a part of size l x w (as placed) into the corner of a free rectangle, turning its hole node
 * into the cuts that free the part, and returns the free rectangles that are left.
 */
export function placeInFree(
  free: FreeRect,
  part: number,
  rotated: boolean,
  l: number,
  w: number,
  kerf: number,
  rip: boolean,
): FreeRect[] {
  const out: FreeRect[] = [];
  const leaf = partLeaf(part, rotated);
  const add = (node: GNode, x: number, y: number, length: number, width: number) => {
    if (length > EPS && width > EPS) out.push({ sheet: free.sheet, node, x, y, length, width });
  };
  let replacement: GNode;
  if (rip) {
    let band: GNode = leaf;
    if (l < free.length - EPS) {
      const right = hole();
      band = cutNode('x', l, leaf, right);
      add(right, free.x + l + kerf, free.y, free.length - l - kerf, w);
    }
    replacement = band;
    if (w < free.width - EPS) {
      const top = hole();
      replacement = cutNode('y', w, band, top);
      add(top, free.x, free.y + w + kerf, free.length, free.width - w - kerf);
    }
  } else {
    let column: GNode = leaf;
    if (w < free.width - EPS) {
      const top = hole();
      column = cutNode('y', w, leaf, top);
      add(top, free.x, free.y + w + kerf, l, free.width - w - kerf);
    }
    replacement = column;
    if (l < free.length - EPS) {
      const right = hole();
      replacement = cutNode('x', l, column, right);
      add(right, free.x + l + kerf, free.y, free.length - l - kerf, free.width);
    }
  }
  Object.assign(free.node, replacement);
  return out;
}

export interface Orientation {
  l: number;
  w: number;
  rotated: boolean;
}

export function orientations(p: Piece): Orientation[] {
  const list: Orientation[] = [{ l: p.length, w: p.width, rotated: false }];
  if (p.canRotate && Math.abs(p.length - p.width) > EPS) list.push({ l: p.width, w: p.length, rotated: true });
  return list;
}

/**
 * Places one piece into the best free rectangle by the rule. Returns false when none fits (the
 * caller may open a sheet). The free list is updated in place.
 */
export function placePiece(packing: Packing, piece: Piece, kerf: number, rules: GuillotineRules): boolean {
  let best: { index: number; o: Orientation; score: number } | null = null;
  for (let i = 0; i < packing.free.length; i++) {
    const f = packing.free[i];
    for (const o of orientations(piece)) {
      if (o.l > f.length + EPS || o.w > f.width + EPS) continue;
      const score = fitScore(rules.fit, f, o.l, o.w);
      if (!best || score < best.score - EPS) best = { index: i, o, score };
    }
    if (best && rules.fit === 'first') break;
  }
  if (!best) return false;
  const f = packing.free[best.index];
  const rest = placeInFree(f, piece.part, best.o.rotated, best.o.l, best.o.w, kerf, ripFirst(rules.split, f, best.o.l, best.o.w));
  packing.free.splice(best.index, 1, ...rest);
  return true;
}

/**
 * Packs pieces in the rule's order, into the free rectangles of `start` (e.g. the leftovers of a
 * strip plan) and then into new sheets. Returns null if a piece fits no new sheet either.
 */
export function packGuillotine(
  pieces: readonly Piece[],
  stock: number,
  length: number,
  width: number,
  kerf: number,
  rules: GuillotineRules,
  start?: Packing,
): Packing | null {
  const packing = start ? clonePacking(start) : emptyPacking();
  for (const piece of sortPieces(pieces, rules.sort)) {
    if (placePiece(packing, piece, kerf, rules)) continue;
    openSheet(packing, stock, length, width);
    if (!placePiece(packing, piece, kerf, rules)) return null;
  }
  return packing;
}

/** Deep copy: packers mutate trees in place. */
export function clonePacking(p: Packing): Packing {
  const map = new Map<GNode, GNode>();
  const copy = (n: GNode): GNode => {
    const c: GNode = { ...n };
    if (n.first) c.first = copy(n.first);
    if (n.second) c.second = copy(n.second);
    map.set(n, c);
    return c;
  };
  const sheets = p.sheets.map((s) => ({ ...s, root: copy(s.root) }));
  const free = p.free.map((f) => ({ ...f, node: map.get(f.node)! }));
  return { sheets, free };
}

/** Fewer sheets first; then more free area in one piece (a more useful offcut). */
export function betterPacking(a: Packing, b: Packing | null): boolean {
  if (!b) return true;
  if (a.sheets.length !== b.sheets.length) return a.sheets.length < b.sheets.length;
  const largest = (p: Packing) => p.free.reduce((m, f) => Math.max(m, f.length * f.width), 0);
  return largest(a) > largest(b) + EPS;
}

/**
 * Tries every combination of sort, fit and split rule and keeps the best packing, stopping early
 * at `target` sheets or at the deadline.
 */
export function bestGuillotine(
  pieces: readonly Piece[],
  stock: number,
  length: number,
  width: number,
  kerf: number,
  options: { target?: number; deadline?: number; start?: Packing } = {},
): Packing | null {
  let best: Packing | null = null;
  const deadline = options.deadline ?? Infinity;
  for (const sort of SORT_RULES) {
    for (const split of SPLIT_RULES) {
      for (const fit of FIT_RULES) {
        const result = packGuillotine(pieces, stock, length, width, kerf, { sort, split, fit }, options.start);
        if (result && betterPacking(result, best)) best = result;
        if (best && options.target !== undefined && best.sheets.length <= options.target) return best;
        if (best && Date.now() > deadline) return best;
      }
    }
  }
  return best;
}
