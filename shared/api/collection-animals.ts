import { z } from 'zod';
import { Animal } from './animals.js';
import { AnimalGene } from './collection-breeding.js';
import { Placement } from './collection-racks.js';
import { IsoDate } from './common.js';

/*
 * What the collection adds to an animal (the foundation's Animal stays as it is): origin and
 * parents, its own feeding interval, whether it is offered for sale, its tub and its genes.
 */

export const ORIGINS = ['bred', 'acquired', 'unknown'] as const;

export const AnimalProfile = z
  .object({
    animal: Animal,
    origin: z.enum(ORIGINS).describe('bred here (with parents) or acquired (from someone).'),
    acquiredFrom: z.string(),
    sireId: z.number().int().nullable(),
    damId: z.number().int().nullable(),
    clutchId: z.number().int().nullable(),
    feedingIntervalDays: z.number().int().nullable().describe('The animal\'s own interval; null uses the default for its stage.'),
    forSale: z.boolean(),
    currentTub: Placement.nullable(),
    genes: z.array(AnimalGene),
  })
  .describe('An animal with everything the collection keeps about it.');

export const UpdateProfileRequest = z
  .object({
    origin: z.enum(ORIGINS).optional(),
    acquiredFrom: z.string().trim().max(120).optional(),
    sireId: z.number().int().positive().nullable().optional(),
    damId: z.number().int().positive().nullable().optional(),
    feedingIntervalDays: z.number().int().min(1).max(90).nullable().optional(),
    forSale: z.boolean().optional(),
  })
  .strict();

export const ForSaleAnimal = z.object({
  id: z.number().int(),
  code: z.string(),
  name: z.string(),
  species: z.string(),
  sex: z.string(),
  hatchDate: IsoDate.nullable(),
  weightG: z.number().nullable(),
  morph: z.string(),
  genes: z.array(AnimalGene),
});
export const ForSaleList = z.object({ items: z.array(ForSaleAnimal), total: z.number().int() }).describe('Animals marked for sale, by code.');

export const ImportRowError = z.object({
  row: z.number().int().describe('Line of the CSV file, the header being line 1.'),
  field: z.string().describe('Column name, e.g. weightG.'),
  message: z.string(),
});
export const ImportPreview = z
  .object({
    ok: z.boolean().describe('True when every row is valid and the import can go ahead.'),
    rowCount: z.number().int(),
    errors: z.array(ImportRowError),
    animals: z.array(z.object({ row: z.number().int(), code: z.string(), name: z.string(), species: z.string() })),
  })
  .describe('What an import would do; nothing is written.');
export const ImportResult = z.object({ imported: z.number().int(), ids: z.array(z.number().int()) });

export const AnimalPhoto = z.object({
  id: z.number().int(),
  animalId: z.number().int(),
  contentType: z.string().describe('image/jpeg, image/png, image/gif or image/webp, read from the file\'s bytes.'),
  sizeBytes: z.number().int(),
  url: z.string().describe('Where to fetch the image (signed-in keepers and owner).'),
  createdAt: z.string(),
});
export const AnimalPhotoList = z.object({ items: z.array(AnimalPhoto), total: z.number().int() }).describe('An animal\'s photos, oldest first.');
