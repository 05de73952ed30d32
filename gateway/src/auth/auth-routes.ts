import express, { Router } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { LoginRequest, RefreshRequest } from '../../../shared/api/auth.js';
import { json } from '../../../services/common/src/async-handler.js';
import { ApiError, UnauthorizedError } from '../../../services/common/src/errors.js';
import { parseOrThrow } from '../../../services/common/src/validate.js';
import type { ServiceClient } from '../proxy/service-client.js';
import type { SessionUser, TokenService } from './tokens.js';

interface CheckedUser {
  user: SessionUser & { active: boolean };
}

/** Sign-in and refresh: the records service checks the password, the gateway signs the tokens. */
export function authRoutes(records: ServiceClient, tokens: TokenService, loginsPerMinute: number): Router {
  const router = Router();
  const body = express.json({ limit: '8kb' });
  const limiter = rateLimit({
    windowMs: 60_000,
    limit: loginsPerMinute,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    // Per address and account, so one guessed account does not lock out a whole shop network.
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String((req.body as { email?: unknown })?.email ?? '').toLowerCase()}`,
    handler: (_req, res) =>
      res.status(429).json({ error: { code: 'rate_limited', message: 'Too many sign-in attempts; wait a minute and try again.' } }),
  });

  router.post(
    '/api/v1/auth/login',
    body,
    limiter,
    json(async (req) => {
      const credentials = parseOrThrow(LoginRequest, req.body);
      const { user } = await records.request<CheckedUser>('POST', '/internal/auth/check', credentials);
      return tokens.session(sessionUser(user));
    }),
  );

  router.post(
    '/api/v1/auth/refresh',
    body,
    limiter,
    json(async (req) => {
      const { refreshToken } = parseOrThrow(RefreshRequest, req.body);
      const userId = tokens.verifyRefresh(refreshToken);
      if (userId === null) throw new UnauthorizedError('The refresh token is invalid or expired; sign in again.');
      let checked: CheckedUser;
      try {
        checked = await records.request<CheckedUser>('GET', `/internal/users/${userId}`);
      } catch (err) {
        if (err instanceof ApiError && err.status === 404) throw new UnauthorizedError('This account no longer exists.');
        throw err;
      }
      if (!checked.user.active) throw new UnauthorizedError('This account is deactivated.');
      return tokens.session(sessionUser(checked.user));
    }),
  );
  return router;
}

function sessionUser(user: SessionUser): SessionUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}
