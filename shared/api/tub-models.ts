import { z } from 'zod';
import { listQuery, page } from './common.js';

const inches = (what: string) =>
  z.number().positive(`${what} must be greater than zero`).max(120).describe(`${what}, inches (outside size)`);

export const TubModel = z.object({
  id: z.number().int(),
  name: z.string(),
  maker: z.string(),
  lengthIn: z.number().describe('Front to back as the tub slides into the rack, inches'),
  widthIn: z.number().describe('Side to side, inches'),
  heightIn: z.number().describe('Including the rim, inches'),
  volumeQt: z.number().nullable().describe('Nominal volume, US quarts'),
  notes: z.string(),
});

export const TubModelListQuery = listQuery(['name', 'maker', 'lengthIn', 'widthIn', 'heightIn']);
export const TubModelPage = page(TubModel);

export const CreateTubModelRequest = z
  .object({
    name: z.string().trim().min(1, 'is required').max(120),
    maker: z.string().trim().max(120).default(''),
    lengthIn: inches('lengthIn'),
    widthIn: inches('widthIn'),
    heightIn: inches('heightIn'),
    volumeQt: z.number().positive().max(1000).nullable().default(null),
    notes: z.string().max(2000).default(''),
  })
  .strict();
export const UpdateTubModelRequest = CreateTubModelRequest.partial().strict();
