/**
 * Plain-wire string tension and stress by Mersenne's law. Inputs: speaking length in mm, frequency
 * in Hz, diameter in mm, density in kg/m³, tensile strength in MPa. Outputs: N, kgf, MPa, percent.
 * Plain steel only: wound strings need their core and winding treated separately.
 */
import { newtonsToKgf } from './units';

/** Density of plain steel music wire, kg/m³. */
export const MUSIC_WIRE_DENSITY_KG_PER_M3 = 7850;
/** Above this percent of breaking strength a string is worth a warning (product rule). */
export const WARN_ABOVE_PERCENT = 60;
/** Above this percent of breaking strength a string is flagged: the commonly quoted design ceiling. */
export const FLAG_ABOVE_PERCENT = 70;

/** A plain string to assess. */
export interface PlainString {
  speakingLengthMm: number;
  frequencyHz: number;
  diameterMm: number;
  /** Defaults to {@link MUSIC_WIRE_DENSITY_KG_PER_M3}. */
  densityKgPerM3?: number;
}

/** How close a string runs to breaking. */
export type TensionVerdict = 'ok' | 'warn' | 'flag';

/** Linear density μ in kg/m of round wire: ρ·π·d²/4. */
export function linearDensityKgPerM(diameterMm: number, densityKgPerM3: number = MUSIC_WIRE_DENSITY_KG_PER_M3): number {
  const diameterM = diameterMm / 1000;
  return (densityKgPerM3 * Math.PI * diameterM * diameterM) / 4;
}

/** Tension in newtons: T = (2·L·f)²·μ, L in metres. */
export function stringTensionN(s: PlainString): number {
  const waveSpeed = (2 * s.speakingLengthMm * s.frequencyHz) / 1000;
  return waveSpeed * waveSpeed * linearDensityKgPerM(s.diameterMm, s.densityKgPerM3);
}

/** Tensile stress in MPa: T / area = ρ·(2·L·f)², which does not depend on the diameter. */
export function stringStressMpa(s: Omit<PlainString, 'diameterMm'>): number {
  const waveSpeed = (2 * s.speakingLengthMm * s.frequencyHz) / 1000;
  return ((s.densityKgPerM3 ?? MUSIC_WIRE_DENSITY_KG_PER_M3) * waveSpeed * waveSpeed) / 1e6;
}

/** Load in newtons at which round wire breaks: UTS × π·d²/4 (MPa × mm² = N). */
export function breakingLoadN(diameterMm: number, utsMpa: number): number {
  return (utsMpa * Math.PI * diameterMm * diameterMm) / 4;
}

/** Stress as a percent of the wire's ultimate tensile strength (same as tension / breaking load). */
export function percentOfBreakingStrength(stressMpa: number, utsMpa: number): number {
  return (100 * stressMpa) / utsMpa;
}

/** 'ok' up to 60 %, 'warn' above 60 %, 'flag' above 70 % of breaking strength. */
export function tensionVerdict(percentOfBreaking: number): TensionVerdict {
  if (percentOfBreaking > FLAG_ABOVE_PERCENT) return 'flag';
  return percentOfBreaking > WARN_ABOVE_PERCENT ? 'warn' : 'ok';
}

/** Everything the string calculator shows, unrounded. */
export interface StringTensionReport {
  linearDensityKgPerM: number;
  tensionN: number;
  tensionKgf: number;
  stressMpa: number;
  percentOfBreaking: number;
  verdict: TensionVerdict;
}

/** Tension, stress and verdict for a plain string of wire with tensile strength `utsMpa`. */
export function stringTensionReport(s: PlainString, utsMpa: number): StringTensionReport {
  const tensionN = stringTensionN(s);
  const stressMpa = stringStressMpa(s);
  const percentOfBreaking = percentOfBreakingStrength(stressMpa, utsMpa);
  return {
    linearDensityKgPerM: linearDensityKgPerM(s.diameterMm, s.densityKgPerM3),
    tensionN,
    tensionKgf: newtonsToKgf(tensionN),
    stressMpa,
    percentOfBreaking,
    verdict: tensionVerdict(percentOfBreaking),
  };
}
