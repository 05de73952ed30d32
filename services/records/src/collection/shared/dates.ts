import { ValidationError } from '../../../../common/src/errors.js';

const DAY_MS = 86_400_000;

/** `2026-12-01` plus whole days, in UTC (no daylight-saving surprises). */
export function addDays(isoDate: string, days: number): string {
  return new Date(Date.parse(`${isoDate}T00:00:00Z`) + days * DAY_MS).toISOString().slice(0, 10);
}

/** Whole days from `from` to `to` (dates or date-times; only the day counts). */
export function daysBetween(from: string, to: string): number {
  return Math.round((Date.parse(`${to.slice(0, 10)}T00:00:00Z`) - Date.parse(`${from.slice(0, 10)}T00:00:00Z`)) / DAY_MS);
}

/** A date-time with any offset, stored as UTC with `Z`. */
export const toUtcIso = (value: string): string => new Date(value).toISOString();

export const todayUtc = (now = new Date()): string => now.toISOString().slice(0, 10);

/** Calendar-valid (the schema only checks the shape: 2026-02-30 is refused here). */
export function assertRealDate(isoDate: string, field: string): void {
  const parsed = new Date(`${isoDate}T00:00:00Z`);
  if (Number.isNaN(parsed.getTime()) || parsed.toISOString().slice(0, 10) !== isoDate) {
    throw new ValidationError(`${field}: ${isoDate} is not a calendar date`, field);
  }
}

// A few minutes of grace for a phone whose clock runs ahead of the server's.
const CLOCK_SKEW_MS = 5 * 60_000;

/** Past events cannot happen in the future: 400 naming the field. */
export function assertNotFuture(value: string, field: string, now = new Date()): void {
  const isDateOnly = /^\d{4}-\d{2}-\d{2}$/.test(value);
  if (isDateOnly) assertRealDate(value, field);
  const limit = isDateOnly ? todayUtc(now) : null;
  const inFuture = limit ? value > limit : Date.parse(value) > now.getTime() + CLOCK_SKEW_MS;
  if (inFuture) throw new ValidationError(`${field}: ${value} is in the future; record events once they have happened`, field);
}
