import {
  CuttingPlanRequest,
  type CuttingLayout,
  type CuttingMaterialPlan,
  type CuttingPlanRequestInput,
  type CuttingPlanResponse,
} from '../../../../../shared/api/cutting-plan.js';
import { round6, treeKey, treeToLayout } from './cut-sequence.js';
import { betterPacking, bestGuillotine, emptyPacking, type Packing } from './guillotine.js';
import { searchGuillotine } from './guillotine-search.js';
import { boardLowerBound, sheetLowerBound } from './lower-bounds.js';
import { fillOneSheet, smallestSide, usableOffcuts } from './offcuts.js';
import { cutOneDimensional } from './one-dimensional.js';
import { dominantWidth, planStrips } from './strips.js';
import { layoutSvg } from './svg.js';
import { EPS, PartTooLargeError, StockExhaustedError, cutNode, hole, partLeaf, type GNode, type Piece, type SheetTree } from './types.js';

export interface PlanOptions {
  /** Overrides the request's timeLimitMs (e.g. a worker that already spent some of it waiting). */
  timeLimitMs?: number;
  /** Smallest side of an offcut worth listing; default the smallest part side of the material. */
  minOffcut?: number;
}

/** Boards are planned as sheets one nominal unit wide, so one tree type serves both. */
const BOARD_WIDTH = 1;

interface StockEntry {
  index: number;
  length: number;
  width: number;
  quantity: number | null;
  price: number;
}

interface MaterialResult {
  sheets: SheetTree[];
  lowerBound: number;
}

/** A sheet plan for one stock size: strips of the dominant width first, then general guillotine. */
export function planSheets(
  pieces: readonly Piece[],
  stock: number,
  length: number,
  width: number,
  kerf: number,
  deadline: number,
): { packing: Packing; lowerBound: number } {
  const lowerBound = sheetLowerBound(pieces, length, width, kerf);
  let best: Packing | null = null;
  const stripWidth = dominantWidth(pieces, length, width);
  if (stripWidth !== null) {
    const strips = planStrips(pieces, stock, length, width, kerf, stripWidth, Date.now() + (deadline - Date.now()) / 2);
    if (strips) {
      const filled =
        strips.rest.length === 0
          ? strips.packing
          : bestGuillotine(strips.rest, stock, length, width, kerf, { start: strips.packing, target: lowerBound, deadline });
      if (filled) best = filled;
    }
  }
  if (!best || best.sheets.length > lowerBound) {
    const general = bestGuillotine(pieces, stock, length, width, kerf, { target: lowerBound, deadline });
    if (general && betterPacking(general, best)) best = general;
  }
  // Heuristics above the bound: search for a plan on fewer sheets, the bound itself first.
  for (let target = lowerBound; best && target < best.sheets.length && Date.now() < deadline; target++) {
    const until = Date.now() + (deadline - Date.now()) * (target + 1 < best.sheets.length ? 0.6 : 1);
    const found = searchGuillotine(pieces, stock, length, width, kerf, target, { deadline: until });
    if (found) best = found;
  }
  return { packing: best ?? emptyPacking(), lowerBound };
}

/** Boards: one-dimensional cutting with kerf; each board becomes a chain of cross-cuts. */
export function planBoards(
  pieces: readonly Piece[],
  stock: number,
  length: number,
  kerf: number,
  deadline: number,
): { sheets: SheetTree[]; lowerBound: number } {
  const result = cutOneDimensional(
    pieces.map((p) => p.length),
    length,
    kerf,
    { deadline },
  );
  const sheets = result.bins.map((bin) => {
    const items = [...bin].sort((a, b) => pieces[b].length - pieces[a].length);
    let used = 0;
    const chain = (k: number): GNode => {
      if (k >= items.length) return hole();
      const p = pieces[items[k]];
      const leaf = partLeaf(p.part, false);
      const rest = length - used - p.length;
      used += p.length + kerf;
      return rest > EPS ? cutNode('x', p.length, leaf, chain(k + 1)) : leaf;
    };
    return { stock, length, width: BOARD_WIDTH, root: chain(0) };
  });
  const lowerBound = Math.max(
    boardLowerBound(
      pieces.map((p) => p.length),
      length,
      kerf,
    ),
    result.lowerBound,
  );
  return { sheets, lowerBound };
}

function fits(p: Piece, s: StockEntry, board: boolean): boolean {
  if (board) return p.length <= s.length + EPS;
  if (p.length <= s.length + EPS && p.width <= s.width + EPS) return true;
  return p.canRotate && p.width <= s.length + EPS && p.length <= s.width + EPS;
}

function planMaterial(
  pieces: Piece[],
  stocks: StockEntry[],
  board: boolean,
  kerf: number,
  material: string,
  deadline: number,
): MaterialResult {
  const sheets: SheetTree[] = [];
  let remaining = pieces;
  // Stock on hand with a quantity (recorded offcuts) goes first, in the order given.
  for (const s of stocks.filter((e) => e.quantity !== null)) {
    for (let k = 0; k < s.quantity! && remaining.length > 0; k++) {
      const fill = fillOneSheet(remaining, s.index, s.length, s.width, kerf);
      if (fill.placed.length === 0) break;
      sheets.push(...fill.packing.sheets);
      remaining = fill.rest;
    }
  }
  let lowerBound = sheets.length;
  if (remaining.length === 0) return { sheets, lowerBound };
  const unlimited = stocks.filter((e) => e.quantity === null);
  if (unlimited.length === 0) throw new StockExhaustedError(material);
  // Each piece goes to the unlimited sizes it fits; the size that takes all of them most cheaply wins.
  const candidates = unlimited.filter((s) => remaining.every((p) => fits(p, s, board)));
  const groups: Array<{ stock: StockEntry; pieces: Piece[] }> = [];
  if (candidates.length > 0) groups.push({ stock: candidates[0], pieces: remaining });
  else {
    for (const p of remaining) {
      const s = unlimited.find((e) => fits(p, e, board));
      if (!s) throw new StockExhaustedError(material);
      const g = groups.find((x) => x.stock === s);
      if (g) g.pieces.push(p);
      else groups.push({ stock: s, pieces: [p] });
    }
  }
  const plan = (s: StockEntry, ps: Piece[], until: number): MaterialResult => {
    if (board) return planBoards(ps, s.index, s.length, kerf, until);
    const r = planSheets(ps, s.index, s.length, s.width, kerf, until);
    return { sheets: r.packing.sheets, lowerBound: r.lowerBound };
  };
  if (candidates.length > 1) {
    let best: { result: MaterialResult; cost: number } | null = null;
    candidates.forEach((s, i) => {
      const until = Date.now() + (deadline - Date.now()) / (candidates.length - i);
      const result = plan(s, remaining, until);
      const cost = result.sheets.length * (s.price > 0 ? s.price : s.length * s.width);
      if (!best || cost < best.cost) best = { result, cost };
    });
    const chosen = best!.result;
    return { sheets: [...sheets, ...chosen.sheets], lowerBound: lowerBound + chosen.lowerBound };
  }
  groups.forEach((g, i) => {
    const until = Date.now() + (deadline - Date.now()) / (groups.length - i);
    const result = plan(g.stock, g.pieces, until);
    sheets.push(...result.sheets);
    lowerBound += result.lowerBound;
  });
  return { sheets, lowerBound };
}

/**
 * Cutting plan for a request: per material, stock on hand first, then the unlimited stock size that
 * costs least; saw-ready layouts (guillotine cut sequences with kerf), usable offcuts, drawings and a
 * lower bound on the stock any plan needs. Stops improving at the time limit and returns the best
 * plan found with its bound. Throws PartTooLargeError for a part no stock can hold.
 */
export function planCutting(input: CuttingPlanRequestInput | CuttingPlanRequest, options: PlanOptions = {}): CuttingPlanResponse {
  const started = Date.now();
  const request = CuttingPlanRequest.parse(input);
  const deadline = started + (options.timeLimitMs ?? request.timeLimitMs);
  const { kerf, trim } = request;
  const materials = [...new Set(request.parts.map((p) => p.material))];
  const piecesOf = new Map<string, Piece[]>();
  const stockOf = new Map<string, StockEntry[]>();
  const boardOf = new Map<string, boolean>();

  for (const material of materials) {
    const stockEntries = request.stock.flatMap((s, index) =>
      s.material !== material
        ? []
        : [
            {
              index,
              length: s.length - 2 * trim,
              width: s.kind === 'sheet' ? s.width - 2 * trim : BOARD_WIDTH,
              quantity: s.quantity,
              price: s.price,
            },
          ],
    );
    const board = request.stock.find((s) => s.material === material)!.kind === 'board';
    const pieces: Piece[] = [];
    request.parts.forEach((p, part) => {
      if (p.material !== material) return;
      const piece: Piece = { part, length: p.length, width: board ? BOARD_WIDTH : p.width!, canRotate: board ? false : p.canRotate };
      if (!stockEntries.some((s) => fits(piece, s, board))) throw new PartTooLargeError(part, p.name);
      for (let k = 0; k < p.quantity; k++) pieces.push(piece);
    });
    piecesOf.set(material, pieces);
    stockOf.set(material, stockEntries);
    boardOf.set(material, board);
  }

  const plans: CuttingMaterialPlan[] = [];
  const svg: string[] = [];
  let piecesLeft = request.parts.reduce((s, p) => s + p.quantity, 0);
  let timedOut = false;
  for (const material of materials) {
    const pieces = piecesOf.get(material)!;
    const board = boardOf.get(material)!;
    // Time shared by piece count, so a large sheet material is not starved by a small one.
    const until = Date.now() + Math.max(0, deadline - Date.now()) * (pieces.length / piecesLeft);
    piecesLeft -= pieces.length;
    const result = planMaterial(pieces, stockOf.get(material)!, board, kerf, material, until);
    const minSide = options.minOffcut ?? (board ? Math.min(...pieces.map((p) => p.length)) : smallestSide(pieces));

    const groups = new Map<string, { sheet: SheetTree; count: number }>();
    for (const sheet of result.sheets) {
      const key = `${sheet.stock}:${treeKey(sheet.root)}`;
      const g = groups.get(key);
      if (g) g.count++;
      else groups.set(key, { sheet, count: 1 });
    }
    const layouts: CuttingLayout[] = [];
    let stockArea = 0;
    for (const { sheet, count } of groups.values()) {
      const stock = request.stock[sheet.stock];
      const out = treeToLayout(sheet, kerf, trim);
      const flatten = <T extends { y: number; width: number }>(r: T): T => (board ? { ...r, y: 0, width: 0 } : r);
      const layout: CuttingLayout = {
        stock: sheet.stock,
        count,
        placements: out.placements.map(flatten),
        cuts: out.cuts,
        offcuts: (board ? out.holes.filter((h) => h.length >= minSide - EPS) : usableOffcuts(out.holes, minSide)).map(flatten),
      };
      layouts.push(layout);
      stockArea += count * stock.length * (stock.kind === 'sheet' ? stock.width : 1);
      svg.push(
        layoutSvg(layout, {
          unit: request.unit,
          stockLength: stock.length,
          stockWidth: stock.kind === 'sheet' ? stock.width : 0,
          partNames: request.parts.map((p) => p.name),
        }),
      );
    }
    const partArea = pieces.reduce((s, p) => s + p.length * (board ? 1 : p.width), 0);
    const stockUsed = result.sheets.length;
    const lowerBound = Math.min(result.lowerBound, stockUsed);
    if (lowerBound < stockUsed && Date.now() >= until) timedOut = true;
    plans.push({
      material,
      kind: board ? 'board' : 'sheet',
      stockUsed,
      lowerBound,
      optimal: stockUsed === lowerBound,
      yield: stockArea > 0 ? round6(partArea / stockArea) : 0,
      layouts,
    });
  }
  return { unit: request.unit, materials: plans, svg, timedOut };
}
