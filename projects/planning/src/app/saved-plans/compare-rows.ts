import { DIMENSION_LABELS } from '../shared/dimension-labels';
import { materialName } from '../shared/material-names';
import { formatMoney } from '../shared/money';
import type { PlanComparison } from '../shared/plan-types';
import { LengthUnit, showLength } from '../shared/plan-units';

/** One line of the side-by-side table: both values as shown, and B − A when they differ. */
export interface CompareRow {
  key: string;
  label: string;
  hint: string;
  a: string;
  b: string;
  /** `+1/2 in`, `−3`, or empty when the two are the same as shown. */
  difference: string;
  differs: boolean;
}

export interface CompareGroup {
  id: 'rack' | 'dimensions' | 'sheets' | 'cost';
  label: string;
  rows: CompareRow[];
}

const COST_LABELS: Record<PlanComparison['cost'][number]['key'], string> = {
  materials: 'Materials',
  hardware: 'Hardware',
  heat: 'Heat',
  labor: 'Labor',
  subtotal: 'Subtotal',
  margin: 'Margin',
  total: 'Total with margin',
};

const MINUS = '\u2212';
const signed = (value: number, text: string) => `${value < 0 ? MINUS : '+'}${text}`;

/** Less than half the smallest step shown (1/16 in, 0.1 mm) reads as the same length. */
export function lengthsDiffer(difference: number, unit: LengthUnit): boolean {
  return Math.abs(difference) >= (unit === 'in' ? 1 / 32 : 0.05);
}

/** B − A as a builder reads it: `+6 5/8 in`, `−12.7 mm`; empty when the same as shown. */
export function lengthDifference(difference: number, unit: LengthUnit): string {
  return lengthsDiffer(difference, unit) ? signed(difference, showLength(Math.abs(difference), unit)) : '';
}

export function moneyDifference(difference: number): string {
  return Math.abs(difference) >= 0.005 ? signed(difference, formatMoney(Math.abs(difference))) : '';
}

const countDifference = (difference: number) => (difference === 0 ? '' : signed(difference, String(Math.abs(difference))));

function countRow(key: string, label: string, a: number, b: number, hint = ''): CompareRow {
  return { key, label, hint, a: String(a), b: String(b), difference: countDifference(b - a), differs: a !== b };
}

/** The comparison the API answers, grouped and worded for the table. Lengths are all in its unit. */
export function compareGroups(c: PlanComparison): CompareGroup[] {
  const unit = c.unit;
  const dimensionLabels = new Map(DIMENSION_LABELS.map(([key, label, hint]) => [key as string, { label, hint }]));

  const rack: CompareRow[] = [
    countRow('levels', 'Levels', c.a.levels, c.b.levels),
    countRow('columns', 'Columns', c.a.columns, c.b.columns),
    countRow('tubs', 'Tubs', c.a.levels * c.a.columns, c.b.levels * c.b.columns),
    countRow('sections', 'Stacking sections', c.a.sections, c.b.sections),
    countRow('dangers', 'Checks to fix', c.checks.a.dangers, c.checks.b.dangers, 'danger'),
    countRow('warnings', 'Checks to act on', c.checks.a.warnings, c.checks.b.warnings, 'warning'),
  ];

  const dimensions = c.dimensions.map((d) => ({
    key: d.key,
    label: dimensionLabels.get(d.key)?.label ?? d.key,
    hint: dimensionLabels.get(d.key)?.hint ?? '',
    a: d.aDisplay,
    b: d.bDisplay,
    difference: lengthDifference(d.difference, unit),
    differs: lengthsDiffer(d.difference, unit),
  }));

  const sheets = c.sheets.map((s) => ({
    key: `${s.material}@${s.thickness}`,
    label: materialName(s.material),
    hint: `${showLength(s.thickness, unit)} thick`,
    a: s.a ? String(s.a) : '—',
    b: s.b ? String(s.b) : '—',
    difference: countDifference(s.difference),
    differs: s.difference !== 0,
  }));
  const sum = (side: 'a' | 'b') => c.sheets.reduce((n, s) => n + s[side], 0);
  sheets.push(countRow('all-sheets', 'All sheets', sum('a'), sum('b')));

  const cost = c.cost.map((line) => ({
    key: line.key,
    label: COST_LABELS[line.key],
    hint: '',
    a: formatMoney(line.a),
    b: formatMoney(line.b),
    difference: moneyDifference(line.difference),
    differs: Math.abs(line.difference) >= 0.005,
  }));

  return [
    { id: 'rack', label: 'Rack', rows: rack },
    { id: 'dimensions', label: 'Key dimensions', rows: dimensions },
    { id: 'sheets', label: 'Sheets to buy', rows: sheets },
    { id: 'cost', label: 'Cost', rows: cost },
  ];
}
