import { z } from 'zod';

export const ROLE_VALUES = ['owner', 'builder', 'keeper', 'sales'] as const;
export const RoleSchema = z.enum(ROLE_VALUES).describe('What the user may do: owner, builder, keeper or sales.');
export type RoleName = z.infer<typeof RoleSchema>;

export const ErrorResponse = z
  .object({
    error: z.object({
      code: z.string().describe('Stable machine-readable code, e.g. invalid_input, unauthorized.'),
      message: z.string().describe('A sentence a person can act on.'),
      field: z.string().optional().describe('The request field at fault, e.g. tub.length.'),
      details: z.unknown().optional(),
    }),
  })
  .describe('Every error has this shape; no stack traces.');

export const IdParams = z.object({ id: z.coerce.number().int().positive().describe('Record id') });

const MAX_LIMIT = 200;

/** limit/offset paging, sorting by one of `fields` (prefix `-` for descending), and a text filter. */
export function listQuery<const F extends readonly [string, ...string[]]>(fields: F) {
  const sortValues = [...fields, ...fields.map((f) => `-${f}`)] as [string, ...string[]];
  return z
    .object({
      limit: z.coerce.number().int().min(1).max(MAX_LIMIT).default(25).describe(`Page size, 1 to ${MAX_LIMIT}.`),
      offset: z.coerce.number().int().min(0).default(0).describe('Rows to skip.'),
      sort: z.enum(sortValues).optional().describe(`Sort field; prefix with - for descending. One of ${fields.join(', ')}.`),
      q: z.string().trim().max(100).optional().describe('Case-insensitive text filter.'),
    })
    .strict();
}

export function page<T extends z.ZodType>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int().describe('Rows matching the filter, over all pages.'),
    limit: z.number().int(),
    offset: z.number().int(),
  });
}

export const IsoDateTime = z.string().describe('ISO 8601 date and time in UTC, e.g. 2026-12-02T09:30:00.000Z');
export const IsoDate = z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'must be a date like 2026-12-02').describe('ISO 8601 date');
