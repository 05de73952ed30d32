import type { z } from 'zod';
import type { Animal as AnimalSchema } from '@tubwright/shared/api/animals';
import { formatGrams } from '../core/format';

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
export const STATUS_OPTIONS = Object.entries(STATUS_LABELS) as [Animal['status'], string][];
export const SEX_OPTIONS = Object.entries(SEX_LABELS) as [Animal['sex'], string][];

/** Grams as keepers read them: `1,240 g`; from 10 kg on, kilograms with one decimal. */
export function formatWeight(weightG: number | null): string {
  return formatGrams(weightG);
}
