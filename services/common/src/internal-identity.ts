import { createHmac, timingSafeEqual } from 'node:crypto';
import type { RequestHandler } from 'express';
import { UnauthorizedError } from './errors.js';

/** Who is calling, as verified by the gateway. */
export interface Identity {
  kind: 'user' | 'api-key' | 'gateway';
  sub: string;
  role: Role | 'integrator' | 'system';
  email?: string;
  /** What an API key may do (integrators only). */
  scopes?: string[];
  /** Seconds since the epoch when the gateway signed this header. */
  iat: number;
}

export const ROLES = ['owner', 'builder', 'keeper', 'sales'] as const;
export type Role = (typeof ROLES)[number];

export const IDENTITY_HEADER = 'x-tw-identity';
/** A signed header older than this is refused, so a captured one cannot be replayed for long. */
const MAX_AGE_S = 60;

function mac(secret: string, payload: string): string {
  return createHmac('sha256', secret).update(payload).digest('base64url');
}

export function signIdentity(identity: Omit<Identity, 'iat'>, secret: string, nowS = Math.floor(Date.now() / 1000)): string {
  const payload = Buffer.from(JSON.stringify({ ...identity, iat: nowS })).toString('base64url');
  return `${payload}.${mac(secret, payload)}`;
}

export function verifyIdentity(header: string | undefined, secret: string, nowS = Math.floor(Date.now() / 1000)): Identity | null {
  if (!header) return null;
  const [payload, signature] = header.split('.');
  if (!payload || !signature) return null;
  const expected = Buffer.from(mac(secret, payload));
  const given = Buffer.from(signature);
  if (expected.length !== given.length || !timingSafeEqual(expected, given)) return null;
  try {
    const identity = JSON.parse(Buffer.from(payload, 'base64url').toString('utf8')) as Identity;
    if (typeof identity.iat !== 'number' || Math.abs(nowS - identity.iat) > MAX_AGE_S) return null;
    return identity;
  } catch {
    return null;
  }
}

declare module 'express-serve-static-core' {
  interface Request {
    identity?: Identity;
  }
}

/** Services trust only the gateway: every request must carry its signed identity header. */
export function requireGatewayIdentity(secret: string): RequestHandler {
  return (req, _res, next) => {
    const identity = verifyIdentity(req.header(IDENTITY_HEADER), secret);
    if (!identity) return next(new UnauthorizedError('This service answers only requests forwarded by the gateway.'));
    req.identity = identity;
    next();
  };
}
