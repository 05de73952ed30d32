import { z } from 'zod';
import { CreateAnimalRequest } from '../../../../../shared/api/animals.js';
import { ORIGINS } from '../../../../../shared/api/collection-animals.js';
import { issuePath } from '../../../../common/src/validate.js';
import type { CsvRow } from '../shared/csv.js';
import { todayUtc } from '../shared/dates.js';

export const ANIMAL_CSV_COLUMNS = ['code', 'name', 'species', 'morph', 'sex', 'hatchDate', 'weightG', 'status', 'notes', 'origin', 'acquiredFrom', 'forSale', 'feedingIntervalDays'] as const;
export const ANIMAL_CSV_REQUIRED = ['code', 'species'] as const;

const ImportedAnimal = CreateAnimalRequest.extend({
  origin: z.enum(ORIGINS).default('unknown'),
  acquiredFrom: z.string().trim().max(120).default(''),
  forSale: z.boolean().default(false),
  feedingIntervalDays: z.number().int().min(1).max(90).nullable().default(null),
});
export type ImportedAnimal = z.infer<typeof ImportedAnimal>;

const NUMERIC = new Set(['weightG', 'feedingIntervalDays']);
const YES = new Set(['true', 'yes', 'y', '1']);
const NO = new Set(['false', 'no', 'n', '0']);

/** CSV cells are text: empty means "use the default", numbers and yes/no are read here. */
function cellsToInput(values: Record<string, string>): { input: Record<string, unknown>; errors: { field: string; message: string }[] } {
  const input: Record<string, unknown> = {};
  const errors: { field: string; message: string }[] = [];
  for (const [field, raw] of Object.entries(values)) {
    if (raw === '') continue;
    if (NUMERIC.has(field)) {
      const n = Number(raw);
      if (Number.isFinite(n)) input[field] = n;
      else errors.push({ field, message: `"${raw}" is not a number` });
    } else if (field === 'forSale') {
      if (YES.has(raw.toLowerCase())) input[field] = true;
      else if (NO.has(raw.toLowerCase())) input[field] = false;
      else errors.push({ field, message: 'is yes or no' });
    } else input[field] = raw;
  }
  return { input, errors };
}

export interface AnimalImportCheck {
  animals: { row: number; animal: ImportedAnimal }[];
  errors: { row: number; field: string; message: string }[];
}

/**
 * Every row checked against the animal rules, codes unique in the file and not taken already
 * (`takenCodes` lower-case); all problems are listed so the keeper fixes the file in one go.
 */
export function checkAnimalRows(rows: readonly CsvRow[], takenCodes: ReadonlySet<string>, today = todayUtc()): AnimalImportCheck {
  const animals: AnimalImportCheck['animals'] = [];
  const errors: AnimalImportCheck['errors'] = [];
  const firstLineByCode = new Map<string, number>();
  for (const { line, values } of rows) {
    const cells = cellsToInput(values);
    errors.push(...cells.errors.map((e) => ({ row: line, ...e })));
    const parsed = ImportedAnimal.safeParse(cells.input);
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const field = issuePath(issue.path);
        if (!cells.errors.some((e) => e.field === field)) errors.push({ row: line, field, message: issue.message });
      }
      continue;
    }
    const animal = parsed.data;
    const key = animal.code.toLowerCase();
    if (firstLineByCode.has(key)) errors.push({ row: line, field: 'code', message: `${animal.code} is also on line ${firstLineByCode.get(key)}` });
    else if (takenCodes.has(key)) errors.push({ row: line, field: 'code', message: `${animal.code} is in the collection already` });
    firstLineByCode.set(key, firstLineByCode.get(key) ?? line);
    if (animal.hatchDate && animal.hatchDate > today) errors.push({ row: line, field: 'hatchDate', message: 'is in the future' });
    animals.push({ row: line, animal });
  }
  return { animals, errors };
}
