import { describe, expect, it } from 'vitest';
import { holdGrant, stampAction } from './clock-grant';

const grant = { token: 'grant-token-for-priya-at-the-bench-room-screen', issuedAt: '2026-03-02T08:00:00.000Z', expiresAt: '2026-03-03T08:00:00.000Z' };
/** This screen's clock runs 40 s behind the API's. */
const arrivedMs = Date.parse('2026-03-02T07:59:20.000Z');
const held = holdGrant(grant, arrivedMs);

describe('stampAction', () => {
  it('when an action is made under a grant, then its time is on the API’s clock and it keeps the grant (token and expiry only)', () => {
    const stamp = stampAction(held, arrivedMs + 90_000);
    expect(stamp).toEqual({ at: '2026-03-02T08:01:30.000Z', grant: { token: grant.token, expiresAt: grant.expiresAt } });
    expect(JSON.stringify(stamp)).not.toContain('receivedAtMs');
  });

  it('when the action comes at the last moment of the 5 minutes, then the grant still covers it; a moment later it does not', () => {
    expect(stampAction(held, arrivedMs + 300_000)).toMatchObject({ at: '2026-03-02T08:05:00.000Z', grant: { token: grant.token } });
    const late = stampAction(held, arrivedMs + 300_001);
    expect(late).toEqual({ at: new Date(arrivedMs + 300_001).toISOString() });
  });

  it('when there is no grant (the PIN was entered offline), then the action keeps this screen’s time and no grant', () => {
    expect(stampAction(null, arrivedMs)).toEqual({ at: '2026-03-02T07:59:20.000Z' });
  });

  it('when this screen’s clock was set back after the grant came, then the grant is not used', () => {
    expect(stampAction(held, arrivedMs - 1_000)).toEqual({ at: new Date(arrivedMs - 1_000).toISOString() });
  });
});
