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

/** A paired wall screen, resolved from its device cookie. It can do wall actions and nothing else. */
export interface WallContext {
  deviceId: string;
  workshopId: string;
}

declare module 'express-serve-static-core' {
  interface Request {
    auth?: AuthContext;
    wall?: WallContext;
    /** Set when the request carried a wall-screen cookie that is no longer valid (unpaired). */
    isWallRevoked?: boolean;
  }
}

/**
 * Who may call a route: anyone, any signed-in member, members holding one of these roles, or a
 * paired wall screen (`'wall'`, which no member session satisfies).
 */
export type Access = 'public' | 'member' | 'wall' | readonly Role[];

export function authOf(req: Request): AuthContext {
  if (!req.auth) throw new AppError('unauthenticated', 401, 'Sign in to continue');
  return req.auth;
}

export function wallOf(req: Request): WallContext {
  if (req.wall) return req.wall;
  const message = req.isWallRevoked
    ? 'This wall screen was unpaired. An owner or foreman can pair it again.'
    : 'This browser is not paired as a wall screen. An owner or foreman can pair it.';
  throw new AppError('wall_not_paired', 401, message);
}

function guard(access: Access): RequestHandler {
  return (req: Request, _res: Response, next: NextFunction) => {
    if (access === 'public') return next();
    if (access === 'wall') {
      wallOf(req);
      return next();
    }
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
