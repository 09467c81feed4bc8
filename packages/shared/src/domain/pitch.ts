/**
 * Equal-temperament pitch for the 88 keys, cents, and the pitch-raise plan. Frequencies in hertz,
 * intervals in cents (1200 per octave). Keys are numbered 1 (A0) to 88 (C8); key 49 is A4.
 */

/** Reference pitch for A4 in hertz (ISO 16:1975, TRADE.md [S2]). */
export const STANDARD_A4_HZ = 440;
/** Key number of A4. */
export const A4_KEY = 49;
/** Keys on a standard piano. */
export const KEY_COUNT = 88;
/** Flat by this many cents or more, a pitch raise is needed: the default setting (common practice). */
export const DEFAULT_PITCH_RAISE_THRESHOLD_CENTS = 10;
/** Up to this raise, one pass with overpull does (trade practice, TRADE.md [S4b]). */
export const SINGLE_PASS_LIMIT_CENTS = 20;
/** Each rough pass before the fine tuning raises at most this much (product default, common practice). */
export const DEFAULT_ROUGH_PASS_CENTS = 100;
/** Overpull starts above this many cents off (trade practice, TRADE.md [S4a]). */
export const OVERPULL_FROM_CENTS = 5;
/** Overpull as a fraction of the raise: the treble falls back about 25–35 % of a raise (trade practice, TRADE.md [S4c]). */
export const OVERPULL_FRACTION = 0.3;

const NOTE_NAMES = ['C', 'C#', 'D', 'D#', 'E', 'F', 'F#', 'G', 'G#', 'A', 'A#', 'B'] as const;
const LETTER_SEMITONES: Record<string, number> = { C: 0, D: 2, E: 4, F: 5, G: 7, A: 9, B: 11 };

function requireKey(key: number): void {
  if (!Number.isInteger(key) || key < 1 || key > KEY_COUNT) throw new RangeError(`Key must be a whole number from 1 to ${KEY_COUNT}`);
}

/** Frequency in Hz of key 1–88 in equal temperament: a4Hz × 2^((key − 49)/12). Not stretched. Throws RangeError outside 1–88. */
export function keyFrequencyHz(key: number, a4Hz: number = STANDARD_A4_HZ): number {
  requireKey(key);
  return a4Hz * 2 ** ((key - A4_KEY) / 12);
}

/** Scientific note name of key 1–88 with sharps: 1 → "A0", 40 → "C4", 49 → "A4", 88 → "C8". */
export function noteName(key: number): string {
  requireKey(key);
  return `${NOTE_NAMES[(key + 8) % 12]}${Math.floor((key + 8) / 12)}`;
}

/** Key number from a note name with a sharp or flat ("A4", "C#4", "Db4", "Bb3"); null if unreadable or off the keyboard. */
export function keyFromNoteName(name: string): number | null {
  const match = /^([A-Ga-g])([#♯b♭]?)(\d)$/.exec(name.trim());
  if (!match) return null;
  const accidental = { '#': 1, '♯': 1, b: -1, '♭': -1 }[match[2] ?? ''] ?? 0;
  const semitone = (LETTER_SEMITONES[(match[1] ?? '').toUpperCase()] ?? 0) + accidental;
  const key = Number(match[3]) * 12 + semitone - 8;
  return key >= 1 && key <= KEY_COUNT ? key : null;
}

/** Interval in cents from fromHz to toHz: 1200·log2(to/from); negative when toHz is lower. */
export function centsBetween(fromHz: number, toHz: number): number {
  return 1200 * Math.log2(toHz / fromHz);
}

/** Frequency in Hz that lies `cents` above (or below, if negative) referenceHz: ref·2^(c/1200). */
export function frequencyFromCents(referenceHz: number, cents: number): number {
  return referenceHz * 2 ** (cents / 1200);
}

/** String tension relative to design tension at this pitch: (f/f0)² (tension ∝ f² at fixed length and mass). */
export function tensionRatio(measuredHz: number, targetHz: number): number {
  return (measuredHz / targetHz) ** 2;
}
