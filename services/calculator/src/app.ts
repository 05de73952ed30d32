import express from 'express';
import { errorHandler, notFoundHandler } from '../../common/src/error-handler.js';
import { requireGatewayIdentity } from '../../common/src/internal-identity.js';
import { cuttingPlanRoutes } from './http/cutting-plan-routes.js';
import { inProcessCutting, type CuttingRunner } from './http/cutting-runner.js';
import { geneticsRoutes } from './http/genetics-routes.js';
import { rackPlanRoutes } from './http/rack-plan-routes.js';

export interface CalculatorDeps {
  internalSecret: string;
  /** Where cutting plans run: a worker pool in the service, in-process by default. */
  runCutting?: CuttingRunner;
}

/** The stateless calculator: pure domain functions behind thin HTTP handlers; any number of copies may run. */
export function createApp({ internalSecret, runCutting = inProcessCutting }: CalculatorDeps): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.get('/health', (_req, res) => {
    res.json({ status: 'ok' });
  });
  app.use(requireGatewayIdentity(internalSecret));
  app.use(express.json({ limit: '1mb' }));
  app.use(rackPlanRoutes(runCutting));
  app.use(cuttingPlanRoutes(runCutting));
  app.use(geneticsRoutes());
  app.use(notFoundHandler);
  app.use(errorHandler());
  return app;
}
