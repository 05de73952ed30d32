import type { Knex } from 'knex';
import type { Identity } from '../../../common/src/internal-identity.js';
import { nowIso } from '../db/knex.js';

/** Who changed what, kept for every business write. */
export async function audit(
  db: Knex,
  identity: Identity | undefined,
  action: string,
  entity: string,
  entityId: number | string | null,
  detail: Record<string, unknown> = {},
): Promise<void> {
  await db('audit_log').insert({
    at: nowIso(),
    actor: identity ? `${identity.kind}:${identity.email ?? identity.sub}` : 'system',
    action,
    entity,
    entity_id: entityId === null ? null : String(entityId),
    detail_json: JSON.stringify(detail),
  });
}
