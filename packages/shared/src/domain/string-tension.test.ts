import { describe, expect, it } from 'vitest';
import {
  breakingLoadN,
  linearDensityKgPerM,
  percentOfBreakingStrength,
  stringStressMpa,
  stringTensionN,
  stringTensionReport,
  tensionVerdict,
} from './string-tension';
import { kgfToNewtons, newtonsToKgf } from './units';

// Mersenne's law T = (2Lf)²·μ, μ = ρπd²/4 [S6]. Music wire density 7850 kg/m³ [S7a].
const a4 = { speakingLengthMm: 380, frequencyHz: 440, diameterMm: 1.0 };
const ASTM_A228_MIN_UTS_AT_1_02_MM = 2172; // MPa, ASTM A228 tensile table [S7b]

describe('string tension, worked example (TRADE.md §2, derived from [S6], [S7a], [S7b])', () => {
  it('when d = 1.00 mm, then μ = 6.165e-3 kg/m', () => {
    expect(linearDensityKgPerM(1.0)).toBeCloseTo(6.165e-3, 6);
  });

  it('when f 440 Hz, L 380 mm, then T ≈ 689 N (70 kgf)', () => {
    expect(stringTensionN(a4)).toBeCloseTo(689.4, 1);
    expect(newtonsToKgf(stringTensionN(a4))).toBeCloseTo(70.3, 1);
  });

  it('when stress is taken, then ≈ 878 MPa, ≈ 40 % of ASTM A228 minimum 2172 MPa, verdict ok', () => {
    const report = stringTensionReport(a4, ASTM_A228_MIN_UTS_AT_1_02_MM);
    expect(report.stressMpa).toBeCloseTo(877.8, 1);
    expect(report.percentOfBreaking).toBeCloseTo(40.4, 1);
    expect(report.verdict).toBe('ok');
  });

  it('when the diameter changes, then stress does not [S8c]', () => {
    const stressAt = (diameterMm: number) => stringTensionN({ ...a4, diameterMm }) / ((Math.PI * diameterMm ** 2) / 4);
    expect(stressAt(0.8)).toBeCloseTo(stringStressMpa(a4), 9);
    expect(stressAt(1.2)).toBeCloseTo(stringStressMpa(a4), 9);
  });
});

describe('string tension, C8 cross-check [S8a]', () => {
  const c8 = { speakingLengthMm: 54, frequencyHz: 4186.009, diameterMm: 0.785 };

  it('when C8 on 54 mm of 0.785 mm wire, then ~79 kgf', () => {
    expect(newtonsToKgf(stringTensionN(c8))).toBeCloseTo(79, 0);
  });

  it('when its break is ~135 kgf, then ~59 % of breaking load, just inside the ok band', () => {
    const percent = (100 * stringTensionN(c8)) / kgfToNewtons(135);
    expect(percent).toBeCloseTo(58.7, 0);
    expect(tensionVerdict(percent)).toBe('ok');
    expect(tensionVerdict(percent + 2)).toBe('warn');
  });

  it('when the breaking load comes from a UTS, then it agrees with the stress ratio', () => {
    const uts = 2450; // MPa, typical music wire [S7a]
    const byLoad = (100 * stringTensionN(c8)) / breakingLoadN(c8.diameterMm, uts);
    expect(byLoad).toBeCloseTo(percentOfBreakingStrength(stringStressMpa(c8), uts), 9);
  });
});

describe('tensionVerdict (warn > 60 %, flag > 70 %: common practice after [S8a], [S8b])', () => {
  it.each([
    { percent: 40, verdict: 'ok' },
    { percent: 60, verdict: 'ok' },
    { percent: 60.01, verdict: 'warn' },
    { percent: 70, verdict: 'warn' },
    { percent: 70.01, verdict: 'flag' },
    { percent: 95, verdict: 'flag' },
  ])('when $percent %, then $verdict', ({ percent, verdict }) => {
    expect(tensionVerdict(percent)).toBe(verdict);
  });
});
