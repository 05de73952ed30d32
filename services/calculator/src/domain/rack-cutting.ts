import type { CuttingPlanRequestInput, CuttingPlanResponse } from '../../../../shared/api/cutting-plan.js';
import type { RackPlanRequest } from '../../../../shared/api/rack-plan.js';
import { fromInches, toInches } from '../../../../shared/units.js';
import type { SheetCounter } from './cost.js';
import { normaliseRequest } from './rack-spec.js';
import type { RackPlan } from './rack-plan.js';

const LUMBER = 'lumber-2x4';

/** Sheet parts are grouped by material and thickness: one stock key per group, e.g. `pvc-rigid@0.5`. */
export const sheetStockKey = (material: string, thicknessIn: number) => `${material}@${Math.round(thicknessIn * 1000) / 1000}`;

/**
 * The cutting request for a rack's parts: every sheet part from the spec's sheet size, every
 * base member from the lumber stock lengths, kerf from the spec. Lengths stay in the plan's unit.
 */
export function rackCuttingRequest(request: RackPlanRequest, plan: RackPlan, timeLimitMs: number): CuttingPlanRequestInput {
  const spec = normaliseRequest(request);
  const out = (lengthIn: number) => fromInches(lengthIn, spec.unit);
  const sheetKeys = new Set<string>();
  const parts = plan.parts.map((p) => {
    if (p.material === LUMBER) return { name: p.name, material: LUMBER, length: p.length, quantity: p.quantity, canRotate: false };
    const key = sheetStockKey(p.material, toInches(p.thickness, spec.unit));
    sheetKeys.add(key);
    return { name: p.name, material: key, length: p.length, width: p.width, quantity: p.quantity, canRotate: true };
  });
  const sheet = spec.construction.sheet;
  const stock: CuttingPlanRequestInput['stock'] = [
    ...[...sheetKeys].map((material) => ({ material, kind: 'sheet' as const, length: out(sheet.lengthIn), width: out(sheet.widthIn) })),
    ...(parts.some((p) => p.material === LUMBER)
      ? spec.base.lumberStockLengthsIn.map((lengthIn) => ({ material: LUMBER, kind: 'board' as const, length: out(lengthIn) }))
      : []),
  ];
  return { unit: spec.unit, kerf: out(spec.construction.kerfIn), trim: 0, stock, parts, timeLimitMs };
}

/** Sheet counts taken from a nested cutting plan, for the cost lines. */
export function sheetCounterFrom(cutting: CuttingPlanResponse): SheetCounter {
  return (group) => {
    const material = cutting.materials.find((m) => m.material === sheetStockKey(group.material, group.thicknessIn));
    if (!material) return { count: 0, method: 'nested' };
    return { count: material.stockUsed, method: 'nested' };
  };
}
