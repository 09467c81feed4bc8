import { describe, expect, it } from 'vitest';
import type { EstimateLine } from '@keybed/shared';
import { depositMinor, quantityText } from './estimate-document';

const line = (over: Partial<EstimateLine>): EstimateLine => ({
  id: 'l1',
  position: 0,
  kind: 'labour',
  description: 'Rebush keys',
  task: null,
  part: null,
  minutes: null,
  quantityMilli: null,
  optionId: null,
  optionKey: null,
  ...over,
});

describe('depositMinor', () => {
  it.each([
    [385200, 3000, 115560],
    [317280, 3000, 95184],
    // 30 % of 1p: the larger share (70 %) keeps the penny; the deposit is 0p.
    [1, 3000, 0],
    // 3333 bp of £100.01 = 3333.333…p: floor shares, the leftover penny to the larger remainder.
    [10001, 3333, 3333],
    [10001, 10000, 10001],
    [10001, 0, 0],
    [0, 3000, 0],
  ])('when the total with tax is %ip at %i bp, then the deposit is %ip', (gross, bp, expected) => {
    expect(depositMinor(gross, bp)).toBe(expected);
  });
});

describe('quantityText', () => {
  it.each([
    [line({ kind: 'labour', minutes: 600 }), '10 h'],
    [line({ kind: 'labour', minutes: 450 }), '7.5 h'],
    [line({ kind: 'labour', minutes: 50 }), '0.83 h'],
    [line({ kind: 'part', quantityMilli: 2500, part: { id: 'p', sku: 'KBC-1', name: 'Key bushing cloth', unit: 'm' } }), '2.5 m'],
    [line({ kind: 'sublet', quantityMilli: 1000 }), '1'],
  ])('when the line is %#, then it reads %s', (l, expected) => {
    expect(quantityText(l)).toBe(expected);
  });
});
