import express from 'express';
import swaggerUi from 'swagger-ui-express';
import { errorHandler, notFoundHandler } from '../../services/common/src/error-handler.js';
import { apiKeyAuth, apiKeyRateLimits, corsPreflight } from './auth/api-key-auth.js';
import { authRoutes } from './auth/auth-routes.js';
import { bearerAuth } from './auth/passport-jwt.js';
import { TokenService } from './auth/tokens.js';
import { openApiDocument } from './openapi/document.js';
import { ServiceClient } from './proxy/service-client.js';
import { serviceProxy } from './proxy/service-proxy.js';
import { staticWeb } from './web/static-web.js';

export interface GatewayDeps {
  calculatorUrl: string;
  recordsUrl: string;
  mailUrl: string;
  paymentsUrl: string;
  webDir: string;
  jwtSecret: string;
  internalSecret: string;
  accessTokenTtlS: number;
  refreshTokenTtlS: number;
  loginRateLimitPerMinute: number;
  apiKeyRateLimitPerMinute?: number;
  widgetIpRateLimitPerMinute?: number;
  version?: string;
}

/** The one door: sign-in, identity, routing to the services, the API document and the console. */
export function createGatewayApp(deps: GatewayDeps): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use((_req, res, next) => {
    res.setHeader('x-content-type-options', 'nosniff');
    res.setHeader('referrer-policy', 'same-origin');
    next();
  });

  const tokens = new TokenService(deps.jwtSecret, deps.accessTokenTtlS, deps.refreshTokenTtlS);
  const bearer = bearerAuth(tokens);
  const services = {
    calculator: new ServiceClient(deps.calculatorUrl, deps.internalSecret),
    records: new ServiceClient(deps.recordsUrl, deps.internalSecret),
    mail: new ServiceClient(deps.mailUrl, deps.internalSecret),
    payments: new ServiceClient(deps.paymentsUrl, deps.internalSecret),
  };

  app.get('/api/v1/health', async (_req, res) => {
    const entries = await Promise.all(Object.entries(services).map(async ([name, client]) => [name, await client.health()] as const));
    const report = { gateway: { status: 'ok' as const }, ...Object.fromEntries(entries) };
    const allUp = entries.every(([, h]) => h.status === 'ok');
    res.status(allUp ? 200 : 503).json({ status: allUp ? 'ok' : 'degraded', version: deps.version ?? '0.1.0', services: report });
  });

  app.get('/api/openapi.json', (_req, res) => {
    res.json(openApiDocument());
  });
  app.use('/api/docs', swaggerUi.serve, swaggerUi.setup(openApiDocument(), { customSiteTitle: 'Tubwright API' }));

  app.use(corsPreflight(services.records));
  app.use(authRoutes(services.records, tokens, deps.loginRateLimitPerMinute));

  // The payment provider signs its webhook itself; the records service checks that signature.
  app.post('/api/v1/payments/webhook', (req, _res, next) => {
    req.identity = { kind: 'gateway', sub: 'payments-webhook', role: 'system', iat: 0 };
    next('route');
  });
  // Everything else under /api/v1 needs an API key (partners, the website widget) or a signed-in user.
  app.use('/api/v1', apiKeyAuth(services.records), ...apiKeyRateLimits(deps.apiKeyRateLimitPerMinute ?? 300, deps.widgetIpRateLimitPerMinute ?? 60));
  app.use('/api/v1', (req, res, next) => (req.identity ? next() : bearer(req, res, next)));

  app.use(serviceProxy({ name: 'calculator', url: deps.calculatorUrl, paths: ['/api/v1/calc/**', '/api/v1/genetics/**'] }, deps.internalSecret));
  app.use(serviceProxy({ name: 'mail', url: deps.mailUrl, paths: ['/api/v1/mail/**'] }, deps.internalSecret));
  app.use(serviceProxy({ name: 'records', url: deps.recordsUrl, paths: ['/api/v1/**'] }, deps.internalSecret));

  app.use('/api', notFoundHandler);
  app.use(staticWeb(deps.webDir));
  app.use(errorHandler());
  return app;
}
