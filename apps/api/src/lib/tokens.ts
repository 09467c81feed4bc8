import crypto from 'node:crypto';

/** A random link token (32 bytes, base64url) and the SHA-256 that is all we store. */
export function newLinkToken(): { token: string; tokenHash: string } {
  const token = crypto.randomBytes(32).toString('base64url');
  return { token, tokenHash: hashLinkToken(token) };
}

export function hashLinkToken(token: string): string {
  return crypto.createHash('sha256').update(token).digest('hex');
}
