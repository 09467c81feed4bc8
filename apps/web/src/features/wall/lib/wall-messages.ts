import { z } from 'zod';
import { PIN_LOCK_MINUTES } from '@keybed/shared';
import { errorDetail, isApiError } from '@/lib/api-client';
import { describeError } from '@/lib/error-messages';

const Count = z.number().int().min(0);
const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;

/** Minutes (rounded up, at least 1) until a PIN lock ends. */
export function lockedMinutes(lockedUntil: string, nowMs: number): number {
  return Math.max(1, Math.ceil((Date.parse(lockedUntil) - nowMs) / 60_000));
}

export const lockedText = (minutes: number) => `Locked for ${plural(minutes, 'minute')} — ask the foreman to unlock.`;

export const noPinText = (name: string) => `${name} has no PIN yet. Set one on your profile in Keybed, or ask the owner.`;

/** Plain words for the wall screen after a PIN check or clock action failed, by error code. */
export function wallErrorText(error: unknown, name: string): string {
  if (!isApiError(error)) return 'Something went wrong. Try again.';
  switch (error.code) {
    case 'pin_incorrect': {
      const left = errorDetail(error, 'triesLeft', Count);
      if (left === undefined) return 'Wrong PIN. Try again.';
      return `Wrong PIN. ${left === 1 ? '1 try' : `${left} tries`} left before a ${PIN_LOCK_MINUTES}-minute lock.`;
    }
    case 'pin_locked':
      return lockedText(errorDetail(error, 'lockedMinutes', Count) ?? PIN_LOCK_MINUTES);
    case 'pin_not_set':
      return noPinText(name);
    case 'wall_pin_limit':
      return 'Too many wrong PINs on this screen in the last hour. Ask an owner or foreman.';
    case 'not_found':
      return `${name} is no longer on this workshop’s team.`;
    case 'network_error':
      return 'No network. Try again in a moment.';
    default: {
      const { title, action } = describeError(error);
      return `${title} ${action}`;
    }
  }
}
