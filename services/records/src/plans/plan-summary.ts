import type { PlanComparison, PlanSummary } from '../../../../shared/api/plans.js';
import type { RackPlanRequest, RackPlanResponse } from '../../../../shared/api/rack-plan.js';
import { formatLength, fromInches, toInches, type LengthUnit } from '../../../../shared/units.js';

/** Key figures of a result, kept beside it so lists and histories need not parse whole results. */
export function planSummary(spec: RackPlanRequest, result: RackPlanResponse): PlanSummary {
  return {
    levels: spec.layout.levels,
    columns: spec.layout.columns,
    tubs: spec.layout.levels * spec.layout.columns,
    sections: result.sections.length,
    overallHeight: result.dimensions.overallHeight,
    overallWidth: result.dimensions.overallWidth,
    overallDepth: result.dimensions.overallDepth,
    sheets: result.cost.sheets.reduce((n, s) => n + s.count, 0),
    total: result.cost.total,
    warnings: result.checks.filter((c) => c.severity === 'warning').length,
    dangers: result.checks.filter((c) => c.severity === 'danger').length,
  };
}

export interface ComparedInput {
  id: number;
  name: string;
  version: number;
  spec: RackPlanRequest;
  result: RackPlanResponse;
}

const DIMENSION_KEYS = ['overallHeight', 'overallWidth', 'overallDepth', 'levelOpening', 'interiorShelfLength', 'outerShelfLength', 'depth', 'carcassHeight', 'baseHeight'] as const;
const COST_KEYS = ['materials', 'hardware', 'heat', 'labor', 'subtotal', 'margin', 'total'] as const;

/** Lengths rounded as the calculator rounds them, so a converted length carries no float noise. */
const round = (x: number, unit: LengthUnit) => {
  const f = unit === 'in' ? 1e6 : 1e3;
  return Math.round(x * f) / f;
};
const cents = (x: number) => Math.round(x * 100) / 100;

function costOf(result: RackPlanResponse, key: (typeof COST_KEYS)[number]): number {
  const c = result.cost;
  if (key === 'subtotal' || key === 'margin' || key === 'total') return c[key];
  return c.subtotals[key];
}

/** Two plans side by side, every length in plan A's unit. */
export function comparePlans(a: ComparedInput, b: ComparedInput): PlanComparison {
  const unit = a.result.unit;
  const lengthIn = (p: ComparedInput, value: number) => toInches(value, p.result.unit);
  const inUnit = (p: ComparedInput, value: number) => round(fromInches(lengthIn(p, value), unit), unit);

  const sheetKey = (material: string, thicknessIn: number) => `${material}|${Math.round(thicknessIn * 1e4)}`;
  const sheets = new Map<string, { material: string; thicknessIn: number; a: number; b: number }>();
  for (const [side, p] of [['a', a], ['b', b]] as const) {
    for (const s of p.result.cost.sheets) {
      const tIn = lengthIn(p, s.thickness);
      const k = sheetKey(s.material, tIn);
      const entry = sheets.get(k) ?? { material: s.material, thicknessIn: tIn, a: 0, b: 0 };
      entry[side] += s.count;
      sheets.set(k, entry);
    }
  }

  const described = (p: ComparedInput) => ({
    id: p.id,
    name: p.name,
    version: p.version,
    unit: p.result.unit,
    levels: p.spec.layout.levels,
    columns: p.spec.layout.columns,
    sections: p.result.sections.length,
  });
  const severities = (p: ComparedInput) => ({
    warnings: p.result.checks.filter((c) => c.severity === 'warning').length,
    dangers: p.result.checks.filter((c) => c.severity === 'danger').length,
  });

  return {
    unit,
    a: described(a),
    b: described(b),
    dimensions: DIMENSION_KEYS.map((key) => {
      const va = inUnit(a, a.result.dimensions[key]);
      const vb = inUnit(b, b.result.dimensions[key]);
      return {
        key,
        a: va,
        b: vb,
        difference: round(vb - va, unit),
        aDisplay: formatLength(lengthIn(a, a.result.dimensions[key]), unit),
        bDisplay: formatLength(lengthIn(b, b.result.dimensions[key]), unit),
      };
    }),
    sheets: [...sheets.values()]
      .sort((x, y) => x.material.localeCompare(y.material) || x.thicknessIn - y.thicknessIn)
      .map((s) => ({ material: s.material, thickness: round(fromInches(s.thicknessIn, unit), unit), a: s.a, b: s.b, difference: s.b - s.a })),
    cost: COST_KEYS.map((key) => {
      const ca = costOf(a.result, key);
      const cb = costOf(b.result, key);
      return { key, a: ca, b: cb, difference: cents(cb - ca) };
    }),
    checks: { a: severities(a), b: severities(b) },
  };
}
