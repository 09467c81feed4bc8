import type { NextFunction, Request, RequestHandler, Response, Router } from 'express';
import type { Role } from '@keybed/shared';
import { AppError } from './errors';

/** Who is calling, resolved from the session cookie on every request. */
export interface AuthContext {
  userId: string;
  workshopId: string;
  membershipId: string;
  role: Role;
  sessionId: string;
}

declare module 'express-serve-static-core' {
  interface Request {
    auth?: AuthContext;
  }
}

/** Who may call a route: anyone, any signed-in member, or members holding one of these roles. */
export type Access = 'public' | 'member' | readonly Role[];

export function authOf(req: Request): AuthContext {
  if (!req.auth) throw new AppError('unauthenticated', 401, 'Sign in to continue');
  return req.auth;
}

function guard(access: Access): RequestHandler {
  return (req: Request, _res: Response, next: NextFunction) => {
    if (access === 'public') return next();
    const auth = authOf(req);
    if (access !== 'member' && !access.includes(auth.role)) {
      throw new AppError('forbidden', 403, 'Your role in this workshop cannot do that');
    }
    next();
  };
}

type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';
type Add = (path: string, access: Access, ...handlers: RequestHandler[]) => void;

/**
 * Registers routes that each state who may call them. There is no way to add a route here
 * without an access rule, so anything unstated is denied by construction.
 */
export function routesOn(router: Router): Record<Method, Add> {
  const add =
    (method: Method): Add =>
    (path, access, ...handlers) => {
      router[method](path, guard(access), ...handlers);
    };
  return { get: add('get'), post: add('post'), put: add('put'), patch: add('patch'), delete: add('delete') };
}
