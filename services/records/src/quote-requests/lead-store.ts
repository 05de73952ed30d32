import type { Knex } from 'knex';
import type { Identity } from '../../../common/src/internal-identity.js';
import { audit } from '../audit/audit-log.js';
import { insertId, nowIso } from '../db/knex.js';

export interface Lead {
  customerId: number;
  /** True when this request created the customer. */
  created: boolean;
}

/** A publishable key is the shop's website widget; a secret key is a partner's server. */
async function leadSource(trx: Knex, identity: Identity | undefined): Promise<string> {
  const keyId = identity?.kind === 'api-key' ? Number(identity.sub.replace(/^key:/, '')) : NaN;
  if (!Number.isInteger(keyId)) return 'other';
  const key = (await trx('api_keys').where({ id: keyId }).first('kind')) as { kind: string } | undefined;
  return key?.kind === 'secret' ? 'partner-api' : 'website-widget';
}

/**
 * The customer with this e-mail, or a new one marked as a website lead. An existing customer is
 * never changed: anyone can type any address into a public form.
 */
export async function findOrCreateLead(
  trx: Knex,
  identity: Identity | undefined,
  visitor: { name: string; email: string; phone: string; source: string },
): Promise<Lead> {
  const existing = (await trx('customers')
    .whereRaw('lower(email) = ?', [visitor.email.toLowerCase()])
    .whereNull('deleted_at')
    .orderBy('id')
    .first('id')) as { id: number } | undefined;
  if (existing) return { customerId: existing.id, created: false };
  const now = nowIso();
  const notes = `Website lead${visitor.source ? ` from ${visitor.source}` : ''}; agreed to be contacted on ${now}.`;
  const source = await leadSource(trx, identity);
  const id = await insertId(trx('customers'), { name: visitor.name, email: visitor.email, phone: visitor.phone, notes, source, created_at: now, updated_at: now });
  await audit(trx, identity, 'create', 'customer', id!, { lead: true, source: visitor.source });
  return { customerId: id!, created: true };
}
