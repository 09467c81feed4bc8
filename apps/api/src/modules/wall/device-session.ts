import type { CookieOptions, Request, RequestHandler, Response } from 'express';
import type { WallService } from './wall.service';

export const WALL_COOKIE = 'keybed_wall';
/** Browsers keep a cookie at most 400 days (RFC 6265bis); a screen in use renews it on each visit to its session. */
const WALL_COOKIE_DAYS = 400;
const TOKEN = /^[A-Za-z0-9_-]{32,128}$/;

function options(req: Request): CookieOptions {
  return { httpOnly: true, sameSite: 'strict', secure: req.secure, path: '/api' };
}

export function setWallCookie(req: Request, res: Response, token: string) {
  res.cookie(WALL_COOKIE, token, { ...options(req), maxAge: WALL_COOKIE_DAYS * 24 * 3600_000 });
}

export function clearWallCookie(req: Request, res: Response) {
  res.clearCookie(WALL_COOKIE, options(req));
}

export function readWallCookie(header: string | undefined): string | undefined {
  for (const part of (header ?? '').split(';')) {
    const [name, ...rest] = part.trim().split('=');
    if (name === WALL_COOKIE) {
      const value = rest.join('=');
      return TOKEN.test(value) ? value : undefined;
    }
  }
  return undefined;
}

/**
 * Resolves the wall-screen cookie into `req.wall`. It is a credential of its own, apart from
 * member sessions: `req.auth` never comes from it, so member routes refuse a wall screen.
 */
export function wallDeviceMiddleware(service: WallService): RequestHandler {
  return async (req, _res, next) => {
    const token = readWallCookie(req.headers.cookie);
    if (!token) return next();
    const device = await service.resolve(token);
    if (device === 'revoked') req.isWallRevoked = true;
    else if (device) req.wall = device;
    next();
  };
}
