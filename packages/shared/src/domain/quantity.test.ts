import { describe, expect, it } from 'vitest';
import { formatQuantityMilli, parseQuantityMilli } from './quantity';

describe('parseQuantityMilli', () => {
  it.each([
    { input: '1.5', milli: 1500 },
    { input: '2.5', milli: 2500 }, // 2.5 m key bushing cloth (scenario)
    { input: '0.333', milli: 333 },
    { input: ' 12 ', milli: 12000 },
    { input: '-0.25', milli: -250 },
    { input: '+3', milli: 3000 },
    { input: 1.1, milli: 1100 }, // 1.1 is not exact in binary; its shortest decimal form is
    { input: 0.3, milli: 300 },
    { input: 7, milli: 7000 },
    { input: '-0', milli: 0 },
  ])('when $input, then $milli', ({ input, milli }) => {
    expect(parseQuantityMilli(input)).toBe(milli);
  });

  it.each(['1.2345', '1e3', '', 'two', '1,5', '.5', '1.', Number.NaN, Number.POSITIVE_INFINITY, 1e-7, '99999999999'])('when %s, then null', (input) => {
    expect(parseQuantityMilli(input)).toBeNull();
  });
});

describe('formatQuantityMilli', () => {
  it.each([
    { milli: 1500, text: '1.5' },
    { milli: 2000, text: '2' },
    { milli: 333, text: '0.333' },
    { milli: -250, text: '-0.25' },
    { milli: 0, text: '0' },
  ])('when $milli, then "$text"', ({ milli, text }) => {
    expect(formatQuantityMilli(milli)).toBe(text);
    expect(parseQuantityMilli(text)).toBe(milli);
  });

  it('when not whole thousandths, then RangeError', () => {
    expect(() => formatQuantityMilli(1.5)).toThrow(RangeError);
  });
});
