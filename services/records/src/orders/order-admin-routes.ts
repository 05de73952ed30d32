import { Router } from 'express';
import { MailLogQuery, UpdateOrderSettingsRequest } from '../../../../shared/api/orders.js';
import { json } from '../../../common/src/async-handler.js';
import { allow } from '../../../common/src/roles.js';
import { parseOrThrow } from '../../../common/src/validate.js';
import type { RecordsDeps } from '../app.js';
import { audit } from '../audit/audit-log.js';
import { listPage } from '../lib/list.js';
import { readOrderSettings, writeOrderSettings } from './order-settings.js';

/** The shop's quote and invoice settings, and the log of what was e-mailed to customers. */
export function orderAdminRoutes(deps: RecordsDeps): Router {
  const { db } = deps;
  const router = Router();

  router.get('/api/v1/order-settings', allow('owner', 'sales'), json(async () => readOrderSettings(db)));

  router.patch(
    '/api/v1/order-settings',
    allow('owner'),
    json(async (req) => {
      const changes = parseOrThrow(UpdateOrderSettingsRequest, req.body);
      const settings = { ...(await readOrderSettings(db)), ...changes };
      await writeOrderSettings(db, settings);
      await audit(db, req.identity, 'update', 'order_settings', null, changes);
      return settings;
    }),
  );

  router.get(
    '/api/v1/mail-log',
    allow('owner', 'sales'),
    json(async (req) => {
      const query = parseOrThrow(MailLogQuery, req.query, 'query');
      let rows = db('mail_log');
      if (query.customerId) rows = rows.where('customer_id', query.customerId);
      if (query.entity) rows = rows.where('entity', query.entity);
      if (query.entityId) rows = rows.where('entity_id', query.entityId);
      return listPage(rows, query, {
        columns: { sentAt: 'sent_at', kind: 'kind', to: 'to' },
        searchColumns: ['to', 'subject'],
        defaultSort: '-sentAt',
        toItem: (r: Record<string, any>) => ({
          id: r.id,
          to: r.to,
          subject: r.subject,
          kind: r.kind,
          customerId: r.customer_id ?? null,
          entity: r.entity,
          entityId: r.entity_id,
          messageId: r.message_id ?? null,
          sentAt: r.sent_at,
          status: r.status,
          error: r.error ?? null,
        }),
      });
    }),
  );

  return router;
}
