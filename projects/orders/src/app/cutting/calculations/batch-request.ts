import { toInches } from '@tubwright/shared/units';
import type { CuttingPlanRequestInput, RackPlanResponse } from '../../core/orders-types';

/*
 * One cutting-plan request for the racks of several orders, so their parts share sheets and
 * boards. It follows the calculator's own rack nesting (services/calculator/src/domain/
 * rack-cutting.ts): sheet parts grouped by material and thickness, 2x4 parts cut from the
 * lumber stock lengths, the spec's kerf. Everything is in inches, whatever each plan's unit.
 */

export interface BatchRack {
  /** Which order the rack belongs to, shown in the cut list (e.g. O-2026-0004). */
  source: string;
  /** Racks of this kind in the order. */
  quantity: number;
  spec: Record<string, unknown>;
  result: Pick<RackPlanResponse, 'unit' | 'parts' | 'cost'>;
}

const LUMBER = 'lumber-2x4';
// Calculator defaults (services/calculator/src/domain/rack-spec.ts), used when a spec leaves them out.
const DEFAULT_SHEET_IN = { length: 96, width: 48 };
const DEFAULT_KERF_IN = 0.125;
const DEFAULT_LUMBER_IN = [96, 120, 144, 168, 192];

export const sheetStockKey = (material: string, thicknessIn: number) => `${material}@${round(thicknessIn, 3)}`;

export function batchCuttingRequest(racks: readonly BatchRack[], timeLimitMs = 5000): CuttingPlanRequestInput {
  const parts: CuttingPlanRequestInput['parts'] = [];
  const sheets = new Map<string, { material: string; kind: 'sheet'; length: number; width: number }>();
  const boards = new Map<string, { material: string; kind: 'board'; length: number }>();
  let kerf = 0;

  for (const rack of racks) {
    const unit = rack.result.unit;
    const specUnit = rack.spec['unit'] === 'mm' ? 'mm' : 'in';
    const inches = (n: number) => round(toInches(n, unit), 4);
    const specInches = (n: number) => round(toInches(n, specUnit), 4);
    const construction = (rack.spec['construction'] ?? {}) as { sheet?: { length?: number; width?: number }; kerf?: number };
    const base = (rack.spec['base'] ?? {}) as { lumberStockLengths?: number[] };
    kerf = Math.max(kerf, typeof construction.kerf === 'number' ? specInches(construction.kerf) : DEFAULT_KERF_IN);
    const sheet = {
      length: typeof construction.sheet?.length === 'number' ? specInches(construction.sheet.length) : DEFAULT_SHEET_IN.length,
      width: typeof construction.sheet?.width === 'number' ? specInches(construction.sheet.width) : DEFAULT_SHEET_IN.width,
    };
    const lumberLengths = base.lumberStockLengths?.length ? base.lumberStockLengths.map(specInches) : DEFAULT_LUMBER_IN;

    for (const part of rack.result.parts) {
      const quantity = part.quantity * rack.quantity;
      if (quantity <= 0) continue;
      if (part.material === LUMBER) {
        parts.push({ name: part.name, material: LUMBER, length: inches(part.length), quantity, canRotate: false, source: rack.source });
        for (const length of lumberLengths) boards.set(`${length}`, { material: LUMBER, kind: 'board', length });
        continue;
      }
      const material = sheetStockKey(part.material, toInches(part.thickness, unit));
      parts.push({ name: part.name, material, length: inches(part.length), width: inches(part.width), quantity, canRotate: true, source: rack.source });
      sheets.set(`${material}|${sheet.length}|${sheet.width}`, { material, kind: 'sheet', ...sheet });
    }
  }

  return {
    unit: 'in',
    kerf: kerf || DEFAULT_KERF_IN,
    trim: 0,
    stock: [...sheets.values(), ...boards.values()],
    parts,
    timeLimitMs,
  };
}

/** Sheets the racks need when each is cut on its own (from each plan's cost), by material key. */
export function separateSheetCounts(racks: readonly BatchRack[]): Map<string, number> {
  const counts = new Map<string, number>();
  for (const rack of racks) {
    for (const s of rack.result.cost.sheets) {
      const key = sheetStockKey(s.material, toInches(s.thickness, rack.result.unit));
      counts.set(key, (counts.get(key) ?? 0) + s.count * rack.quantity);
    }
  }
  return counts;
}

/** Pieces to cut in all. */
export function pieceCount(request: CuttingPlanRequestInput): number {
  return request.parts.reduce((sum, p) => sum + (p.quantity ?? 1), 0);
}

function round(n: number, places: number): number {
  const f = 10 ** places;
  return Math.round(n * f) / f;
}
