import type { z } from 'zod';
import type { TubModel as TubModelSchema } from '@tubwright/shared/api/tub-models';

export type TubModel = z.infer<typeof TubModelSchema>;
