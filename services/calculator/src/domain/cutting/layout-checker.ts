import type { CuttingPlanRequest, CuttingPlanResponse } from '../../../../../shared/api/cutting-plan.js';
import type { Cut, Placement, Rect } from './types.js';

const TOL = 1e-5;

export interface CheckedLayout {
  placements: Placement[];
  cuts: Cut[];
  offcuts: Rect[];
}

export interface CheckedStock {
  length: number;
  /** 0 for a board: one-dimensional, everything at y = 0 with width 0. */
  width: number;
}

export interface CheckedPart {
  length: number;
  width: number;
  canRotate: boolean;
}

const same = (a: number, b: number) => Math.abs(a - b) <= TOL;
const sameRect = (a: Rect, b: Rect) => same(a.x, b.x) && same(a.y, b.y) && same(a.length, b.length) && same(a.width, b.width);

/**
 * Checks one layout without trusting how it was made: parts inside the stock (trim removed), the
 * right size and orientation, kerf between every two parts, and the cut sequence, replayed edge to
 * edge from the whole stock, ending in pieces that are exactly the placements (so a saw can cut it).
 * Returns the problems found; empty when the layout is sound.
 */
export function checkLayout(
  layout: CheckedLayout,
  stock: CheckedStock,
  parts: readonly CheckedPart[],
  kerf: number,
  trim: number,
): string[] {
  const errors: string[] = [];
  const oneD = stock.width === 0;
  const inner: Rect = oneD
    ? { x: trim, y: 0, length: stock.length - 2 * trim, width: 0 }
    : { x: trim, y: trim, length: stock.length - 2 * trim, width: stock.width - 2 * trim };

  layout.placements.forEach((p, i) => {
    const part = parts[p.part];
    if (!part) return void errors.push(`placement ${i}: unknown part ${p.part}`);
    if (p.rotated && !part.canRotate) errors.push(`placement ${i}: part ${p.part} may not be rotated`);
    const [l, w] = p.rotated ? [part.width, part.length] : [part.length, part.width];
    if (!same(p.length, l) || !same(p.width, oneD ? 0 : w)) errors.push(`placement ${i}: size ${p.length} x ${p.width} is not part ${p.part}`);
    if (p.x < inner.x - TOL || p.x + p.length > inner.x + inner.length + TOL) errors.push(`placement ${i}: outside the stock along x`);
    if (p.y < inner.y - TOL || p.y + p.width > inner.y + inner.width + TOL) errors.push(`placement ${i}: outside the stock along y`);
  });

  // Any two parts are apart by at least the kerf along x or along y.
  const ps = layout.placements;
  for (let i = 0; i < ps.length; i++) {
    for (let j = i + 1; j < ps.length; j++) {
      const a = ps[i];
      const b = ps[j];
      const apartX = a.x + a.length + kerf <= b.x + TOL || b.x + b.length + kerf <= a.x + TOL;
      const apartY = !oneD && (a.y + a.width + kerf <= b.y + TOL || b.y + b.width + kerf <= a.y + TOL);
      if (!apartX && !apartY) errors.push(`placements ${i} and ${j} overlap or are closer than the kerf`);
    }
  }

  // Replay the cuts.
  const pieces: Array<Rect | null> = [inner];
  const isCut: boolean[] = [false];
  layout.cuts.forEach((c, k) => {
    if (c.step !== k + 1) errors.push(`cut ${k}: step ${c.step} out of order`);
    const piece = pieces[c.piece];
    if (!piece || isCut[c.piece]) {
      errors.push(`cut ${c.step}: piece ${c.piece} does not exist or is already cut`);
      pieces.push(null, null);
      isCut.push(true, true);
      return;
    }
    if (oneD && c.axis !== 'x') errors.push(`cut ${c.step}: a board is only cross-cut`);
    const start = c.axis === 'x' ? piece.x : piece.y;
    const end = start + (c.axis === 'x' ? piece.length : piece.width);
    if (!(c.at > start + TOL && c.at < end - TOL)) errors.push(`cut ${c.step}: at ${c.at} is not inside piece ${c.piece}`);
    isCut[c.piece] = true;
    const first: Rect = c.axis === 'x' ? { ...piece, length: c.at - start } : { ...piece, width: c.at - start };
    const rest = end - c.at - kerf;
    const second: Rect = c.axis === 'x' ? { ...piece, x: c.at + kerf, length: rest } : { ...piece, y: c.at + kerf, width: rest };
    pieces.push(first, rest > TOL ? second : null);
    isCut.push(false, false);
  });
  const leaves = pieces.filter((p, i): p is Rect => p !== null && !isCut[i]);
  const used = new Set<number>();
  ps.forEach((p, i) => {
    const leaf = leaves.findIndex((r, k) => !used.has(k) && sameRect(r, p));
    if (leaf < 0) errors.push(`placement ${i}: no piece of the cut sequence is exactly this part`);
    else used.add(leaf);
  });
  layout.offcuts.forEach((o, i) => {
    const leaf = leaves.findIndex((r, k) => !used.has(k) && sameRect(r, o));
    if (leaf < 0) errors.push(`offcut ${i}: not a free piece of the cut sequence`);
    else used.add(leaf);
  });
  return errors;
}

/** Checks every layout of a plan and that each part is cut exactly as often as requested. */
export function checkPlan(request: CuttingPlanRequest, plan: CuttingPlanResponse): string[] {
  const errors: string[] = [];
  const parts: CheckedPart[] = request.parts.map((p) => ({ length: p.length, width: p.width ?? 0, canRotate: p.canRotate }));
  const cutCount = new Array<number>(request.parts.length).fill(0);
  let layouts = 0;
  for (const m of plan.materials) {
    let used = 0;
    for (const [i, layout] of m.layouts.entries()) {
      layouts++;
      used += layout.count;
      const stock = request.stock[layout.stock];
      if (!stock || stock.material !== m.material) {
        errors.push(`${m.material} layout ${i}: stock ${layout.stock} is not of this material`);
        continue;
      }
      const dims: CheckedStock = { length: stock.length, width: stock.kind === 'sheet' ? stock.width : 0 };
      for (const e of checkLayout(layout, dims, parts, request.kerf, request.trim)) errors.push(`${m.material} layout ${i}: ${e}`);
      for (const p of layout.placements) {
        if (request.parts[p.part]?.material !== m.material) errors.push(`${m.material} layout ${i}: part ${p.part} is another material`);
        cutCount[p.part] += layout.count;
      }
    }
    if (used !== m.stockUsed) errors.push(`${m.material}: stockUsed ${m.stockUsed} but layouts use ${used}`);
    if (m.lowerBound > m.stockUsed) errors.push(`${m.material}: lower bound ${m.lowerBound} above the stock used ${m.stockUsed}`);
    if (m.optimal !== (m.stockUsed === m.lowerBound)) errors.push(`${m.material}: optimal flag disagrees with the bound`);
  }
  request.parts.forEach((p, i) => {
    if (cutCount[i] !== p.quantity) errors.push(`part ${i} (${p.name}): ${cutCount[i]} cut, ${p.quantity} asked`);
  });
  if (plan.svg.length !== layouts) errors.push(`${plan.svg.length} drawings for ${layouts} layouts`);
  return errors;
}
