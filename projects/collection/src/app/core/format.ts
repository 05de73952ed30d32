/* How the collection writes dates and masses. Dates are UTC days, as the API stores them. */

const DAY = new Intl.DateTimeFormat('en-US', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const DAY_TIME = new Intl.DateTimeFormat('en-US', { day: 'numeric', month: 'short', year: 'numeric', hour: 'numeric', minute: '2-digit' });
const SHORT_DAY = new Intl.DateTimeFormat('en-US', { day: 'numeric', month: 'short', timeZone: 'UTC' });

/** `2026-12-02` or a full ISO time → `Dec 2, 2026`; empty → an em dash. */
export function formatDay(iso: string | null | undefined): string {
  if (!iso) return '—';
  const date = new Date(iso.length === 10 ? `${iso}T00:00:00Z` : iso);
  return Number.isNaN(date.getTime()) ? iso : DAY.format(date);
}

/** `Dec 2` for chart axes. */
export function formatShortDay(iso: string): string {
  const date = new Date(iso.length === 10 ? `${iso}T00:00:00Z` : iso);
  return Number.isNaN(date.getTime()) ? iso : SHORT_DAY.format(date);
}

/** A moment in the keeper's own time zone: `Dec 2, 2026, 7:00 PM`. */
export function formatMoment(iso: string | null | undefined): string {
  if (!iso) return '—';
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : DAY_TIME.format(date);
}

/** Grams as keepers read them: `1,240 g`; from 10 kg on, kilograms with one decimal. */
export function formatGrams(massG: number | null | undefined): string {
  if (massG === null || massG === undefined) return '—';
  if (massG >= 10_000) return `${(massG / 1000).toFixed(1)} kg`;
  return `${Math.round(massG).toLocaleString('en-US')} g`;
}

/** Today as `YYYY-MM-DD` in UTC, the day the API's due list uses by default. */
export function todayUtc(now = new Date()): string {
  return now.toISOString().slice(0, 10);
}

/** The value of an `<input type="datetime-local">` for a moment, in the browser's zone. */
export function toLocalInput(date: Date): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${pad(date.getMonth() + 1)}-${pad(date.getDate())}T${pad(date.getHours())}:${pad(date.getMinutes())}`;
}

/** `<input type="datetime-local">` value → ISO with Z; null when empty or unreadable. */
export function fromLocalInput(value: string): string | null {
  if (!value) return null;
  const date = new Date(value);
  return Number.isNaN(date.getTime()) ? null : date.toISOString();
}

/** Percent with at most one decimal: 0.6667 → `66.7 %`. */
export function formatPercent(fraction: number): string {
  return `${Math.round(fraction * 1000) / 10} %`;
}
