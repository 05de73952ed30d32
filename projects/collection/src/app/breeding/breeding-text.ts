import type { PairingStatus } from '../core/collection-types';

export const PAIRING_STATUS_LABELS: Record<PairingStatus, string> = {
  planned: 'Planned',
  introduced: 'Introduced',
  locked: 'Locked',
  ovulated: 'Ovulated',
  'pre-lay-shed': 'Pre-lay shed',
  laid: 'Laid',
  failed: 'Failed',
  closed: 'Closed',
};
export const PAIRING_STATUSES = Object.keys(PAIRING_STATUS_LABELS) as PairingStatus[];

/** Days from laying to hatching at 88 to 90 °F (common practice, from memory); the server's figure is the record. */
export const HATCH_DAYS = { from: 55, to: 60 } as const;

/** `YYYY-MM-DD` plus whole days, in UTC. */
export function addDays(day: string, days: number): string {
  const date = new Date(`${day}T00:00:00Z`);
  date.setUTCDate(date.getUTCDate() + days);
  return date.toISOString().slice(0, 10);
}

/** The hatch window a clutch laid on `laidOn` would get, shown while the keeper fills the form. */
export function expectedHatchPreview(laidOn: string): { from: string; to: string } | null {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(laidOn) || Number.isNaN(Date.parse(laidOn))) return null;
  return { from: addDays(laidOn, HATCH_DAYS.from), to: addDays(laidOn, HATCH_DAYS.to) };
}

/** A breeding season label from a date: November 2026 → `2026-27` (seasons run over the new year). */
export function seasonOf(day: Date): string {
  const year = day.getUTCFullYear();
  const start = day.getUTCMonth() >= 6 ? year : year - 1;
  return `${start}-${String((start + 1) % 100).padStart(2, '0')}`;
}
