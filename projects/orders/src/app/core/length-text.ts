import { MM_PER_IN, formatInches, formatMillimetres, inToMm, parseInches } from '@tubwright/shared/units';

const MILLIMETRES = /^(\d+(?:\.\d*)?|\.\d+)\s*mm$/i;
const FEET = /^(\d+)\s*(?:'|ft|feet|foot)\s*(.*)$/i;

/**
 * A length a person typed, in inches: fractions or decimals of an inch (`79 1/2`, `79.5 in`,
 * `79"`), feet and inches as a tape reads (`6' 8"`, `6 ft 8 in`), or millimetres with their
 * sign (`2020 mm`). Null when the text reads as none of these.
 */
export function readLengthIn(text: string | null | undefined): number | null {
  const trimmed = (text ?? '').trim();
  if (!trimmed) return null;
  const mm = MILLIMETRES.exec(trimmed);
  if (mm) return Number(mm[1]) / MM_PER_IN;
  const feet = FEET.exec(trimmed);
  if (feet) {
    const rest = feet[2]!.trim();
    const inches = rest ? parseInches(rest) : 0;
    return inches === null || inches < 0 ? null : Number(feet[1]) * 12 + inches;
  }
  return parseInches(trimmed);
}

/** What a problem with a typed length says, or null when it reads and lies in (0, maxIn]. */
export function lengthProblem(text: string, maxIn: number, what = 'a length'): string | null {
  const value = readLengthIn(text);
  if (value === null) return `Enter ${what} in inches (79 1/2), feet and inches (6' 8") or millimetres (2020 mm)`;
  if (value <= 0) return 'Enter a length above 0';
  if (value > maxIn + 1e-9) return `Enter at most ${formatInches(maxIn)} in (${formatMillimetres(inToMm(maxIn), 0)} mm)`;
  return null;
}

/** A stored length for an input field: inches on a 1/16 tick as a fraction, else a decimal. */
export function lengthInputText(valueIn: number | null | undefined): string {
  if (valueIn === null || valueIn === undefined || !Number.isFinite(valueIn)) return '';
  const ticks = valueIn * 16;
  return Math.abs(ticks - Math.round(ticks)) < 1e-6 ? formatInches(valueIn) : String(Math.round(valueIn * 10_000) / 10_000);
}
