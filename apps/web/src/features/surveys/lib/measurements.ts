import { DEFAULT_PITCH_RAISE_THRESHOLD_CENTS, STANDARD_A4_HZ, centsBetween, inchLbfToNewtonMetres, newtonMetresToInchLbf } from '@keybed/shared';
import { readDecimal } from './component-answer';

/** About 50 in·lbf (5.6 N·m) or less, a pinblock may not hold a tuning (TRADE.md §5 [S12d, S12e]). */
export const LOW_TORQUE_NM = inchLbfToNewtonMetres(50);

const oneDecimal = new Intl.NumberFormat('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const whole = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0 });

/** How far a measured A4 sits from A440, in cents to 0.1, and whether a pitch raise comes first. */
export function describePitch(text: string): { text: string; isRaiseNeeded: boolean } | null {
  const hz = readDecimal(text);
  if (hz === null || Number.isNaN(hz) || hz <= 0) return null;
  const cents = Math.round(centsBetween(STANDARD_A4_HZ, hz) * 10) / 10;
  if (cents === 0) return { text: 'At A440', isRaiseNeeded: false };
  const side = cents < 0 ? 'flat of' : 'sharp of';
  const isRaiseNeeded = cents <= -DEFAULT_PITCH_RAISE_THRESHOLD_CENTS;
  return { text: `${oneDecimal.format(Math.abs(cents))} cents ${side} A440`, isRaiseNeeded };
}

/** The torque in inch-pounds too, and whether it is low enough to doubt the pinblock. */
export function describeTorque(text: string): { text: string; isLow: boolean } | null {
  const nm = readDecimal(text);
  if (nm === null || Number.isNaN(nm)) return null;
  return { text: `about ${whole.format(newtonMetresToInchLbf(nm))} in·lbf`, isLow: nm <= LOW_TORQUE_NM };
}
