import { emptyPacking, openSheet, orientations, placeInFree, type FreeRect, type Packing } from './guillotine.js';
import { seededRandom } from './one-dimensional.js';
import { EPS, type GNode, type Piece } from './types.js';

export interface SearchOptions {
  deadline: number;
  /** Nodes per attempt; attempts restart with random tie-breaking and a growing limit. */
  nodeLimit?: number;
  seed?: number;
}

class Aborted extends Error {}

/**
 * Exact-leaning search for a guillotine plan on `target` sheets ("bin completion" in two
 * dimensions). Free rectangles are filled depth first: a rectangle gets a piece in its corner and
 * is split, rip or cross-cut first, into the rectangles that remain, or it is given up as waste.
 * The waste allowed is what `target` sheets leave over the parts' area, which prunes hard when the
 * target is tight. Returns null when the attempts run out (not a proof of infeasibility).
 */
export function searchGuillotine(
  pieces: readonly Piece[],
  stock: number,
  length: number,
  width: number,
  kerf: number,
  target: number,
  options: SearchOptions,
): Packing | null {
  // Interchangeable pieces form one type, so the search never tries both of two equal pieces.
  const types: Array<{ piece: Piece; count: number }> = [];
  for (const p of pieces) {
    const t = types.find(
      (x) => Math.abs(x.piece.length - p.length) < EPS && Math.abs(x.piece.width - p.width) < EPS && x.piece.canRotate === p.canRotate,
    );
    if (t) t.count++;
    else types.push({ piece: p, count: 1 });
  }
  const partsOfType = types.map((t) => pieces.filter((p) => Math.abs(p.length - t.piece.length) < EPS && Math.abs(p.width - t.piece.width) < EPS && p.canRotate === t.piece.canRotate).map((p) => p.part));
  const partArea = pieces.reduce((s, p) => s + p.length * p.width, 0);
  const budget = target * length * width - partArea;
  if (budget < -EPS) return null;
  const random = seededRandom(options.seed ?? 7);
  let limit = Math.min(options.nodeLimit ?? 20_000, 2_000);
  for (let attempt = 0; Date.now() < options.deadline; attempt++) {
    const result = attemptOnce(attempt === 0 ? null : random, limit);
    if (result) return result;
    limit = Math.min(options.nodeLimit ?? 20_000, Math.ceil(limit * 1.5));
    if (attempt > 200) break;
  }
  return null;

  function attemptOnce(rand: (() => number) | null, nodeLimit: number): Packing | null {
    const packing = emptyPacking();
    const counts = types.map((t) => t.count);
    let left = pieces.length;
    let waste = 0;
    let nodes = 0;
    const stack: FreeRect[] = [];
    const usedParts: number[][] = types.map(() => []);

    const dfs = (): boolean => {
      if (left === 0) return true;
      if (++nodes > nodeLimit || ((nodes & 255) === 0 && Date.now() > options.deadline)) throw new Aborted();
      if (stack.length === 0) {
        if (packing.sheets.length >= target) return false;
        const root = openSheet(packing, stock, length, width);
        packing.free.pop();
        stack.push(root);
        if (dfs()) return true;
        stack.pop();
        packing.sheets.pop();
        return false;
      }
      const r = stack.pop()!;
      const area = r.length * r.width;
      const moves: Array<{ type: number; l: number; w: number; rotated: boolean; score: number }> = [];
      types.forEach((t, type) => {
        if (counts[type] === 0) return;
        for (const o of orientations(t.piece)) {
          if (o.l > r.length + EPS || o.w > r.width + EPS) continue;
          // Pieces that match a side of the rectangle leave the least awkward rest.
          const exact = (Math.abs(o.l - r.length) < EPS ? 1 : 0) + (Math.abs(o.w - r.width) < EPS ? 1 : 0);
          moves.push({ type, l: o.l, w: o.w, rotated: o.rotated, score: exact * 1e12 + o.l * o.w + (rand ? rand() * o.l * o.w * 0.5 : 0) });
        }
      });
      moves.sort((a, b) => b.score - a.score);
      for (const m of moves.slice(0, 6)) {
        const splits = Math.abs(m.l - r.length) < EPS || Math.abs(m.w - r.width) < EPS ? [true] : rand && rand() < 0.5 ? [false, true] : [true, false];
        for (const rip of splits) {
          const node: GNode = r.node;
          const part = partsOfType[m.type][usedParts[m.type].length];
          const rest = placeInFree(r, part, m.rotated, m.l, m.w, kerf, rip);
          const lost = area - m.l * m.w - rest.reduce((s, f) => s + f.length * f.width, 0);
          if (waste + lost <= budget + EPS) {
            counts[m.type]--;
            usedParts[m.type].push(part);
            left--;
            waste += lost;
            // Smaller rectangle last, so it is filled first while the choice of pieces is widest.
            rest.sort((a, b) => b.length * b.width - a.length * a.width);
            stack.push(...rest);
            if (dfs()) return true;
            stack.length -= rest.length;
            waste -= lost;
            left++;
            usedParts[m.type].pop();
            counts[m.type]++;
          }
          for (const k of Object.keys(node)) delete (node as unknown as Record<string, unknown>)[k];
          node.kind = 'hole';
        }
      }
      // Or leave the whole rectangle as waste.
      if (waste + area <= budget + EPS) {
        waste += area;
        if (dfs()) return true;
        waste -= area;
      }
      stack.push(r);
      return false;
    };

    try {
      return dfs() ? packing : null;
    } catch (e) {
      if (e instanceof Aborted) return null;
      throw e;
    }
  }
}
