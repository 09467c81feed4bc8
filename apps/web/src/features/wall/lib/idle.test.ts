import { describe, expect, it } from 'vitest';
import { IDLE_LIMIT_MS, idleSecondsLeft } from './idle';

describe('idleSecondsLeft', () => {
  const touched = 1_000_000;

  it('when the screen was just touched, then the full 30 seconds are left', () => {
    expect(idleSecondsLeft(touched, touched)).toBe(30);
  });

  it('when part of a second has passed, then the count rounds up', () => {
    expect(idleSecondsLeft(touched, touched + 400)).toBe(30);
    expect(idleSecondsLeft(touched, touched + 1_000)).toBe(29);
    expect(idleSecondsLeft(touched, touched + 29_001)).toBe(1);
  });

  it('when the clock reading is a moment older than the last touch, then it still shows 30, not 31', () => {
    expect(idleSecondsLeft(touched, touched - 200)).toBe(30);
  });

  it('when 30 seconds or more have passed, then none are left', () => {
    expect(idleSecondsLeft(touched, touched + IDLE_LIMIT_MS)).toBe(0);
    expect(idleSecondsLeft(touched, touched + 90_000)).toBe(0);
  });

  it('when the limit is shorter (after an action), then it counts from that', () => {
    expect(idleSecondsLeft(touched, touched + 1_000, 5_000)).toBe(4);
  });
});
