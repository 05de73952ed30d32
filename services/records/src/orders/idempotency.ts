import { createHash } from 'node:crypto';
import type { Request, Response } from 'express';
import type { Knex } from 'knex';
import { UnprocessableError, ValidationError } from '../../../common/src/errors.js';
import { nowIso } from '../db/knex.js';

const HEADER = 'idempotency-key';

/**
 * Runs a retryable write once per Idempotency-Key (per caller and route): a retry with the same
 * key and body gets the first answer again; the same key with another body is refused. Without
 * the header the write simply runs. Only successful answers are kept, so a failed attempt may be
 * retried with the same key.
 */
export async function idempotent<T>(db: Knex, req: Request, res: Response, run: () => Promise<{ status: number; body: T }>): Promise<T> {
  const key = req.header(HEADER);
  if (key === undefined) {
    const { status, body } = await run();
    res.status(status);
    return body;
  }
  if (!/^[\x21-\x7e]{1,200}$/.test(key)) throw new ValidationError('Idempotency-Key must be 1 to 200 visible ASCII characters.', 'Idempotency-Key');
  const route = `${req.method} ${req.baseUrl}${req.path}`;
  const actor = req.identity ? `${req.identity.kind}:${req.identity.sub}` : 'anonymous';
  const requestHash = createHash('sha256').update(JSON.stringify(req.body ?? null)).digest('hex');
  const where = { key, route, actor };
  const stored = (await db('idempotency_keys').where(where).first()) as { request_hash: string; status_code: number; response_json: string } | undefined;
  if (stored) {
    if (stored.request_hash !== requestHash) throw new UnprocessableError('This Idempotency-Key was used with a different request body.', 'Idempotency-Key');
    res.status(stored.status_code).setHeader('idempotent-replayed', 'true');
    return JSON.parse(stored.response_json) as T;
  }
  const { status, body } = await run();
  await db('idempotency_keys')
    .insert({ ...where, request_hash: requestHash, status_code: status, response_json: JSON.stringify(body), created_at: nowIso() })
    .onConflict(['key', 'route', 'actor'])
    .ignore();
  res.status(status);
  return body;
}
