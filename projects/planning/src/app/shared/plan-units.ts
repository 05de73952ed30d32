import { LengthUnit, formatInches, formatMillimetres, fromInches, kgToLb, lbToKg, parseInches, toInches } from '@tubwright/shared/units';

export type { LengthUnit };
export type MassUnit = 'lb' | 'kg';

/** Mass unit that goes with a length unit in the API: pounds with inches, kilograms with millimetres. */
export const massUnitOf = (unit: LengthUnit): MassUnit => (unit === 'in' ? 'lb' : 'kg');

/** A length given in `unit`, as results show it: `6 5/8 in` (to 1/16) or `168.3 mm`; a dash when missing. */
export function showLength(value: number | null | undefined, unit: LengthUnit): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return unit === 'in' ? `${formatInches(value)} in` : `${formatMillimetres(value)} mm`;
}

/** A mass in the unit its field name or plan unit says, to one decimal: `100.4 lb`. */
export function showMass(value: number | null | undefined, unit: MassUnit): string {
  if (value === null || value === undefined || !Number.isFinite(value)) return '—';
  return `${trimDecimals(value, 1)} ${unit}`;
}

/**
 * Text for a length input: inches as a fraction when the value sits on a 1/16 tick (`16 1/4`),
 * otherwise as a decimal so nothing is lost; millimetres to 0.001.
 */
export function lengthText(value: number, unit: LengthUnit): string {
  if (unit === 'mm') return trimDecimals(value, 3);
  const ticks = value * 16;
  return Math.abs(ticks - Math.round(ticks)) < 1e-6 ? formatInches(value) : trimDecimals(value, 4);
}

const DECIMAL = /^\s*(\d+(?:\.\d*)?|\.\d+)\s*(?:mm)?\s*$/i;

/** What a person typed as a length: fractions or decimals of an inch, decimal millimetres. Null when unreadable. */
export function readLength(text: string | null | undefined, unit: LengthUnit): number | null {
  if (text === null || text === undefined || !text.trim()) return null;
  if (unit === 'in') return parseInches(text);
  const m = DECIMAL.exec(text);
  return m ? Number(m[1]) : null;
}

/** A typed plain number (masses, watts); null when blank or unreadable. */
export function readNumber(text: string | number | null | undefined): number | null {
  if (typeof text === 'number') return Number.isFinite(text) ? text : null;
  if (text === null || text === undefined || !text.trim()) return null;
  const m = DECIMAL.exec(text.replace(/(lb|kg)\s*$/i, ''));
  return m ? Number(m[1]) : null;
}

/**
 * A typed length carried to the other unit when the user switches units. Inches land on the
 * nearest 1/16 (what a tape shows); text that does not read is left for the user to fix.
 */
export function convertLengthText(text: string, from: LengthUnit, to: LengthUnit): string {
  if (from === to) return text;
  const value = readLength(text, from);
  if (value === null) return text;
  const converted = fromInches(toInches(value, from), to);
  return to === 'in' ? formatInches(converted) : lengthText(converted, 'mm');
}

/** A typed mass carried from pounds to kilograms or back, to 0.001. */
export function convertMassText(text: string, from: LengthUnit, to: LengthUnit): string {
  if (from === to) return text;
  const value = readNumber(text);
  if (value === null) return text;
  return trimDecimals(to === 'mm' ? lbToKg(value) : kgToLb(value), 3);
}

/** Plain decimal with at most `decimals` places and no trailing zeros. */
export function trimDecimals(value: number, decimals: number): string {
  const rounded = Math.round(value * 10 ** decimals) / 10 ** decimals;
  return String(Object.is(rounded, -0) ? 0 : rounded);
}
