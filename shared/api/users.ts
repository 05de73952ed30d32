import { z } from 'zod';
import { IsoDateTime, RoleSchema, listQuery, page } from './common.js';

export const User = z.object({
  id: z.number().int(),
  email: z.string(),
  name: z.string(),
  role: RoleSchema,
  active: z.boolean(),
  createdAt: IsoDateTime,
  updatedAt: IsoDateTime,
});

export const UserListQuery = listQuery(['email', 'name', 'role', 'createdAt']);
export const UserPage = page(User);

export const CreateUserRequest = z
  .object({
    email: z.string().trim().toLowerCase().email('must be an e-mail address').max(200),
    name: z.string().trim().min(1, 'is required').max(120),
    role: RoleSchema,
    password: z.string().min(10, 'must be at least 10 characters').max(200),
  })
  .strict();

export const UpdateUserRequest = z
  .object({
    name: z.string().trim().min(1).max(120).optional(),
    role: RoleSchema.optional(),
    active: z.boolean().optional(),
    password: z.string().min(10, 'must be at least 10 characters').max(200).optional(),
  })
  .strict()
  .refine((v) => Object.keys(v).length > 0, { message: 'give at least one of name, role, active, password' });
