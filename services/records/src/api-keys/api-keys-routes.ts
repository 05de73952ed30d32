import { Router } from 'express';
import type { Knex } from 'knex';
import { z } from 'zod';
import { ApiKeyListQuery, CreateApiKeyRequest } from '../../../../shared/api/api-keys.js';
import { IdParams } from '../../../../shared/api/common.js';
import { json } from '../../../common/src/async-handler.js';
import { NotFoundError, UnauthorizedError } from '../../../common/src/errors.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import { audit } from '../audit/audit-log.js';
import { insertId, nowIso } from '../db/knex.js';
import { listPage } from '../lib/list.js';
import { hashApiKey, newApiKey } from './key-material.js';

interface ApiKeyRow {
  id: number;
  name: string;
  kind: 'publishable' | 'secret';
  prefix: string;
  key_hash: string;
  scopes_json: string;
  origins_json: string;
  last_used_at: string | null;
  revoked_at: string | null;
  created_at: string;
}

const toView = (row: ApiKeyRow) => ({
  id: row.id,
  name: row.name,
  kind: row.kind,
  prefix: row.prefix,
  scopes: JSON.parse(row.scopes_json) as string[],
  origins: JSON.parse(row.origins_json) as string[],
  lastUsedAt: row.last_used_at,
  revokedAt: row.revoked_at,
  createdAt: row.created_at,
});

const VerifyRequest = z.object({ key: z.string().min(1).max(200) }).strict();
const OriginQuery = z.object({ origin: z.string().min(1).max(200) }).strict();

/** Keys the owner issues to the shop's website widget and to partners. */
export function apiKeysRoutes(db: Knex): Router {
  const router = Router();

  router.get(
    '/api/v1/api-keys',
    allow('owner'),
    json((req) =>
      listPage<ApiKeyRow, ReturnType<typeof toView>>(db('api_keys'), parseOrThrow(ApiKeyListQuery, req.query, 'query'), {
        columns: { name: 'name', createdAt: 'created_at', lastUsedAt: 'last_used_at' },
        searchColumns: ['name', 'prefix'],
        defaultSort: '-createdAt',
        toItem: toView,
      }),
    ),
  );

  router.post(
    '/api/v1/api-keys',
    allow('owner'),
    json(async (req, res) => {
      const body = parseOrThrow(CreateApiKeyRequest, req.body);
      const { key, prefix, hash } = newApiKey(body.kind);
      const now = nowIso();
      const id = await insertId(db('api_keys'), {
        name: body.name,
        kind: body.kind,
        prefix,
        key_hash: hash,
        scopes_json: JSON.stringify([...new Set(body.scopes)]),
        origins_json: JSON.stringify([...new Set(body.origins)]),
        created_by: Number(req.identity!.sub) || null,
        created_at: now,
        updated_at: now,
      });
      await audit(db, req.identity, 'create', 'api key', id!, { name: body.name, kind: body.kind, scopes: body.scopes });
      res.status(201);
      return { ...toView((await db<ApiKeyRow>('api_keys').where({ id }).first())!), key };
    }),
  );

  router.delete(
    '/api/v1/api-keys/:id',
    allow('owner'),
    json(async (req, res) => {
      const { id } = parseOrThrow(IdParams, req.params);
      const row = await db<ApiKeyRow>('api_keys').where({ id }).first();
      if (!row) throw new NotFoundError('No such API key.');
      if (!row.revoked_at) await db('api_keys').where({ id }).update({ revoked_at: nowIso(), updated_at: nowIso() });
      await audit(db, req.identity, 'revoke', 'api key', id);
      res.status(204).end();
    }),
  );

  // The gateway asks here on every call made with a key; revocation takes effect at once.
  router.post(
    '/internal/api-keys/verify',
    allow(),
    json(async (req) => {
      const { key } = parseOrThrow(VerifyRequest, req.body);
      const row = await db<ApiKeyRow>('api_keys').where({ key_hash: hashApiKey(key) }).first();
      if (!row || row.revoked_at) throw new UnauthorizedError('This API key is unknown or has been revoked.');
      await db('api_keys').where({ id: row.id }).update({ last_used_at: nowIso() });
      const view = toView(row);
      return { id: view.id, kind: view.kind, scopes: view.scopes, origins: view.origins };
    }),
  );

  // CORS preflights carry no key: an origin is answered when any live publishable key lists it.
  router.get(
    '/internal/api-keys/origin-allowed',
    allow(),
    json(async (req) => {
      const { origin } = parseOrThrow(OriginQuery, req.query, 'query');
      const rows = await db<ApiKeyRow>('api_keys').where({ kind: 'publishable' }).whereNull('revoked_at').select('origins_json');
      return { allowed: rows.some((r) => (JSON.parse(r.origins_json) as string[]).includes(origin)) };
    }),
  );

  return router;
}
