import { z } from 'zod';
import { IsoDateTime, listQuery, page } from './common.js';

export const AuditEntry = z.object({
  id: z.number().int(),
  at: IsoDateTime,
  actor: z.string().describe('Who: `user:<e-mail>`, `api-key:<key>` or `system`.'),
  action: z.string().describe('What was done, e.g. create, update, stage, revoke.'),
  entity: z.string().describe('What kind of record, e.g. user, api key, price list, order, payment, animal.'),
  entityId: z.string().nullable(),
  detail: z.record(z.string(), z.unknown()).describe('The change as it was asked for (passwords never appear).'),
});
export const AuditPage = page(AuditEntry);
export const AuditQuery = listQuery(['at', 'actor', 'entity', 'action']).extend({
  entity: z.string().trim().min(1).max(60).optional().describe('Only this kind of record.'),
  entityId: z.string().trim().min(1).max(60).optional().describe('Only this record (with entity).'),
  actor: z.string().trim().min(1).max(200).optional().describe('Only changes by this actor (exact).'),
  from: IsoDateTime.optional().describe('Changes at or after this time.'),
  to: IsoDateTime.optional().describe('Changes before this time.'),
});
