import type { PriceKey, SheetMaterialId } from '../../../../shared/api/rack-plan.js';
import { PRICE_KEYS } from '../../../../shared/api/rack-plan.js';
import { EPS_IN, type SheetSizeIn } from './geometry.js';
import type { HardwareItem } from './hardware.js';
import type { HeatPlan } from './heat.js';
import { isSheetPart, type PartIn } from './parts.js';
import type { RackSpec } from './rack-spec.js';

/**
 * Default price list (USD, example figures for a small shop; every shop sets its own).
 * Labor entries are minutes per operation; the rate is per hour.
 */
export const DEFAULT_PRICES: Record<PriceKey, number> = {
  'sheet.pvc-rigid': 220,
  'sheet.pvc-expanded': 120,
  'sheet.melamine-particleboard': 55,
  'sheet.plywood': 65,
  'lumber.2x4-per-foot': 0.75,
  'screw.carcass': 0.08,
  'screw.base': 0.15,
  'screw.caster': 0.1,
  dowel: 0.2,
  caster: 9,
  'caster.locking': 12,
  'pvc-cement': 10,
  'heat-tape.per-foot': 3.5,
  thermostat: 90,
  'labor.rate-per-hour': 40,
  'labor.minutes-setup': 60,
  'labor.minutes-per-cut': 3,
  'labor.minutes-per-screw': 1,
  'labor.minutes-per-heat-strip': 15,
  'labor.minutes-per-caster': 5,
  'margin-percent': 30,
};

/** Sheets of one material and thickness to be bought for a set of parts. */
export interface SheetGroup {
  material: SheetMaterialId;
  thicknessIn: number;
  sheet: SheetSizeIn;
  kerfIn: number;
  parts: PartIn[];
}
export interface SheetCount {
  count: number;
  method: 'area-estimate' | 'nested';
}
/** The seam for exact nesting: the cutting planner can replace the area estimate. */
export type SheetCounter = (group: SheetGroup) => SheetCount;

/** Share of a sheet's area that ends up in parts when nesting rectangles (ours, a cautious figure). */
export const AREA_ESTIMATE_YIELD = 0.85;

/**
 * Sheets by area. A part larger than half a sheet gets a sheet of its own (two never share one)
 * and leaves its offcut for small parts; small parts (kerf added) fill offcuts and further
 * sheets at AREA_ESTIMATE_YIELD.
 */
export const estimateSheetsByArea: SheetCounter = ({ sheet, kerfIn, parts }) => {
  const sheetArea = sheet.lengthIn * sheet.widthIn;
  let bigSheets = 0;
  let offcutArea = 0;
  let smallArea = 0;
  for (const p of parts) {
    const area = p.lengthIn * p.widthIn;
    if (area > sheetArea / 2) {
      bigSheets += p.quantity;
      offcutArea += (sheetArea - area) * p.quantity;
    } else {
      smallArea += (p.lengthIn + kerfIn) * (p.widthIn + kerfIn) * p.quantity;
    }
  }
  const usable = sheetArea * AREA_ESTIMATE_YIELD;
  const leftOver = Math.max(smallArea - offcutArea * AREA_ESTIMATE_YIELD, 0);
  const count = bigSheets + Math.ceil(leftOver / usable - 1e-9);
  return { count: Math.max(count, parts.length > 0 ? 1 : 0), method: 'area-estimate' };
};

/** Parts of sheet materials grouped by material and thickness (a thickness is a different sheet). */
export function sheetGroups(spec: RackSpec, parts: readonly PartIn[]): SheetGroup[] {
  const groups = new Map<string, SheetGroup>();
  for (const p of parts) {
    if (!isSheetPart(p)) continue;
    const id = `${p.material}|${Math.round(p.thicknessIn / EPS_IN)}`;
    let g = groups.get(id);
    if (!g) {
      g = { material: p.material, thicknessIn: p.thicknessIn, sheet: spec.construction.sheet, kerfIn: spec.construction.kerfIn, parts: [] };
      groups.set(id, g);
    }
    g.parts.push(p);
  }
  return [...groups.values()];
}

/** 2x4 sticks to buy: first-fit decreasing, each new stick the shortest stock the piece fits. */
export function lumberSticks(spec: RackSpec, parts: readonly PartIn[]): number[] {
  const kerf = spec.construction.kerfIn;
  const stock = [...spec.base.lumberStockLengthsIn].sort((a, b) => a - b);
  const pieces = parts
    .filter((p) => !isSheetPart(p))
    .flatMap((p) => Array.from({ length: p.quantity }, () => p.lengthIn))
    .sort((a, b) => b - a);
  const sticks: { lengthIn: number; leftIn: number }[] = [];
  for (const piece of pieces) {
    const open = sticks.find((s) => s.leftIn + EPS_IN >= piece);
    if (open) {
      open.leftIn -= piece + kerf;
    } else {
      const lengthIn = stock.find((l) => l + EPS_IN >= piece) ?? stock[stock.length - 1];
      sticks.push({ lengthIn, leftIn: lengthIn - piece - kerf });
    }
  }
  return sticks.map((s) => s.lengthIn);
}

export interface CostLine {
  key: PriceKey;
  description: string;
  quantity: number;
  unit: string;
  unitPrice: number;
  amount: number;
}

export interface RackCostIn {
  lines: CostLine[];
  subtotals: { materials: number; hardware: number; heat: number; labor: number };
  subtotal: number;
  laborMinutes: number;
  labor: number;
  marginPercent: number;
  margin: number;
  total: number;
  sheets: { material: SheetMaterialId; thicknessIn: number; count: number; method: SheetCount['method'] }[];
  notes: string[];
}

const cents = (x: number) => Math.round(x * 100) / 100;

export function rackCost(
  spec: RackSpec,
  parts: readonly PartIn[],
  hardware: readonly HardwareItem[],
  heat: HeatPlan,
  countSheets: SheetCounter = estimateSheetsByArea,
): RackCostIn {
  const price = (key: PriceKey): number => spec.prices[key] ?? DEFAULT_PRICES[key];
  const lines: Record<'materials' | 'hardware' | 'heat' | 'labor', CostLine[]> = { materials: [], hardware: [], heat: [], labor: [] };
  const line = (group: keyof typeof lines, key: PriceKey, description: string, quantity: number, unit: string, unitPrice = price(key)) => {
    if (quantity > 0) lines[group].push({ key, description, quantity, unit, unitPrice, amount: cents(quantity * unitPrice) });
  };

  const sheets = sheetGroups(spec, parts).map((g) => ({ material: g.material, thicknessIn: g.thicknessIn, ...countSheets(g) }));
  // One line per material: a sheet's price does not depend on its thickness in this price list.
  const sheetsByMaterial = new Map<SheetMaterialId, number>();
  for (const s of sheets) sheetsByMaterial.set(s.material, (sheetsByMaterial.get(s.material) ?? 0) + s.count);
  for (const [material, count] of sheetsByMaterial) {
    const key = `sheet.${material}` as PriceKey;
    line('materials', key, PRICE_KEYS[key], count, 'sheet');
  }
  const sticks = lumberSticks(spec, parts);
  const lumberFeet = sticks.reduce((a, b) => a + b, 0) / 12;
  line('materials', 'lumber.2x4-per-foot', `2x4 lumber: ${sticks.length} stick(s) of ${sticks.map((l) => Math.round((l / 12) * 100) / 100).join(', ')} ft`, Math.round(lumberFeet * 100) / 100, 'ft');

  const byKey = new Map<PriceKey, number>();
  for (const h of hardware) byKey.set(h.key, (byKey.get(h.key) ?? 0) + h.quantity);
  for (const [key, quantity] of byKey) line('hardware', key, PRICE_KEYS[key], quantity, key === 'pvc-cement' ? 'can' : 'each');

  // Tape is bought by the whole foot.
  line('heat', 'heat-tape.per-foot', `heat tape, ${heat.strips} strip(s)`, Math.ceil(heat.totalTapeFeet - 1e-9), 'ft');
  line('heat', 'thermostat', PRICE_KEYS.thermostat, heat.thermostats, 'each');

  const ratePerMinute = price('labor.rate-per-hour') / 60;
  const cuts = parts.reduce((sum, p) => sum + p.quantity, 0);
  const screws = hardware.filter((h) => h.key.startsWith('screw.')).reduce((sum, h) => sum + h.quantity, 0);
  const casters = hardware.filter((h) => h.key.startsWith('caster')).reduce((sum, h) => sum + h.quantity, 0);
  const labor = (key: PriceKey, what: string, operations: number) => {
    const minutes = operations * price(key);
    line('labor', key, `labor: ${what} (${operations} x ${price(key)} min at ${price('labor.rate-per-hour')}/h)`, minutes, 'min', ratePerMinute);
  };
  labor('labor.minutes-setup', 'set-up and finishing', 1);
  labor('labor.minutes-per-cut', 'cutting', cuts);
  labor('labor.minutes-per-screw', 'drilling and screwing', screws);
  labor('labor.minutes-per-heat-strip', 'laying and connecting heat tape', heat.strips);
  labor('labor.minutes-per-caster', 'fitting casters', casters);

  const sum = (ls: CostLine[]) => cents(ls.reduce((a, l) => a + l.amount, 0));
  const subtotals = { materials: sum(lines.materials), hardware: sum(lines.hardware), heat: sum(lines.heat), labor: sum(lines.labor) };
  const subtotal = cents(subtotals.materials + subtotals.hardware + subtotals.heat + subtotals.labor);
  const marginPercent = price('margin-percent');
  const margin = cents((subtotal * marginPercent) / 100);
  const notes: string[] = [];
  if (sheets.some((s) => s.method === 'area-estimate')) {
    notes.push(`Sheet counts are an area estimate (${Math.round(AREA_ESTIMATE_YIELD * 100)} % yield); the cutting plan gives the exact count.`);
  }
  notes.push('Prices are per the price list; a sheet is priced by material whatever its thickness.');
  return {
    lines: [...lines.materials, ...lines.hardware, ...lines.heat, ...lines.labor],
    subtotals,
    subtotal,
    laborMinutes: lines.labor.reduce((a, l) => a + l.quantity, 0),
    labor: subtotals.labor,
    marginPercent,
    margin,
    total: cents(subtotal + margin),
    sheets,
    notes,
  };
}
