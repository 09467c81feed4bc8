import { describe, expect, it } from 'vitest';
import { formatLengthMm, parseLengthMm } from './length-input';

// Inch values rest on 1 in = 25.4 mm exactly: 1959 international yard and pound agreement [S20a].
describe('parseLengthMm', () => {
  it.each([
    { input: `5' 10"`, mm: 1778 },
    { input: `5'10"`, mm: 1778 },
    { input: '5 ft 10 in', mm: 1778 },
    { input: '5 feet 10 inches', mm: 1778 },
    { input: '5ft10', mm: 1778 },
    { input: '5 FT 10', mm: 1778 },
    { input: '5’ 10”', mm: 1778 },
    { input: '70 in', mm: 1778 },
    { input: '70"', mm: 1778 },
    { input: '70in', mm: 1778 },
    { input: '177.8 cm', mm: 1778 },
    { input: '1778 mm', mm: 1778 },
    { input: '1.778 m', mm: 1778 },
    { input: '  1778mm ', mm: 1778 },
    { input: `6' 3"`, mm: 1905 },
    { input: '126 cm', mm: 1260 },
    { input: `5' 10 1/4"`, mm: 1784.35 },
    { input: `5' 10¼"`, mm: 1784.35 },
    { input: '5 ft 10.25 in', mm: 1784.35 },
    { input: `5'`, mm: 1524 },
    { input: '½ in', mm: 12.7 },
    { input: '10.1 in', mm: 256.54 },
  ])('when "$input", then $mm mm', ({ input, mm }) => {
    expect(parseLengthMm(input)).toEqual({ ok: true, mm });
  });

  it.each([
    { input: '', message: 'Enter a length' },
    { input: '   ', message: 'Enter a length' },
    { input: '-5 cm', message: 'A length cannot be negative' },
    { input: '−70 in', message: 'A length cannot be negative' },
    { input: '0 mm', message: 'A length must be more than zero' },
    { input: '4001 mm', message: 'That is more than 4000 mm; check the unit' },
    { input: '1778 cm', message: 'That is more than 4000 mm; check the unit' },
    { input: '5 ft 14 in', message: 'Inches after feet must be less than 12' },
    { input: '1778', message: 'Add a unit. Try 5 ft 10 in, 70 in, 177.8 cm or 1778 mm' },
    { input: 'long', message: 'Could not read "long" as a length. Try 5 ft 10 in, 70 in, 177.8 cm or 1778 mm' },
    { input: '5 ft ten', message: 'Could not read "5 ft ten" as a length. Try 5 ft 10 in, 70 in, 177.8 cm or 1778 mm' },
    { input: '1/0 in', message: 'Could not read "1/0 in" as a length. Try 5 ft 10 in, 70 in, 177.8 cm or 1778 mm' },
  ])('when "$input", then refused: $message', ({ input, message }) => {
    expect(parseLengthMm(input)).toEqual({ ok: false, message });
  });

  it('when a bare number and a default unit, then it is read in that unit', () => {
    expect(parseLengthMm('1778', { defaultUnit: 'mm' })).toEqual({ ok: true, mm: 1778 });
    expect(parseLengthMm('126', { defaultUnit: 'cm' })).toEqual({ ok: true, mm: 1260 });
    expect(parseLengthMm('70', { defaultUnit: 'in' })).toEqual({ ok: true, mm: 1778 });
  });

  it('when a custom ceiling, then it applies', () => {
    expect(parseLengthMm('60 mm', { maxMm: 50 })).toEqual({ ok: false, message: 'That is more than 50 mm; check the unit' });
  });
});

describe('formatLengthMm', () => {
  it.each([
    { mm: 1778, unit: 'ft-in' as const, step: undefined, text: '5 ft 10 in' },
    { mm: 1905, unit: 'ft-in' as const, step: undefined, text: '6 ft 3 in' },
    { mm: 1784.35, unit: 'ft-in' as const, step: undefined, text: '5 ft 10¼ in' },
    { mm: 1791, unit: 'ft-in' as const, step: undefined, text: '5 ft 10½ in' },
    { mm: 1784.35, unit: 'ft-in' as const, step: 1 as const, text: '5 ft 10 in' },
    { mm: 1575, unit: 'ft-in' as const, step: 1 as const, text: '5 ft 2 in' },
    { mm: 1826, unit: 'ft-in' as const, step: 1 as const, text: '6 ft 0 in' },
    { mm: 254, unit: 'ft-in' as const, step: undefined, text: '10 in' },
    { mm: 6.35, unit: 'ft-in' as const, step: undefined, text: '¼ in' },
    { mm: 1778, unit: 'cm' as const, step: undefined, text: '177.8 cm' },
    { mm: 1260, unit: 'cm' as const, step: undefined, text: '126 cm' },
    { mm: 1778.4, unit: 'cm' as const, step: undefined, text: '177.8 cm' },
    { mm: 1778, unit: 'mm' as const, step: undefined, text: '1,778 mm' },
    { mm: 1.55, unit: 'mm' as const, step: undefined, text: '1.6 mm' },
  ])('when $mm mm as $unit (step $step), then "$text"', ({ mm, unit, step, text }) => {
    expect(formatLengthMm(mm, unit, step === undefined ? {} : { inchStep: step })).toBe(text);
  });

  it('when a locale with a decimal comma, then the comma is used', () => {
    expect(formatLengthMm(1778, 'cm', { locale: 'de-DE' })).toBe('177,8 cm');
  });

  it('when parsed and formatted, then the text round-trips', () => {
    for (const text of ['5 ft 10 in', '6 ft 3 in', '5 ft 10¼ in']) {
      const parsed = parseLengthMm(text);
      expect(parsed.ok && formatLengthMm(parsed.mm, 'ft-in')).toBe(text);
    }
  });
});
