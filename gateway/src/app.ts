import express from 'express';
import swaggerUi from 'swagger-ui-express';
import { errorHandler, notFoundHandler } from '../../services/common/src/error-handler.js';
import { apiKeyAuth, apiKeyRateLimits, corsPreflight, type VerifiedKey } from './auth/api-key-auth.js';
import { FallbackCache } from './auth/fallback-cache.js';
import { authRoutes } from './auth/auth-routes.js';
import { EndedSessions } from './auth/ended-sessions.js';
import { bearerAuth } from './auth/passport-jwt.js';
import { TokenService } from './auth/tokens.js';
import { openApiDocument } from './openapi/document.js';
import { CalculationMemo } from './proxy/calculation-memo.js';
import { CalculatorPool } from './proxy/calculator-pool.js';
import { calculatorProxy } from './proxy/calculator-proxy.js';
import { ServiceClient } from './proxy/service-client.js';
import { serviceProxy } from './proxy/service-proxy.js';
import { bodySizeCap } from './body-size-cap.js';
import { securityHeaders } from './security-headers.js';
import { staticWeb } from './web/static-web.js';

export interface GatewayDeps {
  calculatorUrl: string;
  /** Every calculator copy; requests spread over them (calculatorUrl alone when absent). */
  calculatorUrls?: string[];
  /** How often each calculator copy's /health is asked; 0 asks a copy that is out only as requests arrive. */
  calculatorHealthIntervalMs?: number;
  recordsUrl: string;
  mailUrl: string;
  paymentsUrl: string;
  webDir: string;
  jwtSecret: string;
  internalSecret: string;
  accessTokenTtlS: number;
  refreshTokenTtlS: number;
  loginRateLimitPerMinute: number;
  /** The console's public address, for links in e-mail. */
  publicUrl?: string;
  /** How long a proxied request may wait for the records or mail service before a 504. */
  upstreamTimeoutMs?: number;
  apiKeyRateLimitPerMinute?: number;
  widgetIpRateLimitPerMinute?: number;
  version?: string;
  /** Recent calculator answers reused for an identical request (see CalculationMemo); 0 or absent keeps none. */
  calculationMemoEntries?: number;
}

/** The one door: sign-in, identity, routing to the services, the API document and the console. */
export function createGatewayApp(deps: GatewayDeps): express.Express {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(securityHeaders());

  const tokens = new TokenService(deps.jwtSecret, deps.accessTokenTtlS, deps.refreshTokenTtlS);
  const ended = new EndedSessions();
  const bearer = bearerAuth(tokens, ended);
  const calculatorPool = new CalculatorPool(deps.calculatorUrls?.length ? deps.calculatorUrls : [deps.calculatorUrl], {
    healthIntervalMs: deps.calculatorHealthIntervalMs ?? 0,
  });
  app.locals.calculatorPool = calculatorPool;
  const calculationMemo = deps.calculationMemoEntries ? new CalculationMemo(deps.calculationMemoEntries) : undefined;
  app.locals.calculationMemo = calculationMemo;
  const services = {
    calculator: calculatorPool,
    records: new ServiceClient(deps.recordsUrl, deps.internalSecret, 'records'),
    mail: new ServiceClient(deps.mailUrl, deps.internalSecret, 'mail'),
    payments: new ServiceClient(deps.paymentsUrl, deps.internalSecret, 'payments'),
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

  // Key checks are cached briefly (and used stale while the records service is down); any change
  // to the keys through this gateway forgets them at once.
  const keyChecks = new FallbackCache<VerifiedKey>(30_000, 10 * 60_000);
  const originChecks = new FallbackCache<{ allowed: boolean }>(30_000, 10 * 60_000);
  app.use('/api/v1/api-keys', (req, res, next) => {
    if (req.method !== 'GET') res.on('finish', () => res.statusCode < 300 && (keyChecks.clear(), originChecks.clear()));
    next();
  });
  app.use(corsPreflight(services.records, originChecks));
  app.use(
    authRoutes(services.records, tokens, {
      loginsPerMinute: deps.loginRateLimitPerMinute,
      publicUrl: deps.publicUrl ?? 'http://127.0.0.1:4300',
      ended,
      bearer,
    }),
  );

  // The payment provider signs its webhook itself; the records service checks that signature.
  app.post('/api/v1/payments/webhook', (req, _res, next) => {
    req.identity = { kind: 'gateway', sub: 'payments-webhook', role: 'system', iat: 0 };
    next('route');
  });
  // A customer opens their quote from its e-mail with no account: the link's signature is checked by the records service.
  app.use('/api/v1/quote-links', (req, _res, next) => {
    req.identity = { kind: 'gateway', sub: 'customer-link', role: 'system', iat: 0 };
    next();
  });
  app.use('/api/v1', bodySizeCap());
  // Everything else under /api/v1 needs an API key (partners, the website widget) or a signed-in user.
  app.use('/api/v1', apiKeyAuth(services.records, keyChecks), ...apiKeyRateLimits(deps.apiKeyRateLimitPerMinute ?? 300, deps.widgetIpRateLimitPerMinute ?? 60));
  app.use('/api/v1', (req, res, next) => (req.identity ? next() : bearer(req, res, next)));

  app.use(calculatorProxy(calculatorPool, deps.internalSecret, { prefixes: ['/api/v1/calc/', '/api/v1/genetics/'], timeoutMs: deps.upstreamTimeoutMs, memo: calculationMemo }));
  app.use(serviceProxy({ name: 'mail', url: deps.mailUrl, paths: ['/api/v1/mail/**'] }, deps.internalSecret, deps.upstreamTimeoutMs));
  app.use(serviceProxy({ name: 'records', url: deps.recordsUrl, paths: ['/api/v1/**'] }, deps.internalSecret, deps.upstreamTimeoutMs));

  app.use('/api', notFoundHandler);
  app.use(staticWeb(deps.webDir));
  app.use(errorHandler());
  return app;
}
