import pino from 'pino';

/** One logger per process. Never log bodies, passwords, PINs, tokens or client contact details. */
export function createLogger(level: pino.LevelWithSilent) {
  return pino({
    level,
    base: undefined,
    redact: { paths: ['req.headers.cookie', 'req.headers.authorization', 'res.headers["set-cookie"]'], censor: '[redacted]' },
  });
}

export type Logger = pino.Logger;

/** Link tokens travel in some paths (invitations, resets): keep them out of the logs. */
export function scrubUrl(url: string): string {
  return url.replace(/[A-Za-z0-9_-]{32,}/g, '[token]');
}
