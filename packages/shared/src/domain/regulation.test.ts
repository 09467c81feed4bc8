import { describe, expect, it } from 'vitest';
import { GRAND_REGULATION_ORDER, REGULATION_SPECS, checkMeasurement, damperLiftSpec, findRegulationSpec } from './regulation';

describe('default regulation specs (TRADE.md §3)', () => {
  it.each([
    { type: 'grand' as const, setting: 'keyDip' as const, min: 9.5, max: 11, source: 'S10a, S10b' },
    { type: 'upright' as const, setting: 'keyDip' as const, min: 10, max: 10.5, source: 'S10a, S10b' },
    { type: 'grand' as const, setting: 'blowDistance' as const, min: 44, max: 48, source: 'S10a–c' },
    { type: 'upright' as const, setting: 'blowDistance' as const, min: 43, max: 48, source: 'S10a–c' },
    { type: 'grand' as const, setting: 'letOffTreble' as const, min: 1.5, max: 2, source: 'S10a, S10c, S10d' },
    { type: 'upright' as const, setting: 'letOff' as const, min: 1, max: 3, source: 'S10a, S10c, S10d' },
    { type: 'grand' as const, setting: 'drop' as const, min: 1, max: 2, source: 'S10e; common practice' },
    { type: 'grand' as const, setting: 'checkDistance' as const, min: 15, max: 16, source: 'S10a; from memory' },
    { type: 'grand' as const, setting: 'sharpHeight' as const, min: 12, max: 12.7, source: 'S10g' },
  ])('when $type $setting, then $min–$max mm [$source]', ({ type, setting, min, max, source }) => {
    const spec = findRegulationSpec(type, setting);
    expect(spec).toMatchObject({ minMm: min, maxMm: max, source });
  });

  it('when grand blow distance, then the typical 47 mm is nominal [S10a–c]', () => {
    expect(findRegulationSpec('grand', 'blowDistance')?.nominalMm).toBe(47);
  });

  it('when a setting does not apply, then undefined', () => {
    expect(findRegulationSpec('upright', 'drop')).toBeUndefined();
    expect(findRegulationSpec('grand', 'letOff')).toBeUndefined();
  });

  it('when any row, then min ≤ nominal ≤ max and a source is named', () => {
    for (const spec of [...REGULATION_SPECS.grand, ...REGULATION_SPECS.upright]) {
      expect(spec.minMm).toBeLessThanOrEqual(spec.nominalMm);
      expect(spec.nominalMm).toBeLessThanOrEqual(spec.maxMm);
      expect(spec.source).not.toBe('');
    }
  });

  it('when the grand work order is listed, then it runs from keyframe to sostenuto [S10i]', () => {
    expect(GRAND_REGULATION_ORDER[0]).toBe('Keyframe and balance rail');
    expect(GRAND_REGULATION_ORDER.at(-1)).toBe('Sostenuto');
    expect(GRAND_REGULATION_ORDER).toHaveLength(12);
  });
});

describe('damperLiftSpec (about half the hammer travel [S10h]; 40–60 % range: common practice)', () => {
  it('when blow distance 47 mm, then lift begins at 23.5 mm (18.8–28.2)', () => {
    expect(damperLiftSpec('grand', 47)).toMatchObject({ nominalMm: 23.5, minMm: 18.8, maxMm: 28.2 });
  });
});

describe('checkMeasurement', () => {
  const keyDip = findRegulationSpec('grand', 'keyDip');
  const letOff = findRegulationSpec('grand', 'letOffTreble');
  if (!keyDip || !letOff) throw new Error('default specs missing');

  it.each([
    { spec: keyDip, value: 10, expected: { status: 'within', differenceMm: 0, outsideByMm: 0 } },
    { spec: keyDip, value: 10.3, expected: { status: 'within', differenceMm: 0.3, outsideByMm: 0 } },
    { spec: keyDip, value: 9.5, expected: { status: 'within', differenceMm: -0.5, outsideByMm: 0 } },
    { spec: keyDip, value: 11, expected: { status: 'within', differenceMm: 1, outsideByMm: 0 } },
    { spec: keyDip, value: 9.2, expected: { status: 'low', differenceMm: -0.8, outsideByMm: 0.3 } },
    { spec: keyDip, value: 11.4, expected: { status: 'high', differenceMm: 1.4, outsideByMm: 0.4 } },
    { spec: letOff, value: 3.1, expected: { status: 'high', differenceMm: 1.35, outsideByMm: 1.1 } },
  ])('when $spec.setting measures $value mm, then $expected.status', ({ spec, value, expected }) => {
    expect(checkMeasurement(spec, value)).toEqual(expected);
  });
});
