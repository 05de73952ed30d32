import { Router } from 'express';
import type { Knex } from 'knex';
import { AuditQuery } from '../../../../shared/api/audit.js';
import { json } from '../../../common/src/async-handler.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import { listPage } from '../lib/list.js';

interface AuditRow {
  id: number;
  at: string;
  actor: string;
  action: string;
  entity: string;
  entity_id: string | null;
  detail_json: string;
}

const toEntry = (row: AuditRow) => ({
  id: row.id,
  at: row.at,
  actor: row.actor,
  action: row.action,
  entity: row.entity,
  entityId: row.entity_id,
  detail: safeDetail(row.detail_json),
});

function safeDetail(text: string): Record<string, unknown> {
  try {
    const value: unknown = JSON.parse(text);
    return value && typeof value === 'object' && !Array.isArray(value) ? (value as Record<string, unknown>) : { value };
  } catch {
    return {};
  }
}

/** Who changed what and when: the owner's read of the audit log (newest first by default). */
export function auditRoutes(db: Knex): Router {
  const router = Router();
  router.get(
    '/api/v1/audit-log',
    allow('owner'),
    json(async (req) => {
      const { entity, entityId, actor, from, to, ...params } = parseOrThrow(AuditQuery, req.query);
      const query = db('audit_log').select('*');
      if (entity) query.where({ entity });
      if (entityId) query.where({ entity_id: entityId });
      if (actor) query.where({ actor });
      if (from) query.where('at', '>=', from);
      if (to) query.where('at', '<', to);
      return listPage<AuditRow, ReturnType<typeof toEntry>>(query, { ...params, sort: params.sort ?? '-at' }, {
        columns: { at: 'at', actor: 'actor', entity: 'entity', action: 'action' },
        searchColumns: ['actor', 'action', 'entity', 'entity_id'],
        defaultSort: '-at',
        toItem: toEntry,
      });
    }),
  );
  return router;
}
