import { describe, expect, it } from 'vitest';
import { MAX_QUANTITY_MILLI } from '@keybed/shared';
import { canStepDown, parsePartQuantity, quantityRule, quantityText, stepPartQuantity } from './part-quantity';

// The demo catalogue's units (SCENARIO.md).
const set = 'set';
const metre = 'm';
const kg = 'kg';
const coil = 'coil (1 lb)';
const box = 'box of 100';

describe('quantityRule', () => {
  it.each([
    ['set', 'whole', 1000, false],
    ['job', 'whole', 1000, false],
    ['Pair ', 'whole', 1000, false],
    ['m', 'measure', 500, true],
    ['kg', 'measure', 500, true],
    ['Metres', 'measure', 500, true],
    ['coil (1 lb)', 'pack', 1000, true],
    ['box of 100', 'pack', 1000, true],
    ['sheet', 'pack', 1000, true],
  ] as const)('when the unit is “%s”, then it is counted as %s (step %i, decimals %s)', (unit, kind, stepMilli, allowsDecimals) => {
    expect(quantityRule(unit)).toEqual({ kind, stepMilli, allowsDecimals });
  });

  it('when a measure word is only part of a longer unit, then it is not a measure', () => {
    expect(quantityRule('roll (10 m)').kind).toBe('pack');
  });
});

describe('parsePartQuantity', () => {
  it.each([
    ['1', set, 1000],
    [' 2 ', set, 2000],
    ['2.0', set, 2000],
    ['1.5', metre, 1500],
    ['0,25', kg, 250],
    ['0.125', kg, 125],
    ['.5', metre, 500],
    ['0.3', box, 300],
    ['1.250', coil, 1250],
    ['1000000', coil, MAX_QUANTITY_MILLI],
  ] as const)('when “%s” is typed for a part counted in %s, then it is read exactly as %i thousandths', (text, unit, milli) => {
    expect(parsePartQuantity(text, quantityRule(unit))).toEqual({ ok: true, milli });
  });

  it.each([
    ['', set, 'Enter how many you used.'],
    ['   ', metre, 'Enter how many you used.'],
    ['1.5', set, 'Use a whole number, like 1 or 2.'],
    ['0.5', set, 'Use a whole number, like 1 or 2.'],
    ['0', set, 'The quantity must be above zero.'],
    ['0.000', metre, 'The quantity must be above zero.'],
    ['-1', metre, 'The quantity must be above zero.'],
    ['0.0005', kg, 'Use at most three decimals, like 0.125.'],
    ['1e3', metre, 'Write a number, like 1 or 0.5.'],
    ['two', set, 'Write a whole number, like 1 or 2.'],
    ['1,5,0', metre, 'Write a number, like 1 or 0.5.'],
    ['1000001', coil, 'That quantity is too large.'],
    ['99999999999', set, 'That quantity is too large.'],
    ['.', metre, 'Write a number, like 1 or 0.5.'],
  ] as const)('when “%s” is typed for a part counted in %s, then it is refused: %s', (text, unit, message) => {
    expect(parsePartQuantity(text, quantityRule(unit))).toEqual({ ok: false, message });
  });
});

describe('stepPartQuantity', () => {
  it.each([
    ['1', set, 1, '2'],
    ['2', set, -1, '1'],
    ['1', set, -1, '1'],
    ['1', metre, 1, '1.5'],
    ['1.5', metre, -1, '1'],
    ['1.3', metre, 1, '1.5'],
    ['1.3', metre, -1, '1'],
    ['0.5', metre, -1, '0.5'],
    ['0.3', kg, -1, '0.3'],
    ['0.3', box, 1, '1'],
    ['', set, 1, '1'],
    ['abc', metre, 1, '0.5'],
    ['abc', metre, -1, 'abc'],
    ['1000000', coil, 1, '1000000'],
  ] as const)('when the field holds “%s” (%s) and %i is pressed, then it becomes “%s”', (text, unit, direction, expected) => {
    expect(stepPartQuantity(text, quantityRule(unit), direction)).toBe(expected);
  });
});

describe('canStepDown', () => {
  it.each([
    ['2', set, true],
    ['1', set, false],
    ['1', metre, true],
    ['0.5', metre, false],
    ['', set, false],
  ] as const)('when the field holds “%s” (%s), then − can be pressed: %s', (text, unit, expected) => {
    expect(canStepDown(text, quantityRule(unit))).toBe(expected);
  });
});

describe('quantityText', () => {
  it('when a quantity is shown, then it has its unit and no trailing zeros', () => {
    expect(quantityText(1000, 'set')).toBe('1 set');
    expect(quantityText(1500, 'm')).toBe('1.5 m');
    expect(quantityText(250, 'kg')).toBe('0.25 kg');
  });
});
