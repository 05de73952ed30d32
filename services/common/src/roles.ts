import type { RequestHandler } from 'express';
import { ForbiddenError, UnauthorizedError } from './errors.js';
import type { Identity } from './internal-identity.js';

export type Access = Identity['role'];

/** Allows the listed roles (the gateway itself counts as `system`). */
export function allow(...roles: Access[]): RequestHandler {
  return (req, _res, next) => {
    const identity = req.identity;
    if (!identity) return next(new UnauthorizedError());
    if (identity.role === 'system' || roles.includes(identity.role)) return next();
    next(new ForbiddenError(`This route is for ${roles.join(', ')}; you are signed in as ${identity.role}.`));
  };
}
