import type { FieldErrors } from '@keybed/shared';

/** A second typing of the PIN must match the first; masked digits are easy to mistype. */
export function pinRepeatError(pin: string, repeat: string): FieldErrors | undefined {
  return pin === repeat ? undefined : { pinRepeat: ['The two PINs do not match'] };
}
