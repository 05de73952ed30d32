import type { Piece } from './types.js';

/** Relative tolerance: decimal sizes such as 36.6 + 26.8 + 36.6 must count as exactly 100. */
const REL = 1e-9;

/** Rounds a ratio up, forgiving floating-point noise. */
export function ceilTolerant(value: number): number {
  return Math.ceil(value - REL * Math.max(1, Math.abs(value)));
}

/** Continuous bound: total size over capacity, rounded up. */
export function continuousBound(sizes: readonly number[], capacity: number): number {
  const sum = sizes.reduce((a, b) => a + b, 0);
  return sizes.length === 0 ? 0 : ceilTolerant(sum / capacity);
}

/**
 * Martello and Toth's L2 bound for one-dimensional bin packing (Martello & Toth 1990,
 * "Knapsack Problems", ch. 8): for each threshold a <= C/2, items above C - a each need a bin of their
 * own, items in (C/2, C - a] too, and the items in [a, C/2] must fill what those leave plus new bins.
 * Kerf is the caller's business: pass size + kerf and capacity + kerf.
 */
export function martelloTothL2(sizes: readonly number[], capacity: number): number {
  if (sizes.length === 0) return 0;
  const eps = REL * capacity;
  const half = capacity / 2;
  const thresholds = new Set<number>([0]);
  for (const s of sizes) if (s <= half + eps) thresholds.add(s);
  let best = continuousBound(sizes, capacity);
  for (const a of thresholds) {
    let n1 = 0;
    let n2 = 0;
    let sum2 = 0;
    let sum3 = 0;
    for (const s of sizes) {
      if (s > capacity - a + eps) n1++;
      else if (s > half + eps) {
        n2++;
        sum2 += s;
      } else if (s >= a - eps) sum3 += s;
    }
    const spill = sum3 - (n2 * capacity - sum2);
    const bound = n1 + n2 + Math.max(0, ceilTolerant(spill / capacity));
    if (bound > best) best = bound;
  }
  return best;
}

/** Area bound for sheets: total part area over the usable sheet area, rounded up. */
export function areaBound(pieces: readonly Piece[], sheetLength: number, sheetWidth: number): number {
  const area = pieces.reduce((sum, p) => sum + p.length * p.width, 0);
  return pieces.length === 0 ? 0 : ceilTolerant(area / (sheetLength * sheetWidth));
}

/**
 * Centre-line bound for sheets. Pieces longer along x than (L - kerf) / 2 in every orientation that fits
 * are stacked along y on any sheet: their y-extents (plus kerf) must fit the sheet width, a 1D bin
 * packing whose L2 bound is a bound for the sheets. The same holds with the axes swapped.
 */
export function centreLineBound(pieces: readonly Piece[], sheetLength: number, sheetWidth: number, kerf: number): number {
  const along = (alongLen: number, acrossLen: number, swap: boolean): number => {
    const sizes: number[] = [];
    for (const p of pieces) {
      const orientations: Array<[number, number]> = [swap ? [p.width, p.length] : [p.length, p.width]];
      if (p.canRotate) orientations.push(swap ? [p.length, p.width] : [p.width, p.length]);
      const fitting = orientations.filter(([a, b]) => a <= alongLen * (1 + REL) && b <= acrossLen * (1 + REL));
      if (fitting.length === 0) continue;
      // Two such pieces cannot lie side by side along x (a1 + kerf + a2 > L), so their x-ranges
      // pairwise overlap and, by Helly's theorem on a line, one vertical line crosses them all.
      if (fitting.every(([a]) => 2 * a + kerf > alongLen * (1 + REL))) {
        sizes.push(Math.min(...fitting.map(([, b]) => b)) + kerf);
      }
    }
    return martelloTothL2(sizes, acrossLen + kerf);
  };
  return Math.max(along(sheetLength, sheetWidth, false), along(sheetWidth, sheetLength, true));
}

/** Best bound we know for a sheet material (all pieces on one usable sheet size). */
export function sheetLowerBound(pieces: readonly Piece[], sheetLength: number, sheetWidth: number, kerf: number): number {
  return Math.max(areaBound(pieces, sheetLength, sheetWidth), centreLineBound(pieces, sheetLength, sheetWidth, kerf));
}

/** Best bound for boards: L2 on lengths with the kerf transform. */
export function boardLowerBound(lengths: readonly number[], boardLength: number, kerf: number): number {
  return martelloTothL2(
    lengths.map((l) => l + kerf),
    boardLength + kerf,
  );
}
