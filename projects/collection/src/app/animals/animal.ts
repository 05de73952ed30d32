import type { z } from 'zod';
import type { Animal as AnimalSchema } from '@tubwright/shared/api/animals';

export type Animal = z.infer<typeof AnimalSchema>;

const STATUS_LABELS: Record<Animal['status'], string> = {
  active: 'Active',
  'on-hold': 'On hold',
  sold: 'Sold',
  deceased: 'Deceased',
};

const SEX_LABELS: Record<Animal['sex'], string> = { male: 'Male', female: 'Female', unknown: 'Unsexed' };

export const statusLabel = (status: Animal['status']): string => STATUS_LABELS[status] ?? status;
export const sexLabel = (sex: Animal['sex']): string => SEX_LABELS[sex] ?? sex;

/** Grams as keepers read them: `1,240 g`; from 10 kg on, kilograms with one decimal. */
export function formatWeight(weightG: number | null): string {
  if (weightG === null) return '—';
  if (weightG >= 10_000) return `${(weightG / 1000).toFixed(1)} kg`;
  return `${weightG.toLocaleString('en-US')} g`;
}
