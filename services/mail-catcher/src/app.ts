import express from 'express';
import { IdParams } from '../../../shared/api/common.js';
import { MailListQuery } from '../../../shared/api/mail.js';
import { errorHandler, notFoundHandler } from '../../common/src/error-handler.js';
import { NotFoundError } from '../../common/src/errors.js';
import { requireGatewayIdentity } from '../../common/src/internal-identity.js';
import { allow } from '../../common/src/roles.js';
import { parseOrThrow } from '../../common/src/validate.js';
import type { MailStore } from './mail-store.js';

/** The inbox of the local mail catcher, read by the owner in the console. */
export function createApp({ store, internalSecret }: { store: MailStore; internalSecret: string }): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.get('/health', (_req, res) => {
    res.json({ status: 'ok' });
  });
  app.use(requireGatewayIdentity(internalSecret));
  app.get('/api/v1/mail/messages', allow('owner'), (req, res) => {
    const query = parseOrThrow(MailListQuery, req.query, 'query');
    let messages = store.list();
    if (query.q) {
      const q = query.q.toLowerCase();
      messages = messages.filter((m) => `${m.subject} ${m.from} ${m.to.join(' ')}`.toLowerCase().includes(q));
    }
    if (query.sort) {
      const key = query.sort.replace(/^-/, '') as 'receivedAt' | 'subject';
      const sign = query.sort.startsWith('-') ? -1 : 1;
      messages = [...messages].sort((a, b) => sign * a[key].localeCompare(b[key]));
    }
    const items = messages.slice(query.offset, query.offset + query.limit).map(({ text: _t, html: _h, ...summary }) => summary);
    res.json({ items, total: messages.length, limit: query.limit, offset: query.offset });
  });
  app.get('/api/v1/mail/messages/:id', allow('owner'), (req, res) => {
    const message = store.get(parseOrThrow(IdParams, req.params).id);
    if (!message) throw new NotFoundError('No such message.');
    res.json(message);
  });
  app.use(notFoundHandler);
  app.use(errorHandler());
  return app;
}
