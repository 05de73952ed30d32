import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit, type Options } from 'express-rate-limit';
import { ForbiddenError } from '../../../services/common/src/errors.js';
import { FallbackCache } from './fallback-cache.js';
import type { ServiceClient } from '../proxy/service-client.js';

export const API_KEY_HEADER = 'x-api-key';

export interface VerifiedKey {
  id: number;
  kind: 'publishable' | 'secret';
  scopes: string[];
  origins: string[];
}

declare module 'express-serve-static-core' {
  interface Request {
    apiKey?: VerifiedKey;
  }
}

/** Which scope a path needs when it is called with a key; any other path refuses keys. */
const SCOPE_BY_PATH: [RegExp, string][] = [
  [/^\/api\/v1\/calc\//, 'calculations'],
  [/^\/api\/v1\/genetics\//, 'calculations'],
  [/^\/api\/v1\/quote-requests(\/|$)/, 'quote-requests'],
  [/^\/api\/v1\/order-status(\/|$)/, 'order-status'],
];

export const scopeFor = (path: string): string | undefined => SCOPE_BY_PATH.find(([re]) => re.test(path))?.[1];

const CORS_HEADERS = 'content-type, x-api-key, idempotency-key';

function setCors(res: Parameters<RequestHandler>[1], origin: string): void {
  res.setHeader('access-control-allow-origin', origin);
  res.setHeader('vary', 'Origin');
  res.setHeader('access-control-expose-headers', 'retry-after, ratelimit, ratelimit-policy, idempotent-replayed');
}

/**
 * Answers browser preflights for key-callable paths: only origins listed on a live publishable key
 * get CORS headers (preflights carry no key, so the key's own origin list is checked on the call).
 */
export function corsPreflight(records: ServiceClient, origins = new FallbackCache<{ allowed: boolean }>(30_000, 10 * 60_000)): RequestHandler {
  return async (req, res, next) => {
    if (req.method !== 'OPTIONS' || !req.path.startsWith('/api/v1/')) return next();
    const origin = req.header('origin');
    if (!origin || !scopeFor(req.path)) return next(new ForbiddenError('This route cannot be called from another website.'));
    try {
      const { allowed } = await origins.get(origin, () =>
        records.request<{ allowed: boolean }>('GET', `/internal/api-keys/origin-allowed?origin=${encodeURIComponent(origin)}`),
      );
      if (!allowed) return next(new ForbiddenError(`The origin ${origin} is not listed on any of this shop's website keys.`));
    } catch (err) {
      return next(err);
    }
    setCors(res, origin);
    res.setHeader('access-control-allow-methods', 'GET, POST, OPTIONS');
    res.setHeader('access-control-allow-headers', CORS_HEADERS);
    res.setHeader('access-control-max-age', '600');
    res.status(204).end();
  };
}

/**
 * A call with `X-API-Key`: the records service says whether the key is live; then its kind,
 * origin and scope decide. The caller becomes an `integrator` for the services.
 */
export function apiKeyAuth(records: ServiceClient, keys = new FallbackCache<VerifiedKey>(30_000, 10 * 60_000)): RequestHandler {
  return async (req, res, next) => {
    const key = req.header(API_KEY_HEADER);
    if (!key) return next();
    try {
      const verified = await keys.get(key, () => records.request<VerifiedKey>('POST', '/internal/api-keys/verify', { key }));
      const origin = req.header('origin');
      if (verified.kind === 'publishable') {
        if (!origin || !verified.origins.includes(origin)) {
          return next(new ForbiddenError(origin ? `This key may not be used from ${origin}.` : 'A publishable key works only from the websites listed on it.'));
        }
      }
      if (origin && verified.origins.includes(origin)) setCors(res, origin);
      // Mounted under /api/v1, so the full path is the mount plus the rest.
      const scope = scopeFor(req.baseUrl + req.path);
      if (!scope || !verified.scopes.includes(scope)) {
        return next(new ForbiddenError(scope ? `This key lacks the ${scope} scope.` : 'This route cannot be called with an API key.'));
      }
      req.apiKey = verified;
      req.identity = { kind: 'api-key', sub: `key:${verified.id}`, role: 'integrator', scopes: verified.scopes, iat: 0 };
      next();
    } catch (err) {
      next(err);
    }
  };
}

/** Floods from one key, or from one address using a website key, get 429 with Retry-After. */
export function apiKeyRateLimits(perKeyPerMinute: number, perIpPerMinute: number): RequestHandler[] {
  const handler: Options['handler'] = (_req, res, _next, options) => {
    res.status(429).json({ error: { code: 'rate_limited', message: `Too many requests; retry after ${Math.ceil(options.windowMs / 1000)} seconds at most.` } });
  };
  return [
    rateLimit({
      windowMs: 60_000,
      limit: perKeyPerMinute,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      skip: (req) => !req.apiKey,
      keyGenerator: (req) => `key:${req.apiKey!.id}`,
      handler,
    }),
    rateLimit({
      windowMs: 60_000,
      limit: perIpPerMinute,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      skip: (req) => req.apiKey?.kind !== 'publishable',
      keyGenerator: (req) => `ip:${ipKeyGenerator(req.ip ?? '')}`,
      handler,
    }),
  ];
}
