import type { CookieOptions, Request, RequestHandler, Response } from 'express';
import { SESSION_COOKIE, type ActiveSession, type SessionStore } from '../lib/sessions';

function cookieOptions(req: Request): CookieOptions {
  return { httpOnly: true, sameSite: 'lax', secure: req.secure, path: '/' };
}

export function setSessionCookie(req: Request, res: Response, session: ActiveSession) {
  res.cookie(SESSION_COOKIE, session.id, { ...cookieOptions(req), expires: session.expiresAt });
}

export function clearSessionCookie(req: Request, res: Response) {
  res.clearCookie(SESSION_COOKIE, cookieOptions(req));
}

/** Resolves the session cookie into `req.auth`; a dead or deactivated session clears the cookie. */
export function sessionMiddleware(store: SessionStore): RequestHandler {
  return async (req, res, next) => {
    const id = store.readCookie(req.headers.cookie);
    if (!id) return next();
    const session = await store.validate(id);
    const membership = session?.membership;
    if (!session || !membership?.isActive) {
      if (session) await store.end(session.id);
      clearSessionCookie(req, res);
      return next();
    }
    if (session.isRenewed) setSessionCookie(req, res, session);
    req.auth = {
      userId: session.userId,
      workshopId: session.workshopId,
      membershipId: membership.id,
      role: membership.role,
      sessionId: session.id,
    };
    next();
  };
}
