/**
 * Length and force conversions, and the parser for lengths typed by people.
 * Lengths are millimetres everywhere else in Keybed; inches and centimetres exist only at the edges.
 */

/** Millimetres in one inch, exact (1959 international yard and pound agreement). */
export const MM_PER_INCH = 25.4;
/** Standard acceleration of gravity in m/s², exact by definition (3rd CGPM 1901, Resolution 2). */
export const STANDARD_GRAVITY_M_PER_S2 = 9.80665;
/** Newtons in one pound-force: 0.45359237 kg × 9.80665 m/s² (exact; pound from the 1959 agreement). */
export const NEWTONS_PER_LBF = 4.4482216152605;
/** Newton-metres in one inch pound-force: 0.0254 m × NEWTONS_PER_LBF. */
export const NEWTON_METRES_PER_INCH_LBF = 0.0254 * NEWTONS_PER_LBF;
/** Lengths above this are treated as a typing or unit mistake by {@link parseLengthMm}. */
export const MAX_PLAUSIBLE_LENGTH_MM = 4000;

/** Inches → millimetres. Multiplies by 254 then divides by 10 so whole and quarter inches come out exact. */
export function inchesToMm(inches: number): number {
  return (inches * 254) / 10;
}

/** Millimetres → inches (not rounded). */
export function mmToInches(mm: number): number {
  return (mm * 10) / 254;
}

/** Feet plus inches (inches may be fractional) → millimetres. */
export function feetInchesToMm(feet: number, inches: number): number {
  return inchesToMm(feet * 12 + inches);
}

/** Centimetres → millimetres. */
export function cmToMm(cm: number): number {
  return cm * 10;
}

/** Millimetres → centimetres (not rounded). */
export function mmToCm(mm: number): number {
  return mm / 10;
}

/** Feet and inches, inches in [0, 12). */
export interface FeetInches {
  feet: number;
  inches: number;
}

/**
 * Millimetres → whole feet and inches rounded to the nearest `stepInches` (¼ or 1), halves rounded
 * up; 11.9 in rounds to the next foot rather than showing 12 in. Expects mm ≥ 0.
 */
export function mmToFeetInches(mm: number, stepInches: 0.25 | 1 = 0.25): FeetInches {
  const steps = Math.round(mmToInches(mm) / stepInches);
  const totalInches = steps * stepInches;
  const feet = Math.floor(totalInches / 12);
  return { feet, inches: totalInches - feet * 12 };
}

/** Newtons → kilogram-force (÷ 9.80665). */
export function newtonsToKgf(newtons: number): number {
  return newtons / STANDARD_GRAVITY_M_PER_S2;
}

/** Kilogram-force → newtons (× 9.80665). */
export function kgfToNewtons(kgf: number): number {
  return kgf * STANDARD_GRAVITY_M_PER_S2;
}

/** Pound-force → newtons. */
export function lbfToNewtons(lbf: number): number {
  return lbf * NEWTONS_PER_LBF;
}

/** Newtons → pound-force. */
export function newtonsToLbf(newtons: number): number {
  return newtons / NEWTONS_PER_LBF;
}

/** Inch pound-force (torque, e.g. tuning-pin torque) → newton-metres. */
export function inchLbfToNewtonMetres(inchLbf: number): number {
  return inchLbf * NEWTON_METRES_PER_INCH_LBF;
}

/** Newton-metres → inch pound-force. */
export function newtonMetresToInchLbf(newtonMetres: number): number {
  return newtonMetres / NEWTON_METRES_PER_INCH_LBF;
}
