/** A technician's context on the wall closes by itself after this long without a touch. */
export const IDLE_LIMIT_MS = 30_000;

/**
 * Whole seconds left before the context closes (rounded up, so it shows 30 … 1, then 0). A `now`
 * read a moment before the last touch never shows more than the limit.
 */
export function idleSecondsLeft(lastActivityMs: number, nowMs: number, limitMs = IDLE_LIMIT_MS): number {
  const left = Math.ceil((lastActivityMs + limitMs - nowMs) / 1000);
  return Math.min(Math.ceil(limitMs / 1000), Math.max(0, left));
}
