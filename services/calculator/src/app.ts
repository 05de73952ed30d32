import express from 'express';
import { errorHandler, notFoundHandler } from '../../common/src/error-handler.js';
import { requireGatewayIdentity } from '../../common/src/internal-identity.js';
import { geneticsRoutes } from './http/genetics-routes.js';
import { rackPlanRoutes } from './http/rack-plan-routes.js';

export interface CalculatorDeps {
  internalSecret: string;
}

/** The stateless calculator: pure domain functions behind thin HTTP handlers; any number of copies may run. */
export function createApp({ internalSecret }: CalculatorDeps): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.get('/health', (_req, res) => {
    res.json({ status: 'ok' });
  });
  app.use(requireGatewayIdentity(internalSecret));
  app.use(express.json({ limit: '1mb' }));
  app.use(rackPlanRoutes());
  app.use(geneticsRoutes());
  app.use(notFoundHandler);
  app.use(errorHandler());
  return app;
}
