import { describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api-client';
import { lockedMinutes, wallErrorText } from './wall-messages';

describe('wallErrorText', () => {
  it('when the PIN is wrong, then it says how many tries are left, from the API’s answer', () => {
    const error = new ApiError({ status: 403, code: 'pin_incorrect', message: 'Wrong PIN.', details: { triesLeft: 4 } });
    expect(wallErrorText(error, 'Priya Natarajan')).toBe('Wrong PIN. 4 tries left before a 5-minute lock.');
    const last = new ApiError({ status: 403, code: 'pin_incorrect', message: 'Wrong PIN.', details: { triesLeft: 1 } });
    expect(wallErrorText(last, 'Priya Natarajan')).toBe('Wrong PIN. 1 try left before a 5-minute lock.');
  });

  it('when the PIN is locked, then it says for how long and whom to ask', () => {
    const error = new ApiError({ status: 429, code: 'pin_locked', message: 'Locked', details: { lockedUntil: '2026-03-02T10:05:00Z', lockedMinutes: 5 } });
    expect(wallErrorText(error, 'Priya Natarajan')).toBe('Locked for 5 minutes — ask the foreman to unlock.');
  });

  it('when the technician has no PIN, then it says where to set one', () => {
    expect(wallErrorText(new ApiError({ status: 409, code: 'pin_not_set', message: 'x' }), 'Ana Sousa')).toBe('Ana Sousa has no PIN yet. Set one on your profile in Keybed, or ask the owner.');
  });
});

describe('lockedMinutes', () => {
  it('when part of a minute is left, then it rounds up; never below 1', () => {
    expect(lockedMinutes('2026-03-02T10:05:00Z', Date.parse('2026-03-02T10:00:30Z'))).toBe(5);
    expect(lockedMinutes('2026-03-02T10:05:00Z', Date.parse('2026-03-02T10:05:30Z'))).toBe(1);
  });
});
