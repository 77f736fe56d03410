import { Router, type RequestHandler } from 'express';
import { requireReadAccess, requireRole, requireSignIn } from './require-role';
import type { Role } from './principal';

/**
 * What a route needs: `public` (anyone, e.g. sign-in), `read` (published data: anyone when public
 * reading is on, else any role), `signed-in` (any user or key), or one of a list of roles.
 */
export type Access = 'public' | 'read' | 'signed-in' | { roles: Role[] };

export interface DeclaredRoute {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  path: string;
  access: Access;
}

/** Every route the API serves, with its declared access: the route matrix test walks this list. */
export const declaredRoutes: DeclaredRoute[] = [];

type Method = DeclaredRoute['method'];

export interface SecuredRouter {
  router: Router;
  get(path: string, access: Access, ...handlers: RequestHandler[]): void;
  post(path: string, access: Access, ...handlers: RequestHandler[]): void;
  put(path: string, access: Access, ...handlers: RequestHandler[]): void;
  patch(path: string, access: Access, ...handlers: RequestHandler[]): void;
  delete(path: string, access: Access, ...handlers: RequestHandler[]): void;
}

/**
 * A router whose every route states its access; the guard is added from the declaration, so a
 * route cannot forget it. `mountPath` is where the router is mounted under /api/v1.
 */
export function securedRouter(mountPath: string, publicRead: boolean): SecuredRouter {
  const router = Router();
  const add =
    (method: Method) =>
    (path: string, access: Access, ...handlers: RequestHandler[]) => {
      const fullPath = `${mountPath}${path}`.replace(/\/$/, '') || '/';
      if (!declaredRoutes.some((r) => r.method === method && r.path === fullPath)) {
        declaredRoutes.push({ method, path: fullPath, access });
      }
      router[method](path, guardFor(access, publicRead), ...handlers);
    };
  return { router, get: add('get'), post: add('post'), put: add('put'), patch: add('patch'), delete: add('delete') };
}

function guardFor(access: Access, publicRead: boolean): RequestHandler {
  if (access === 'public') return (_req, _res, next) => next();
  if (access === 'read') return requireReadAccess(publicRead);
  if (access === 'signed-in') return requireSignIn;
  return requireRole(...access.roles);
}
