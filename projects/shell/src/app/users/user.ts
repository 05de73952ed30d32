import type { z } from 'zod';
import type { User as UserSchema } from '@tubwright/shared/api/users';

export type User = z.infer<typeof UserSchema>;
