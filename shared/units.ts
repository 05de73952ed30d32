/**
 * Lengths and masses shared by the browser and the server (no Node APIs).
 * The calculator works in inches and pounds inside and converts at its edges.
 */

export type LengthUnit = 'in' | 'mm';

/** Exact by definition of the international inch (NIST SP 811, appendix B). */
export const MM_PER_IN = 25.4;
/** Exact by definition of the international avoirdupois pound (NIST SP 811, appendix B). */
export const KG_PER_LB = 0.45359237;

export const inToMm = (lengthIn: number): number => lengthIn * MM_PER_IN;
export const mmToIn = (lengthMm: number): number => lengthMm / MM_PER_IN;
export const lbToKg = (massLb: number): number => massLb * KG_PER_LB;
export const kgToLb = (massKg: number): number => massKg / KG_PER_LB;

/** A length given in `unit`, in inches. */
export const toInches = (length: number, unit: LengthUnit): number => (unit === 'in' ? length : mmToIn(length));
/** A length in inches, expressed in `unit`. */
export const fromInches = (lengthIn: number, unit: LengthUnit): number => (unit === 'in' ? lengthIn : inToMm(lengthIn));
/** Mass unit that goes with a length unit in the public API: pounds with inches, kilograms with millimetres. */
export const massUnitFor = (unit: LengthUnit): 'lb' | 'kg' => (unit === 'in' ? 'lb' : 'kg');

const gcd = (a: number, b: number): number => (b === 0 ? a : gcd(b, a % b));

/**
 * Fractional inches to the nearest 1/denominator, reduced: 34.125 -> "34 1/8", 0.5 -> "1/2",
 * 6.5625 -> "6 9/16", -1.5 -> "-1 1/2", 2.999 -> "3". Halves round away from zero.
 */
export function formatInches(lengthIn: number, denominator = 16): string {
  if (!Number.isFinite(lengthIn)) return String(lengthIn);
  if (!Number.isInteger(denominator) || denominator < 1) throw new RangeError('denominator must be a positive integer');
  // Round on the absolute value so that -0.03 gives "0", not "-0", and halves go away from zero.
  const ticks = Math.round(Math.abs(lengthIn) * denominator + 1e-9);
  if (ticks === 0) return '0';
  const sign = lengthIn < 0 ? '-' : '';
  const whole = Math.floor(ticks / denominator);
  const rest = ticks % denominator;
  if (rest === 0) return `${sign}${whole}`;
  const g = gcd(rest, denominator);
  const fraction = `${rest / g}/${denominator / g}`;
  return whole === 0 ? `${sign}${fraction}` : `${sign}${whole} ${fraction}`;
}

/** Millimetres with at most `decimals` places and no trailing zeros: 866.775 -> "866.8". */
export function formatMillimetres(lengthMm: number, decimals = 1): string {
  if (!Number.isFinite(lengthMm)) return String(lengthMm);
  const factor = 10 ** decimals;
  const rounded = Math.round(Math.abs(lengthMm) * factor + 1e-9) / factor;
  if (rounded === 0) return '0';
  return `${lengthMm < 0 ? '-' : ''}${rounded.toFixed(decimals).replace(/\.?0+$/, '')}`;
}

/** A length given in inches, shown in `unit` with its unit sign: "34 1/8 in" or "866.8 mm". */
export function formatLength(lengthIn: number, unit: LengthUnit): string {
  return unit === 'in' ? `${formatInches(lengthIn)} in` : `${formatMillimetres(inToMm(lengthIn))} mm`;
}

const FRACTIONAL = /^(-)?\s*(?:(\d+)\s+(\d+)\s*\/\s*(\d+)|(\d+)\s*\/\s*(\d+)|(\d+(?:\.\d*)?|\.\d+))\s*(?:in|"|inch|inches)?$/i;

/**
 * Reads "34 1/8", "1/2", "-1 1/2", "34.125", "6 9/16 in" or '12"' as inches.
 * Returns null for anything else (including a zero denominator).
 */
export function parseInches(text: string): number | null {
  const m = FRACTIONAL.exec(text.trim());
  if (!m) return null;
  const sign = m[1] ? -1 : 1;
  let value: number;
  if (m[2] !== undefined) {
    const den = Number(m[4]);
    if (den === 0) return null;
    value = Number(m[2]) + Number(m[3]) / den;
  } else if (m[5] !== undefined) {
    const den = Number(m[6]);
    if (den === 0) return null;
    value = Number(m[5]) / den;
  } else {
    value = Number(m[7]);
  }
  return value === 0 ? 0 : sign * value;
}
