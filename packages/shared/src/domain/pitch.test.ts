import { describe, expect, it } from 'vitest';
import { centsBetween, frequencyFromCents, keyFrequencyHz, keyFromNoteName, noteName, tensionRatio } from './pitch';

describe('keyFrequencyHz', () => {
  // f(n) = 440 × 2^((n − 49)/12), A4 = 440 Hz (ISO 16:1975 [S2]); values [S1] OEIS A214832
  // (whole-number parts), decimals derived.
  it.each([
    { key: 1, name: 'A0', hz: 27.5 },
    { key: 40, name: 'C4', hz: 261.626 },
    { key: 49, name: 'A4', hz: 440 },
    { key: 88, name: 'C8', hz: 4186.009 },
    { key: 37, name: 'A3', hz: 220 },
    { key: 52, name: 'C5', hz: 523.251 },
  ])('when key $key ($name), then $hz Hz [S1]', ({ key, name, hz }) => {
    expect(keyFrequencyHz(key)).toBeCloseTo(hz, 3);
    expect(noteName(key)).toBe(name);
    expect(keyFromNoteName(name)).toBe(key);
  });

  it('when another reference pitch, then every key scales with it', () => {
    expect(keyFrequencyHz(49, 442)).toBe(442);
    expect(keyFrequencyHz(37, 435)).toBeCloseTo(217.5, 9);
  });

  it.each([0, 89, 12.5])('when key %s, then RangeError', (key) => {
    expect(() => keyFrequencyHz(key)).toThrow(RangeError);
    expect(() => noteName(key)).toThrow(RangeError);
  });
});

describe('note names', () => {
  it.each([
    { key: 2, name: 'A#0' },
    { key: 3, name: 'B0' },
    { key: 4, name: 'C1' },
    { key: 41, name: 'C#4' },
    { key: 87, name: 'B7' },
  ])('when key $key, then "$name"', ({ key, name }) => {
    expect(noteName(key)).toBe(name);
  });

  it.each([
    { name: 'Db4', key: 41 },
    { name: 'bb3', key: 38 },
    { name: 'B♭3', key: 38 },
    { name: 'Cb4', key: 39 },
    { name: ' a4 ', key: 49 },
    { name: 'G#0', key: null },
    { name: 'C#8', key: null },
    { name: 'H4', key: null },
    { name: 'A', key: null },
  ])('when "$name", then key $key', ({ name, key }) => {
    expect(keyFromNoteName(name)).toBe(key);
  });
});

describe('cents', () => {
  // c = 1200·log2(f/f_ref) [S3] Howard & Angus, App. 3; check values derived in TRADE.md §1.
  it('when A = 435 Hz against 440 Hz, then −19.8 cents (derived from [S3])', () => {
    expect(centsBetween(440, 435)).toBeCloseTo(-19.8, 1);
  });

  it('when one cent at A4, then ≈ 0.254 Hz (derived from [S3])', () => {
    expect(frequencyFromCents(440, 1) - 440).toBeCloseTo(0.254, 3);
  });

  it.each([
    { from: 440, to: 880, cents: 1200 },
    { from: 440, to: 220, cents: -1200 },
    { from: 440, to: 440, cents: 0 },
  ])('when $from → $to Hz, then $cents cents [S3]', ({ from, to, cents }) => {
    expect(centsBetween(from, to)).toBeCloseTo(cents, 9);
    expect(frequencyFromCents(from, cents)).toBeCloseTo(to, 9);
  });
});

describe('tensionRatio', () => {
  // Tension ∝ f² (derived from Mersenne's law [S6]); TRADE.md §1: 100 cents flat → 0.891.
  it('when 100 cents flat, then 0.891 of design tension (derived)', () => {
    expect(tensionRatio(frequencyFromCents(440, -100), 440)).toBeCloseTo(0.891, 3);
  });

  it('when an octave low, then a quarter of the tension', () => {
    expect(tensionRatio(220, 440)).toBe(0.25);
  });
});
