import type { Request, RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import helmet from 'helmet';
import { AppError } from './errors';

/** helmet's headers with a CSP the built app passes: no inline scripts, no plugins, no base tag. */
export function securityHeaders(): RequestHandler {
  return helmet({
    contentSecurityPolicy: {
      useDefaults: false,
      directives: {
        defaultSrc: ["'self'"],
        scriptSrc: ["'self'"],
        styleSrc: ["'self'"],
        imgSrc: ["'self'", 'data:', 'blob:'],
        fontSrc: ["'self'"],
        connectSrc: ["'self'"],
        objectSrc: ["'none'"],
        baseUri: ["'none'"],
        frameAncestors: ["'none'"],
        formAction: ["'self'"],
      },
    },
    strictTransportSecurity: false,
  });
}

const UNSAFE = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/**
 * Refuses state-changing requests sent from another site. Browsers send Origin on such requests;
 * clients without one (scripts, tests) are let through, and SameSite=Lax cookies guard the rest.
 */
export function sameOriginOnly(appOrigin: string): RequestHandler {
  return (req, _res, next) => {
    if (!UNSAFE.has(req.method)) return next();
    const origin = req.get('origin');
    const site = req.get('sec-fetch-site');
    const ownOrigin = `${req.protocol}://${req.get('host')}`;
    const isForeign = (origin !== undefined && origin !== appOrigin && origin !== ownOrigin) || site === 'cross-site';
    if (isForeign) throw new AppError('forbidden_origin', 403, 'This request came from another site and was refused');
    next();
  };
}

function limited(windowMs: number, limit: number, keyGenerator: (req: Request) => string, skipSuccessfulRequests: boolean) {
  return rateLimit({
    windowMs,
    limit,
    keyGenerator,
    skipSuccessfulRequests,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) =>
      next(new AppError('rate_limited', 429, 'Too many attempts. Wait a few minutes and try again.')),
  });
}

const byAddress = (req: Request) => ipKeyGenerator(req.ip ?? 'unknown');
const byAccount = (req: Request) => {
  const email = (req.body as { email?: unknown } | undefined)?.email;
  return typeof email === 'string' ? `account:${email.trim().toLowerCase()}` : 'account:none';
};

const FIFTEEN_MINUTES = 15 * 60_000;
const ONE_HOUR = 60 * 60_000;

/** Failed sign-ins count per account and per address; a successful sign-in does not count. */
export function signInLimits(perAccount: number, perAddress: number): RequestHandler[] {
  return [limited(FIFTEEN_MINUTES, perAddress, byAddress, true), limited(FIFTEEN_MINUTES, perAccount, byAccount, true)];
}

/** Every reset request counts, per account and per address. */
export function resetLimits(perAccount: number, perAddress: number): RequestHandler[] {
  return [limited(ONE_HOUR, perAddress, byAddress, false), limited(ONE_HOUR, perAccount, byAccount, false)];
}
