import express, { Router, type RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import { LoginRequest, LogoutRequest, PasswordResetConfirm, PasswordResetRequest, RefreshRequest } from '../../../shared/api/auth.js';
import { json } from '../../../services/common/src/async-handler.js';
import { UnauthorizedError } from '../../../services/common/src/errors.js';
import { parseOrThrow } from '../../../services/common/src/validate.js';
import type { ServiceClient } from '../proxy/service-client.js';
import type { EndedSessions } from './ended-sessions.js';
import type { SessionUser, TokenService } from './tokens.js';

interface CheckedSession {
  user: SessionUser & { active: boolean };
  sessionId: string;
}

export interface AuthRouteOptions {
  loginsPerMinute: number;
  /** The console's public address, for links in e-mail (never taken from the request's Host header). */
  publicUrl: string;
  ended: EndedSessions;
  /** Verifies a bearer token; sign-out needs one. */
  bearer: RequestHandler;
}

/** Sign-in, refresh, sign-out and password reset: the records service keeps the sessions, the gateway signs the tokens. */
export function authRoutes(records: ServiceClient, tokens: TokenService, options: AuthRouteOptions): Router {
  const router = Router();
  const body = express.json({ limit: '8kb' });
  const limited = (perMinute: number, message: string) =>
    rateLimit({
      windowMs: 60_000,
      limit: perMinute,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      // Per address and account, so one guessed account does not lock out a whole shop network.
      keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String((req.body as { email?: unknown })?.email ?? '').toLowerCase()}`,
      handler: (_req, res) => res.status(429).json({ error: { code: 'rate_limited', message } }),
    });
  const loginLimit = limited(options.loginsPerMinute, 'Too many sign-in attempts; wait a minute and try again.');
  const resetLimit = limited(Math.max(3, Math.ceil(options.loginsPerMinute / 2)), 'Too many reset requests; wait a minute and try again.');

  const answer = (checked: CheckedSession) => tokens.session(sessionUser(checked.user), checked.sessionId);

  router.post(
    '/api/v1/auth/login',
    body,
    loginLimit,
    json(async (req) => {
      const credentials = parseOrThrow(LoginRequest, req.body);
      return answer(await records.request<CheckedSession>('POST', '/internal/auth/check', credentials));
    }),
  );

  router.post(
    '/api/v1/auth/refresh',
    body,
    loginLimit,
    json(async (req) => {
      const { refreshToken } = parseOrThrow(RefreshRequest, req.body);
      const claims = tokens.verifyRefresh(refreshToken);
      if (claims === null) throw new UnauthorizedError('The refresh token is invalid or expired; sign in again.');
      // Each refresh token is spent once: the records service swaps its session for a new one.
      return answer(await records.request<CheckedSession>('POST', '/internal/sessions/rotate', { sessionId: claims.sessionId }));
    }),
  );

  router.post(
    '/api/v1/auth/logout',
    body,
    options.bearer,
    json(async (req, res) => {
      const { refreshToken } = parseOrThrow(LogoutRequest, req.body ?? {});
      const ids = new Set<string>();
      if (req.claims?.sid) ids.add(req.claims.sid);
      const refresh = refreshToken ? tokens.verifyRefresh(refreshToken) : null;
      if (refresh && String(refresh.userId) === req.claims?.sub) ids.add(refresh.sessionId);
      for (const sessionId of ids) {
        await records.request('POST', '/internal/sessions/revoke', { sessionId });
        options.ended.end(sessionId, tokens.accessTtlS);
      }
      res.status(204).end();
    }),
  );

  router.post(
    '/api/v1/auth/password-reset',
    body,
    resetLimit,
    json(async (req, res) => {
      const { email } = parseOrThrow(PasswordResetRequest, req.body);
      res.status(202);
      return records.request('POST', '/internal/password-resets', { email, link: new URL('/reset-password', options.publicUrl).href });
    }),
  );

  router.post(
    '/api/v1/auth/password-reset/confirm',
    body,
    resetLimit,
    json(async (req) => {
      const confirm = parseOrThrow(PasswordResetConfirm, req.body);
      return records.request('POST', '/internal/password-resets/confirm', confirm);
    }),
  );
  return router;
}

function sessionUser(user: SessionUser): SessionUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}
