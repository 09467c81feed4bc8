/**
 * A fresh idempotency key. `crypto.randomUUID` needs a secure context; a wall screen reached over
 * plain http on the workshop's network still gets 128 random bits from `getRandomValues`.
 */
export function newIdempotencyKey(): string {
  if (typeof crypto.randomUUID === 'function') return crypto.randomUUID();
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return [...bytes].map((b) => b.toString(16).padStart(2, '0')).join('');
}
