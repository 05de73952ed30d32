import { z } from 'zod';
import { IsoDateTime, listQuery, page } from './common.js';

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
  photoId: z.number().int().nullable().describe('The current photo (GET /api/v1/tub-model-photos/{id}/thumbnail or /file), or null. Set by uploading, not by PATCH.'),
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

// ---------------------------------------------------------------------------------------------
// Photo: one optional photo per tub model (multipart upload; the bytes are checked, not the name).

export const TubModelPhoto = z
  .object({
    id: z.number().int(),
    tubModelId: z.number().int(),
    contentType: z.string().describe('image/jpeg, image/png, image/gif or image/webp, read from the bytes.'),
    sizeBytes: z.number().int(),
    hasThumbnail: z.boolean().describe('False when no thumbnail was sent: the thumbnail route then serves the original.'),
    url: z.string().describe('The image: GET with the same sign-in.'),
    thumbnailUrl: z.string().describe('A small copy for lists.'),
    createdAt: IsoDateTime,
  })
  .describe('The current photo of a tub model.');
