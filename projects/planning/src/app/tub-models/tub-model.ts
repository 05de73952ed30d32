import type { z } from 'zod';
import type { TubModel as TubModelSchema, TubModelPhoto as TubModelPhotoSchema } from '@tubwright/shared/api/tub-models';

export type TubModel = z.infer<typeof TubModelSchema>;
export type TubModelPhoto = z.infer<typeof TubModelPhotoSchema>;
