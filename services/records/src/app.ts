import express from 'express';
import type { Knex } from 'knex';
import { errorHandler, notFoundHandler } from '../../common/src/error-handler.js';
import { requireGatewayIdentity } from '../../common/src/internal-identity.js';
import { animalsRoutes } from './animals/animals-routes.js';
import { customersRoutes } from './customers/customers-routes.js';
import { tubModelsRoutes } from './tub-models/tub-models-routes.js';
import { internalAuthRoutes, usersRoutes } from './users/users-routes.js';

export interface RecordsDeps {
  db: Knex;
  internalSecret: string;
}

/** The records service: every business record, behind the gateway only. */
export function createApp({ db, internalSecret }: RecordsDeps): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('query parser', 'simple');

  app.get('/health', async (_req, res) => {
    await db.raw('select 1');
    res.json({ status: 'ok' });
  });

  app.use(requireGatewayIdentity(internalSecret));
  app.use(express.json({ limit: '256kb' }));
  app.use(internalAuthRoutes(db));
  app.use(usersRoutes(db));
  app.use(tubModelsRoutes(db));
  app.use(animalsRoutes(db));
  app.use(customersRoutes(db));
  app.use(notFoundHandler);
  app.use(errorHandler());
  return app;
}
