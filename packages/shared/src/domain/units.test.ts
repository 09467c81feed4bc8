import { describe, expect, it } from 'vitest';
import {
  cmToMm,
  feetInchesToMm,
  inchLbfToNewtonMetres,
  inchesToMm,
  kgfToNewtons,
  lbfToNewtons,
  mmToCm,
  mmToFeetInches,
  mmToInches,
  newtonMetresToInchLbf,
  newtonsToKgf,
  newtonsToLbf,
} from './units';

describe('length conversions', () => {
  // 1 in = 25.4 mm exactly: 1959 international yard and pound agreement [S20a].
  it.each([
    { feet: 5, inches: 10, mm: 1778 }, // [S20a] via TRADE.md §9; the scenario's Salon grand
    { feet: 6, inches: 3, mm: 1905 }, // [S20a]
    { feet: 5, inches: 2, mm: 1574.8 }, // [S20a]; the scenario rounds the Parlour grand to 1575 mm
    { feet: 0, inches: 1, mm: 25.4 }, // [S20a]
    { feet: 5, inches: 10.25, mm: 1784.35 }, // [S20a]
  ])('when $feet ft $inches in, then $mm mm', ({ feet, inches, mm }) => {
    expect(feetInchesToMm(feet, inches)).toBe(mm);
  });

  it('when converting inches both ways, then 70 in ↔ 1778 mm [S20a]', () => {
    expect(inchesToMm(70)).toBe(1778);
    expect(mmToInches(1778)).toBe(70);
  });

  it('when converting centimetres, then 126 cm = 1260 mm (scenario upright)', () => {
    expect(cmToMm(126)).toBe(1260);
    expect(mmToCm(1778)).toBe(177.8);
  });

  it.each([
    { mm: 1778, step: 0.25 as const, expected: { feet: 5, inches: 10 } },
    { mm: 1905, step: 1 as const, expected: { feet: 6, inches: 3 } },
    { mm: 1784.35, step: 0.25 as const, expected: { feet: 5, inches: 10.25 } },
    { mm: 1784.35, step: 1 as const, expected: { feet: 5, inches: 10 } },
    { mm: 1826, step: 1 as const, expected: { feet: 6, inches: 0 } }, // 71.89 in rounds up to the next foot
    { mm: 1575, step: 0.25 as const, expected: { feet: 5, inches: 2 } },
  ])('when $mm mm to nearest $step in, then $expected', ({ mm, step, expected }) => {
    expect(mmToFeetInches(mm, step)).toEqual(expected);
  });
});

describe('force and torque conversions', () => {
  // 1 kgf = 9.80665 N: 3rd CGPM (1901) Resolution 2, standard acceleration of gravity 980.665 cm/s².
  it('when converting kgf, then 1 kgf = 9.80665 N and 70 kgf ≈ 686.5 N', () => {
    expect(kgfToNewtons(1)).toBe(9.80665);
    expect(newtonsToKgf(9.80665)).toBe(1);
    expect(kgfToNewtons(70)).toBeCloseTo(686.4655, 4);
  });

  // 1 lbf = 4.4482216152605 N (TRADE.md §9, from memory) = 0.45359237 kg (1959 agreement pound, from
  // memory) × 9.80665 m/s² (3rd CGPM 1901).
  it('when converting lbf, then 1 lbf = 4.4482216152605 N and equals pound mass × g_n', () => {
    expect(lbfToNewtons(1)).toBe(4.4482216152605);
    expect(lbfToNewtons(1)).toBeCloseTo(0.45359237 * 9.80665, 12);
    expect(newtonsToLbf(4.4482216152605)).toBe(1);
  });

  // Tuning-pin torque: new block ~110–120 in·lbf (12.4–13.6 N·m) [S12d, S12e]; 0.0254 m × 1 lbf.
  it.each([
    { inchLbf: 110, nm: 12.4 },
    { inchLbf: 120, nm: 13.6 },
    { inchLbf: 50, nm: 5.6 },
  ])('when $inchLbf in·lbf, then ≈ $nm N·m [S12d, S12e]', ({ inchLbf, nm }) => {
    expect(inchLbfToNewtonMetres(inchLbf)).toBeCloseTo(nm, 1);
  });

  it('when converting torque back, then the round trip is exact to 1e-9', () => {
    expect(newtonMetresToInchLbf(inchLbfToNewtonMetres(115))).toBeCloseTo(115, 9);
    expect(inchLbfToNewtonMetres(1)).toBeCloseTo(0.1129848290276167, 15);
  });
});
