import { describe, expect, it } from 'vitest';
import { containsPattern } from './search';

describe('containsPattern', () => {
  it.each([
    ['Pembleton', '%Pembleton%'],
    ['50%', '%50\\%%'],
    ['serial_1', '%serial\\_1%'],
    ['back\\slash', '%back\\\\slash%'],
  ])('when searching for %j, then the pattern is %j', (text, pattern) => {
    expect(containsPattern(text)).toBe(pattern);
  });
});
