import { parseInches } from '@tubwright/shared/units';

/** Play above a tub's rim so it slides in and out of its level without scraping. */
export const LEVEL_CLEARANCE_IN = 1 / 8;

/** Clear height a level needs for a tub of this outside height. */
export function levelOpeningIn(tubHeightIn: number): number {
  return tubHeightIn + LEVEL_CLEARANCE_IN;
}

/** Reads what a visitor typed (`6 1/2`, `6.5`, `6 1/2"`); an error says what is wrong. */
export function readTubSize(text: string): { valueIn: number } | { error: string } {
  if (!text.trim()) return { error: 'Enter a size in inches' };
  const valueIn = parseInches(text);
  if (valueIn === null) return { error: 'Use inches, e.g. 6 1/2' };
  if (valueIn <= 0) return { error: 'Must be more than zero' };
  if (valueIn > 120) return { error: 'Must be at most 120 in' };
  return { valueIn };
}
