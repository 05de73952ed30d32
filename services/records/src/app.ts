import express from 'express';
import type { Knex } from 'knex';
import type Stripe from 'stripe';
import { errorHandler, notFoundHandler } from '../../common/src/error-handler.js';
import { requireGatewayIdentity } from '../../common/src/internal-identity.js';
import { animalsRoutes } from './animals/animals-routes.js';
import { apiKeysRoutes } from './api-keys/api-keys-routes.js';
import type { CalculatorClient } from './lib/calculator-client.js';
import type { Mailer } from './lib/mailer.js';
import { collectionRoutes } from './collection/collection-routes.js';
import { customersRoutes } from './customers/customers-routes.js';
import { ordersRoutes } from './orders/orders-routes.js';
import { plansRoutes } from './plans/plans-routes.js';
import { quoteLinksRoutes } from './orders/quote-links-routes.js';
import { quoteRequestsRoutes } from './quote-requests/quote-requests-routes.js';
import { stockRoutes } from './stock/stock-routes.js';
import { tubModelsRoutes } from './tub-models/tub-models-routes.js';
import { auditRoutes } from './audit/audit-routes.js';
import { internalAuthRoutes } from './auth/internal-auth-routes.js';
import { usersRoutes } from './users/users-routes.js';

export interface RecordsDeps {
  db: Knex;
  internalSecret: string;
  /** Plans are computed by the calculator service over HTTP. */
  calculator: CalculatorClient;
  mailer: Mailer;
  payments: { client: Stripe; webhookSecret: string };
  /** Where uploaded photos are kept (under the data folder). */
  uploadsDir: string;
  /** How long a sign-in lasts without being refreshed (the refresh token's lifetime). */
  sessionTtlS?: number;
  /** The console's public address, for links in e-mail (password resets, quotes). */
  publicUrl?: string;
}

/** The records service: every business record, behind the gateway only. */
export function createApp(deps: RecordsDeps): express.Express {
  const { db, internalSecret } = deps;
  const app = express();
  app.disable('x-powered-by');
  app.set('query parser', 'simple');

  app.get('/health', async (_req, res) => {
    await db.raw('select 1');
    res.json({ status: 'ok' });
  });

  app.use(requireGatewayIdentity(internalSecret));
  // Areas that need the raw body or multipart (payment webhooks, uploads) mount before the JSON parser.
  app.use(ordersRoutes(deps, 'raw'));
  app.use(collectionRoutes(deps, 'raw'));
  app.use(express.json({ limit: '256kb' }));
  app.use(internalAuthRoutes(deps));
  app.use(usersRoutes(db));
  app.use(auditRoutes(db));
  app.use(tubModelsRoutes(db, deps.uploadsDir));
  app.use(stockRoutes(db));
  app.use(animalsRoutes(db));
  app.use(customersRoutes(db));
  app.use(apiKeysRoutes(db));
  app.use(plansRoutes(deps));
  app.use(collectionRoutes(deps, 'json'));
  app.use(ordersRoutes(deps, 'json'));
  app.use(quoteRequestsRoutes(deps));
  app.use(quoteLinksRoutes(deps));
  app.use(notFoundHandler);
  app.use(errorHandler());
  return app;
}
