import { AbstractControl, ValidatorFn } from '@angular/forms';
import { parseInches } from '@tubwright/shared/units';

/** A typed number: plain decimals, or inches with fractions (`3/4`, `48 1/2`) for lengths. Null when unreadable. */
export function readTyped(text: string, kind: 'number' | 'inches'): number | null {
  const trimmed = text.trim();
  if (!trimmed) return null;
  if (kind === 'inches') return parseInches(trimmed);
  const value = Number(trimmed);
  return /^-?(\d+(\.\d*)?|\.\d+)$/.test(trimmed) && Number.isFinite(value) ? value : null;
}

export interface NumberRule {
  label: string;
  kind: 'number' | 'inches';
  /** The API's upper limit for the field. */
  max: number;
  unit: string;
  /** Blank means "not known" (null); otherwise the field is required. */
  optional?: boolean;
  /** Zero allowed (prices); every physical value must be greater than zero. */
  zeroAllowed?: boolean;
}

/** The same limits the API puts on a material (PutMaterialRequest), said in the form's words. */
export function numberRule(rule: NumberRule): ValidatorFn {
  return (control: AbstractControl) => {
    const text = String(control.value ?? '');
    if (!text.trim()) return rule.optional ? null : { required: `${rule.label} is required` };
    const value = readTyped(text, rule.kind);
    if (value === null) return { number: rule.kind === 'inches' ? 'Type inches like 3/4 or 0.75' : 'Type a number like 1410 or 2.5' };
    if (rule.zeroAllowed ? value < 0 : value <= 0) return { range: `${rule.label} must be ${rule.zeroAllowed ? '0 or more' : 'greater than zero'}` };
    if (value > rule.max) return { range: `${rule.label} is at most ${rule.max.toLocaleString('en-US')} ${rule.unit}` };
    return null;
  };
}
