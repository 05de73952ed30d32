import { createHash } from 'node:crypto';
import type { RequestHandler } from 'express';
import { LRUCache } from 'lru-cache';
import passport from 'passport';
import { ExtractJwt, Strategy as JwtStrategy } from 'passport-jwt';
import { UnauthorizedError } from '../../../services/common/src/errors.js';
import '../../../services/common/src/internal-identity.js';
import type { EndedSessions } from './ended-sessions.js';
import type { AccessClaims, TokenService } from './tokens.js';

declare module 'express-serve-static-core' {
  interface Request {
    claims?: AccessClaims;
  }
}

const BEARER = /^Bearer ([A-Za-z0-9._~+/-]+=*)$/;

/**
 * Verifies the bearer access token and sets the caller's identity; any failure (none, expired, wrong signature) is a 401.
 * A token already verified is recognised by its digest until it expires, so the console's many calls
 * do not decode and check the same signature again; sign-out still ends it at once.
 */
export function bearerAuth(tokens: TokenService, ended?: EndedSessions): RequestHandler {
  const verified = new LRUCache<string, AccessClaims>({ max: 5000 });
  const digestOf = (token: string) => createHash('sha256').update(token).digest('base64url');
  const authenticator = new passport.Passport();
  authenticator.use(
    new JwtStrategy(
      {
        jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
        secretOrKey: tokens.key as unknown as string,
        algorithms: ['HS256'],
        issuer: tokens.issuer,
        audience: 'api',
      },
      (claims: AccessClaims, done: (err: unknown, user?: AccessClaims | false) => void) =>
        done(null, claims.typ === 'access' ? claims : false),
    ),
  );
  const admit = (req: Parameters<RequestHandler>[0], claims: AccessClaims, next: Parameters<RequestHandler>[2]) => {
    if (ended?.has(claims.sid)) return next(new UnauthorizedError('You signed out of this session; sign in again.'));
    req.claims = claims;
    // The identity the services see, signed by the proxy on the way out.
    req.identity = { kind: 'user', sub: claims.sub, role: claims.role, email: claims.email, iat: 0 };
    next();
  };
  return (req, res, next) => {
    const token = BEARER.exec(req.headers.authorization ?? '')?.[1];
    const digest = token ? digestOf(token) : undefined;
    const known = digest ? verified.get(digest) : undefined;
    if (known && (known.exp ?? 0) * 1000 > Date.now()) return admit(req, known, next);
    authenticator.authenticate('jwt', { session: false }, (err: unknown, claims: AccessClaims | false, info: unknown) => {
      if (err) return next(err);
      if (!claims) {
        const expired = info instanceof Error && info.name === 'TokenExpiredError';
        return next(new UnauthorizedError(expired ? 'Your session has expired; sign in again or refresh it.' : undefined));
      }
      if (digest && claims.exp) verified.set(digest, claims, { ttl: Math.max(1, claims.exp * 1000 - Date.now()) });
      admit(req, claims, next);
    })(req, res, next);
  };
}
