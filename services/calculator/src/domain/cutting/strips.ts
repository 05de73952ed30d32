import { cutOneDimensional } from './one-dimensional.js';
import { emptyPacking, openSheet, placeInFree, type FreeRect, type Packing } from './guillotine.js';
import { EPS, type Piece } from './types.js';

export interface StripPlan {
  packing: Packing;
  /** Pieces the strips did not take (their width differs from the strip width). */
  rest: Piece[];
  stripWidth: number;
}

/**
 * The strip width that covers the most part area: rack parts mostly share the rack's depth, so
 * ripping strips of it and cross-cutting them is a one-dimensional problem.
 */
export function dominantWidth(pieces: readonly Piece[], sheetLength: number, sheetWidth: number): number | null {
  const areaByWidth = new Map<number, number>();
  for (const p of pieces) {
    const sides = p.canRotate ? [p.width, p.length] : [p.width];
    for (const side of new Set(sides)) {
      const along = side === p.width ? p.length : p.width;
      if (side > sheetWidth + EPS || along > sheetLength + EPS) continue;
      const key = Math.round(side * 1e6) / 1e6;
      areaByWidth.set(key, (areaByWidth.get(key) ?? 0) + p.length * p.width);
    }
  }
  let best: number | null = null;
  for (const [w, area] of areaByWidth) if (best === null || area > areaByWidth.get(best)! + EPS) best = w;
  return best;
}

/**
 * Rips strips of `stripWidth` along the sheet length, solves the cross-cutting of the pieces of that
 * width as bin packing (strips are the bins) and stacks the strips on sheets. Leftover space in
 * strips and sheets stays as free rectangles for other pieces.
 */
export function planStrips(
  pieces: readonly Piece[],
  stock: number,
  sheetLength: number,
  sheetWidth: number,
  kerf: number,
  stripWidth: number,
  deadline: number,
): StripPlan | null {
  const inStrips: Array<{ piece: Piece; along: number; rotated: boolean }> = [];
  const rest: Piece[] = [];
  for (const p of pieces) {
    if (Math.abs(p.width - stripWidth) < EPS && p.length <= sheetLength + EPS) inStrips.push({ piece: p, along: p.length, rotated: false });
    else if (p.canRotate && Math.abs(p.length - stripWidth) < EPS && p.width <= sheetLength + EPS)
      inStrips.push({ piece: p, along: p.width, rotated: true });
    else rest.push(p);
  }
  const perSheet = Math.floor((sheetWidth + kerf + EPS) / (stripWidth + kerf));
  if (inStrips.length < 2 || perSheet < 1) return null;
  const result = cutOneDimensional(
    inStrips.map((s) => s.along),
    sheetLength,
    kerf,
    { deadline },
  );
  // Fullest strips first, so the last sheet keeps the most free space.
  const load = (bin: number[]) => bin.reduce((s, i) => s + inStrips[i].along, 0);
  const strips = [...result.bins].sort((a, b) => load(b) - load(a));
  const packing = emptyPacking();
  for (let s = 0; s < strips.length; s += perSheet) {
    let free: FreeRect = openSheet(packing, stock, sheetLength, sheetWidth);
    packing.free.pop();
    for (const bin of strips.slice(s, s + perSheet)) {
      const items = [...bin].sort((a, b) => inStrips[b].along - inStrips[a].along);
      // Rip the strip off what is left of the sheet, then cross-cut its pieces one after another.
      const first = inStrips[items[0]];
      const after = placeInFree(free, first.piece.part, first.rotated, first.along, stripWidth, kerf, true);
      let stripRest = after.find((f) => Math.abs(f.y - free.y) < EPS) ?? null;
      const sheetRest = after.find((f) => f.y > free.y + EPS) ?? null;
      for (const i of items.slice(1)) {
        const item = inStrips[i];
        if (!stripRest) throw new Error('strip overflow');
        const next = placeInFree(stripRest, item.piece.part, item.rotated, item.along, stripWidth, kerf, true);
        stripRest = next[0] ?? null;
      }
      if (stripRest) packing.free.push(stripRest);
      if (!sheetRest) break;
      free = sheetRest;
    }
    const last = packing.sheets.length - 1;
    // What is left across the sheet after its strips is free too.
    if (free.node.kind === 'hole' && free.sheet === last) packing.free.push(free);
  }
  return { packing, rest, stripWidth };
}
