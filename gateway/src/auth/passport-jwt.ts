import type { RequestHandler } from 'express';
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

/** Verifies the bearer access token and sets the caller's identity; any failure (none, expired, wrong signature) is a 401. */
export function bearerAuth(tokens: TokenService, ended?: EndedSessions): RequestHandler {
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
  return (req, res, next) => {
    authenticator.authenticate('jwt', { session: false }, (err: unknown, claims: AccessClaims | false, info: unknown) => {
      if (err) return next(err);
      if (!claims) {
        const expired = info instanceof Error && info.name === 'TokenExpiredError';
        return next(new UnauthorizedError(expired ? 'Your session has expired; sign in again or refresh it.' : undefined));
      }
      if (ended?.has(claims.sid)) return next(new UnauthorizedError('You signed out of this session; sign in again.'));
      req.claims = claims;
      // The identity the services see, signed by the proxy on the way out.
      req.identity = { kind: 'user', sub: claims.sub, role: claims.role, email: claims.email, iat: 0 };
      next();
    })(req, res, next);
  };
}
