import { describe, expect, it } from 'vitest';
import { estimateText, parseEstimate } from './estimate';

describe('parseEstimate', () => {
  it.each([
    ['', null],
    ['  ', null],
    ['1:30', 90],
    ['0:45', 45],
    ['22:30', 1350],
    ['2', 120],
    ['1.5', 90],
    ['1,25', 75],
    ['0.33', 20],
  ])('when the text is "%s", then it is %s minutes', (text, minutes) => {
    expect(parseEstimate(text)).toEqual({ ok: true, minutes });
  });

  it.each(['1:75', 'two hours', '-1', '1:3', '1h30'])('when the text is "%s", then it is refused with a hint', (text) => {
    expect(parseEstimate(text)).toMatchObject({ ok: false });
  });
});

describe('estimateText', () => {
  it('when there is an estimate, then it reads as h:mm; when none, then empty', () => {
    expect(estimateText(360)).toBe('6:00');
    expect(estimateText(null)).toBe('');
  });
});
