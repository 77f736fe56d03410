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
  const readers = requireRole('reader', 'steward', 'reviewer', 'editor', 'admin');
  return (req, res, next) => (publicRead ? next() : readers(req, res, next));
}
