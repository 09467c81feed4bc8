/**
 * Pitch-raise planning from a measured A4. Pitch raising is trade practice, not a standard: the
 * constants in ./pitch are defaults the workshop can change.
 */
import {
  DEFAULT_PITCH_RAISE_THRESHOLD_CENTS,
  DEFAULT_ROUGH_PASS_CENTS,
  OVERPULL_FRACTION,
  OVERPULL_FROM_CENTS,
  SINGLE_PASS_LIMIT_CENTS,
  STANDARD_A4_HZ,
  centsBetween,
  tensionRatio,
} from './pitch';

/** What a pitch raise from `measuredA4Hz` to the target involves. */
export interface PitchRaisePlan {
  /** Measured relative to target in cents, rounded to 0.001; negative = flat. */
  centsOff: number;
  /** True when flat by the threshold or more. */
  isPitchRaiseNeeded: boolean;
  /** Cents to raise (0 when at or above target). */
  raiseCents: number;
  /** Suggested tuning passes, the last being the fine tuning. */
  passes: number;
  /** Cents above target to aim for on the first pass, rounded to 0.1; 0 when within 5 cents. */
  overpullCents: number;
  /** Current string tension as a fraction of tension at target pitch: (f/f0)². */
  tensionRatio: number;
  /** Change in string load, in percent, to bring the strings to target: (1/ratio − 1) × 100. */
  loadChangePercent: number;
}

/**
 * Plans a pitch raise: cents off, whether a raise is needed (flat by ≥ thresholdCents, default 10),
 * passes (1 up to 20 cents; above that one rough pass per started `roughPassCents` (default 100)
 * plus a fine tuning), overpull (30 % of the raise when more than 5 cents flat, because the treble
 * falls back ~25–35 %), and the tension and load change. Frequencies in Hz.
 */
export function pitchRaisePlan(
  measuredA4Hz: number,
  targetA4Hz: number = STANDARD_A4_HZ,
  thresholdCents: number = DEFAULT_PITCH_RAISE_THRESHOLD_CENTS,
  roughPassCents: number = DEFAULT_ROUGH_PASS_CENTS,
): PitchRaisePlan {
  if (!(measuredA4Hz > 0 && targetA4Hz > 0)) throw new RangeError('Frequencies must be above 0 Hz');
  const centsOff = Math.round(centsBetween(targetA4Hz, measuredA4Hz) * 1000) / 1000;
  const raiseCents = Math.max(0, -centsOff);
  const ratio = tensionRatio(measuredA4Hz, targetA4Hz);
  return {
    centsOff,
    isPitchRaiseNeeded: raiseCents >= thresholdCents,
    raiseCents,
    passes: raiseCents <= SINGLE_PASS_LIMIT_CENTS ? 1 : Math.ceil(raiseCents / roughPassCents) + 1,
    overpullCents: raiseCents > OVERPULL_FROM_CENTS ? Math.round(raiseCents * OVERPULL_FRACTION * 10) / 10 : 0,
    tensionRatio: ratio,
    loadChangePercent: (1 / ratio - 1) * 100,
  };
}
