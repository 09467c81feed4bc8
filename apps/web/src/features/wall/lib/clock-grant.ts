import { WALL_GRANT_WINDOW_MINUTES, type WallClockGrant } from '@keybed/shared';

const WINDOW_MS = WALL_GRANT_WINDOW_MINUTES * 60_000;

/** What an action kept on this screen holds of the grant: the token and when it stops working. Never the PIN. */
export interface StoredGrant {
  token: string;
  expiresAt: string;
}

/**
 * A grant as the screen holds it in memory while the technician's panel is open: with the moment
 * it arrived on this device's clock, so actions can be timed on the API's clock (the grant's
 * window is judged there, and this screen's clock may be a little off).
 */
export interface HeldGrant extends WallClockGrant {
  receivedAtMs: number;
}

export const holdGrant = (grant: WallClockGrant, receivedAtMs: number): HeldGrant => ({ ...grant, receivedAtMs });

/** When an action made now happened, and the grant to keep with it if the grant covers it. */
export interface ActionStamp {
  at: string;
  grant?: StoredGrant | undefined;
}

/**
 * The time of an action made at `nowMs` (this device's clock). Under a grant it is the grant's
 * issue time plus the time since the grant arrived, so it lies on the API's clock and inside the
 * window the API checks; past the window (or with the device clock set back), or without a grant,
 * it is the device's own time and the action waits for the technician's PIN.
 */
export function stampAction(held: HeldGrant | null, nowMs: number): ActionStamp {
  const deviceTime = { at: new Date(nowMs).toISOString() };
  if (!held) return deviceTime;
  const elapsed = nowMs - held.receivedAtMs;
  if (elapsed < 0 || elapsed > WINDOW_MS) return deviceTime;
  return { at: new Date(Date.parse(held.issuedAt) + elapsed).toISOString(), grant: { token: held.token, expiresAt: held.expiresAt } };
}
