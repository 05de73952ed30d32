import type { RackPlanResponse } from '@tubwright/shared/api/rack-plan';
import { type LengthUnit, formatLength, toInches } from '@tubwright/shared/units';

/** A length in the plan's unit, shown as `51 1/4 in` or `1301.8 mm`. */
export const showLength = (value: number, unit: LengthUnit): string => formatLength(toInches(value, unit), unit);

const MATERIAL_NAMES: Record<string, string> = {
  'pvc-rigid': 'rigid PVC',
  'pvc-expanded': 'expanded PVC',
  'melamine-particleboard': 'melamine particleboard',
  plywood: 'plywood',
};

export interface SheetLine {
  count: number;
  text: string;
}

/** "4 sheets of rigid PVC, 1/2 in" per material and thickness, as the cost counted them. */
export function sheetLines(plan: RackPlanResponse): SheetLine[] {
  return plan.cost.sheets.map((s) => ({
    count: s.count,
    text: `${s.count} ${s.count === 1 ? 'sheet' : 'sheets'} of ${MATERIAL_NAMES[s.material] ?? s.material}, ${showLength(s.thickness, plan.unit)}`,
  }));
}

/** Only what a visitor should act on: warnings and dangers (tipping, escape gaps, loads). */
export function notableChecks(plan: RackPlanResponse): Array<{ severity: 'warning' | 'danger'; message: string }> {
  return plan.checks
    .filter((c): c is typeof c & { severity: 'warning' | 'danger' } => c.severity === 'warning' || c.severity === 'danger')
    .map(({ severity, message }) => ({ severity, message }));
}

/** Money in the shop's currency; a bad currency code falls back to a plain number. */
export function formatMoney(amount: number, currency: string): string {
  try {
    return new Intl.NumberFormat('en-US', { style: 'currency', currency: currency.toUpperCase(), maximumFractionDigits: 0 }).format(amount);
  } catch {
    return Math.round(amount).toLocaleString('en-US');
  }
}
