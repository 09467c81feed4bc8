import { describe, expect, it } from 'vitest';
import { formatBasisPoints, formatMinor, formatPercent, moneyInputText, parseHoursInput, parseMoneyInput, parsePercentInput, parseQuantityInput, percentInputText } from './money';

describe('parseMoneyInput', () => {
  it.each([
    ['55', 'GBP', 5500],
    ['55.5', 'GBP', 5550],
    ['1,850.00', 'GBP', 185000],
    ['£18.00', 'GBP', 1800],
    [' 0.01 ', 'GBP', 1],
    ['1250', 'JPY', 1250],
    ['1.234', 'BHD', 1234],
  ])('when "%s" is typed in %s, then it is %s minor units', (text, currency, minor) => {
    expect(parseMoneyInput(text, currency)).toEqual({ ok: true, value: minor });
  });

  it.each([
    ['', 'GBP'],
    ['-5', 'GBP'],
    ['12.345', 'GBP'],
    ['12.5', 'JPY'],
    ['twelve', 'GBP'],
    ['1e3', 'GBP'],
  ])('when "%s" is typed in %s, then it is refused with a reason', (text, currency) => {
    expect(parseMoneyInput(text, currency)).toMatchObject({ ok: false, message: expect.any(String) });
  });

  it('when an amount is shown for editing, then reading it back gives the same minor units', () => {
    for (const minor of [0, 1, 99, 5500, 185000, 1234567]) {
      expect(parseMoneyInput(moneyInputText(minor, 'GBP'), 'GBP')).toEqual({ ok: true, value: minor });
    }
  });
});

describe('formatMinor', () => {
  it('when an amount is shown, then it carries the currency and thousands separators', () => {
    expect(formatMinor(185000, 'GBP')).toBe('£1,850.00');
    expect(formatMinor(-3000, 'GBP')).toBe('-£30.00');
  });
});

describe('percentages', () => {
  it.each([
    ['20', 2000],
    ['17.5', 1750],
    ['12.25 %', 1225],
    ['0', 0],
    ['7,5', 750],
  ])('when "%s" is typed, then it is %s basis points', (text, bp) => {
    expect(parsePercentInput(text)).toEqual({ ok: true, value: bp });
  });

  it.each(['', '-5', '12.345', 'a lot'])('when "%s" is typed, then it is refused', (text) => {
    expect(parsePercentInput(text).ok).toBe(false);
  });

  it('when basis points are shown, then they read as a percentage both ways', () => {
    expect(percentInputText(2000)).toBe('20');
    expect(percentInputText(1750)).toBe('17.5');
    expect(percentInputText(1225)).toBe('12.25');
    expect(formatBasisPoints(2500)).toBe('25.0 %');
    expect(formatPercent(33.196402797823914)).toBe('33.2 %');
    expect(formatPercent(null)).toBe('–');
  });
});

describe('parseHoursInput', () => {
  it.each([
    ['1:30', 90],
    ['22:30', 1350],
    ['2', 120],
    ['1.5', 90],
    ['1,25', 75],
    ['0.33', 20],
    ['0.125', 8],
  ])('when "%s" is typed, then it is %s minutes', (text, minutes) => {
    expect(parseHoursInput(text)).toEqual({ ok: true, value: minutes });
  });

  it.each(['', '1:75', '1h30', '-2', 'two'])('when "%s" is typed, then it is refused', (text) => {
    expect(parseHoursInput(text).ok).toBe(false);
  });
});

describe('parseQuantityInput', () => {
  it('when a decimal quantity is typed, then it is exact thousandths; zero and negatives are refused', () => {
    expect(parseQuantityInput('2.5')).toEqual({ ok: true, value: 2500 });
    expect(parseQuantityInput('0,25')).toEqual({ ok: true, value: 250 });
    expect(parseQuantityInput('0').ok).toBe(false);
    expect(parseQuantityInput('-1').ok).toBe(false);
    expect(parseQuantityInput('1.2345').ok).toBe(false);
  });
});
