import { Router } from 'express';
import type { Knex } from 'knex';
import { DigestRequest, DueQuery } from '../../../../../shared/api/collection-schedules.js';
import { json } from '../../../../common/src/async-handler.js';
import { ApiError, UnprocessableError } from '../../../../common/src/errors.js';
import { allow } from '../../../../common/src/roles.js';
import { parseOrThrow } from '../../../../common/src/validate.js';
import { audit } from '../../audit/audit-log.js';
import { nowIso } from '../../db/knex.js';
import type { Mailer } from '../../lib/mailer.js';
import { KEEPERS } from '../shared/access.js';
import { assertRealDate, todayUtc } from '../shared/dates.js';
import { digestText } from './digest-text.js';
import { dueList } from './due-store.js';

/** Who is due to eat, and the morning digest e-mail. */
export function schedulesRoutes(db: Knex, mailer: Mailer): Router {
  const router = Router();

  router.get(
    '/api/v1/feeding/due',
    allow(...KEEPERS),
    json(async (req) => {
      const { date } = parseOrThrow(DueQuery, req.query, 'query');
      if (date) assertRealDate(date, 'query.date');
      return dueList(db, date ?? todayUtc());
    }),
  );

  // Owner, keepers, or the gateway's scheduler (identity `system`) may send it.
  router.post(
    '/api/v1/feeding/digest',
    allow(...KEEPERS),
    json(async (req) => {
      const body = parseOrThrow(DigestRequest, req.body ?? {});
      if (body.date) assertRealDate(body.date, 'date');
      const date = body.date ?? todayUtc();
      let recipients = (await db('users').where({ role: 'keeper', active: true }).orderBy('email').pluck('email')) as string[];
      if (recipients.length === 0) recipients = (await db('users').where({ role: 'owner', active: true }).orderBy('email').pluck('email')) as string[];
      if (recipients.length === 0) throw new UnprocessableError('No active keeper or owner to send the digest to.');
      const due = await dueList(db, date);
      const mail = digestText(due);
      const entityId = Number(date.replaceAll('-', ''));
      const logRow = { to: recipients.join(', '), subject: mail.subject, kind: 'feeding-digest', entity: 'feeding_digest', entity_id: entityId, sent_at: nowIso(), created_at: nowIso(), updated_at: nowIso() };
      let messageId: string;
      try {
        ({ messageId } = await mailer.send({ to: recipients, subject: mail.subject, text: mail.text }));
      } catch (err) {
        await db('mail_log').insert({ ...logRow, status: 'failed', error: String((err as Error).message).slice(0, 500) });
        throw new ApiError(502, 'mail_unavailable', 'The mail server did not take the digest; try again in a moment.');
      }
      await db('mail_log').insert({ ...logRow, message_id: messageId, status: 'sent' });
      await audit(db, req.identity, 'send', 'feeding_digest', entityId, { recipients: recipients.length, due: due.total });
      return { date, sentTo: recipients, dueCount: due.total, flaggedCount: mail.flagged };
    }),
  );

  return router;
}
