import { z } from 'zod';
import { IsoDate, listQuery, page } from './common.js';

export const SEX_VALUES = ['male', 'female', 'unknown'] as const;
export const ANIMAL_STATUS_VALUES = ['active', 'on-hold', 'sold', 'deceased'] as const;

export const Animal = z.object({
  id: z.number().int(),
  code: z.string().describe('The keeper\'s own identifier, unique in the collection'),
  name: z.string(),
  species: z.string(),
  morph: z.string().describe('Visual and het genes as written by the keeper'),
  sex: z.enum(SEX_VALUES),
  hatchDate: z.string().nullable(),
  weightG: z.number().int().nullable().describe('Latest weight, grams'),
  status: z.enum(ANIMAL_STATUS_VALUES),
  location: z.string().describe('Rack and slot, e.g. R2-3B'),
  notes: z.string(),
});

export const AnimalListQuery = listQuery(['code', 'name', 'species', 'morph', 'sex', 'hatchDate', 'weightG', 'status']).extend({
  status: z.enum(ANIMAL_STATUS_VALUES).optional(),
  sex: z.enum(SEX_VALUES).optional(),
});
export const AnimalPage = page(Animal);

export const CreateAnimalRequest = z
  .object({
    code: z.string().trim().min(1, 'is required').max(40),
    name: z.string().trim().max(80).default(''),
    species: z.string().trim().min(1, 'is required').max(120),
    morph: z.string().trim().max(200).default(''),
    sex: z.enum(SEX_VALUES).default('unknown'),
    hatchDate: IsoDate.nullable().default(null),
    weightG: z.number().int().positive().max(200000).nullable().default(null),
    status: z.enum(ANIMAL_STATUS_VALUES).default('active'),
    location: z.string().trim().max(40).default(''),
    notes: z.string().max(4000).default(''),
  })
  .strict();
export const UpdateAnimalRequest = CreateAnimalRequest.partial().strict();
