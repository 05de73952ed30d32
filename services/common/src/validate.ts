import type { z } from 'zod';
import { ValidationError } from './errors.js';

/** Dotted path of a zod issue, e.g. `tub.length` or `parts[2].width`. */
export function issuePath(path: readonly PropertyKey[]): string {
  return path
    .map((p, i) => (typeof p === 'number' ? `[${p}]` : i === 0 ? String(p) : `.${String(p)}`))
    .join('');
}

/** Parses with a zod schema; the first issue becomes a 400 that names its field. */
export function parseOrThrow<S extends z.ZodType>(schema: S, value: unknown, prefix?: string): z.output<S> {
  const result = schema.safeParse(value);
  if (result.success) return result.data;
  const issues = result.error.issues.map((issue) => {
    const path = issuePath(issue.path);
    const field = prefix ? (path ? `${prefix}.${path}` : prefix) : path;
    return { field, message: issue.message, code: issue.code };
  });
  const first = issues[0]!;
  const where = first.field || prefix || 'body';
  throw new ValidationError(`${where}: ${first.message}`, where, issues);
}
