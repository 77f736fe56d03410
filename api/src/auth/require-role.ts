import type { RequestHandler } from 'express';
import { ForbiddenError, UnauthorizedError } from '../shared/errors';
import type { Role } from './principal';

/** The caller must be signed in (user or API key). */
export const requireSignIn: RequestHandler = (req, _res, next) => {
  next(req.user ? undefined : new UnauthorizedError());
};

/** The caller must hold at least one of the roles; API keys may only read unless given the write scope. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    const principal = req.user;
    if (!principal) return next(new UnauthorizedError());
    if (!roles.some((r) => principal.roles.includes(r))) {
      return next(new ForbiddenError(`This needs the ${roles.join(' or ')} role`));
    }
    if (principal.kind === 'api-key' && principal.scope === 'read' && req.method !== 'GET' && req.method !== 'HEAD') {
      return next(new ForbiddenError('This API key is read-only'));
    }
    next();
  };
}

/** Published data: open to everyone when public reading is on, otherwise to readers. */
export function requireReadAccess(publicRead: boolean): RequestHandler {
  const roles: Role[] = ['reader', 'steward', 'reviewer', 'editor', 'admin'];
  // Reading changes nothing, so a read-only API key passes whatever the method (the compute POSTs).
  return (req, _res, next) => {
    if (publicRead) return next();
    if (!req.user) return next(new UnauthorizedError());
    next(roles.some((r) => req.user!.roles.includes(r)) ? undefined : new ForbiddenError(`This needs the ${roles.join(' or ')} role`));
  };
}
