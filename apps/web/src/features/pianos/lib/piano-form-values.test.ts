import { describe, expect, it } from 'vitest';
import { readSize, readYear, toPianoFields } from './piano-form-values';

describe('readSize', () => {
  it.each([
    ['5 ft 10 in', 'ft-in', 1778],
    ["5' 2\"", 'ft-in', 1575],
    ['126 cm', 'ft-in', 1260],
    ['126', 'cm', 1260],
  ] as const)('when "%s" is typed in %s, then it is %i mm', (text, unit, mm) => {
    expect(readSize(text, unit)).toEqual({ ok: true, mm });
  });

  it('when a bare number is typed in feet and inches, then a unit is asked for', () => {
    expect(readSize('70', 'ft-in').ok).toBe(false);
  });

  it('when the size is left empty, then there is no size', () => {
    expect(readSize('  ', 'cm')).toEqual({ ok: true, mm: null });
  });
});

describe('readYear', () => {
  it.each([
    ['1911', 1911],
    ['c. 1926', 1926],
    ['', null],
  ])('when "%s" is typed, then the year is %s', (text, year) => {
    expect(readYear(text)).toEqual({ ok: true, year });
  });

  it('when the year is not four digits, then it says so', () => {
    expect(readYear('62').ok).toBe(false);
  });
});

describe('toPianoFields', () => {
  it('when the shown size was not touched, then no size is sent', () => {
    const { input } = toPianoFields({ maker: 'Osterholt', type: 'upright', size: '4 ft 1½ in' }, 'ft-in', '4 ft 1½ in');
    expect('sizeMm' in input).toBe(false);
  });

  it('when the size is unreadable, then the size field gets the message', () => {
    expect(toPianoFields({ size: 'tall' }, 'ft-in', '').fields.sizeMm?.[0]).toMatch(/Could not read/);
  });
});
