import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  allocateMinor,
  currencyExponent,
  formatMoney,
  invoiceTotals,
  lineAmountMinor,
  minorToDecimalString,
  roundHalfUp,
  roundRational,
  taxMinor,
} from './money';

const UK_STANDARD_RATE_BP = 2000; // 20 % since 4 Jan 2011: gov.uk/vat-rates [S19a]

describe('currencyExponent', () => {
  // Minor units per ISO 4217 (from memory), read through Intl.NumberFormat.
  it.each([
    { currency: 'GBP', exponent: 2 },
    { currency: 'EUR', exponent: 2 },
    { currency: 'JPY', exponent: 0 },
    { currency: 'BHD', exponent: 3 },
  ])('when $currency, then $exponent decimals (ISO 4217, from memory)', ({ currency, exponent }) => {
    expect(currencyExponent(currency)).toBe(exponent);
  });

  it.each(['gbp', 'GB', 'POUNDS'])('when "%s", then RangeError', (code) => {
    expect(() => currencyExponent(code)).toThrow(RangeError);
  });
});

describe('formatMoney', () => {
  it.each([
    { minor: 123456, currency: 'GBP', locale: 'en-GB', text: '£1,234.56' },
    { minor: -5, currency: 'GBP', locale: 'en-GB', text: '-£0.05' },
    { minor: 0, currency: 'GBP', locale: 'en-GB', text: '£0.00' },
    { minor: 1500, currency: 'JPY', locale: 'en-GB', text: 'JP¥1,500' },
    { minor: 1234, currency: 'BHD', locale: 'en-GB', text: 'BHD 1.234' },
    { minor: 9_007_199_254_740_993n, currency: 'GBP', locale: 'en-GB', text: '£90,071,992,547,409.93' },
  ])('when $minor $currency in $locale, then "$text"', ({ minor, currency, locale, text }) => {
    expect(formatMoney(minor, currency, locale).replace(/\u00a0/g, ' ')).toBe(text);
  });

  it('when a locale with a decimal comma, then Intl places the symbol and separators', () => {
    expect(formatMoney(123456, 'EUR', 'de-DE').replace(/\u00a0/g, ' ')).toBe('1.234,56 €');
  });

  it.each([
    { minor: 5, text: '0.05' },
    { minor: -123456, text: '-1234.56' },
    { minor: 100, text: '1.00' },
  ])('when $minor pence as a decimal string, then "$text"', ({ minor, text }) => {
    expect(minorToDecimalString(minor, 'GBP')).toBe(text);
  });
});

describe('roundHalfUp and roundRational', () => {
  it.each([
    { n: 5, d: 2, halfUp: 3, down: 2 },
    { n: -5, d: 2, halfUp: -3, down: -2 },
    { n: 7, d: 3, halfUp: 2, down: 2 },
    { n: 8, d: 3, halfUp: 3, down: 2 },
    { n: 5, d: -2, halfUp: -3, down: -2 },
    { n: 0, d: 7, halfUp: 0, down: 0 },
    { n: 2469120, d: 10000, halfUp: 247, down: 246 },
  ])('when $n/$d, then half-up $halfUp and down $down', ({ n, d, halfUp, down }) => {
    expect(roundHalfUp(n, d)).toBe(halfUp);
    expect(roundRational(n, d, 'down')).toBe(down);
  });

  it('when the denominator is zero or an input is not an integer, then RangeError', () => {
    expect(() => roundHalfUp(1, 0)).toThrow(RangeError);
    expect(() => roundHalfUp(1.5, 2)).toThrow(RangeError);
  });
});

describe('lineAmountMinor', () => {
  it.each([
    { quantityMilli: 1000, unitPriceMinor: 69000, amount: 69000 }, // 1 grand hammer set at £690.00 (scenario)
    { quantityMilli: 2500, unitPriceMinor: 2400, amount: 6000 }, // 2.5 m bushing cloth at £24.00/m (scenario)
    { quantityMilli: 333, unitPriceMinor: 4800, amount: 1598 }, // 0.333 kg shellac at £48.00: 1598.4p → 1598p
    { quantityMilli: 500, unitPriceMinor: 5, amount: 3 }, // 2.5p → 3p, half away from zero
    { quantityMilli: 1500, unitPriceMinor: 1, amount: 2 }, // 1.5p → 2p
    { quantityMilli: -500, unitPriceMinor: 5, amount: -3 }, // a returned part: −2.5p → −3p
  ])('when $quantityMilli/1000 × $unitPriceMinor, then $amount', ({ quantityMilli, unitPriceMinor, amount }) => {
    expect(lineAmountMinor(quantityMilli, unitPriceMinor)).toBe(amount);
  });

  it('when the product passes 2^53, then it is still exact', () => {
    expect(lineAmountMinor(9_000_000_000_000, 1000)).toBe(9_000_000_000_000);
  });
});

describe('taxMinor', () => {
  // Rule 'down': HMRC VAT Notice 700 §17.5 / VATREC12010 [S19b] allow total VAT on an invoice to be
  // rounded down to the whole penny. 'half-up' is the default.
  it.each([
    { net: 123456, bp: UK_STANDARD_RATE_BP, halfUp: 24691, down: 24691 }, // 24 691.2p [S19a, S19b]
    { net: 123458, bp: UK_STANDARD_RATE_BP, halfUp: 24692, down: 24691 }, // 24 691.6p
    { net: 3, bp: UK_STANDARD_RATE_BP, halfUp: 1, down: 0 }, // 0.6p
    { net: 2, bp: UK_STANDARD_RATE_BP, halfUp: 0, down: 0 }, // 0.4p
    { net: 10, bp: 500, halfUp: 1, down: 0 }, // exactly 0.5p at 5 %
    { net: 30, bp: 500, halfUp: 2, down: 1 }, // exactly 1.5p
    { net: -10, bp: 500, halfUp: -1, down: 0 }, // a credit mirrors the invoice
    { net: 0, bp: UK_STANDARD_RATE_BP, halfUp: 0, down: 0 },
    { net: 100000, bp: 0, halfUp: 0, down: 0 },
  ])('when net $net at $bp bp, then $halfUp half-up and $down down', ({ net, bp, halfUp, down }) => {
    expect(taxMinor(net, bp)).toBe(halfUp);
    expect(taxMinor(net, bp, 'half-up')).toBe(halfUp);
    expect(taxMinor(net, bp, 'down')).toBe(down);
  });
});

describe('invoiceTotals', () => {
  it('when the Salon grand estimate lines are totalled, then tax is 20 % of the total net [S19a]', () => {
    const lines = [
      { quantityMilli: 1000, unitPriceMinor: 69000 }, // hammer set, grand
      { quantityMilli: 2500, unitPriceMinor: 2400 }, // key bushing cloth
      { quantityMilli: 42000, unitPriceMinor: 5500 }, // 42 h labour at £55/h
    ];
    expect(invoiceTotals(lines, UK_STANDARD_RATE_BP)).toEqual({ netMinor: 306000, taxMinor: 61200, grossMinor: 367200 });
  });

  it('when tax is taken on the total net, then it can differ from the sum of per-line tax', () => {
    const lines = Array.from({ length: 10 }, () => ({ quantityMilli: 1000, unitPriceMinor: 3 }));
    const perLine = lines.reduce((sum, l) => sum + taxMinor(lineAmountMinor(l.quantityMilli, l.unitPriceMinor), 2000), 0);
    expect(perLine).toBe(10); // ten × round(0.6p)
    expect(invoiceTotals(lines, 2000)).toEqual({ netMinor: 30, taxMinor: 6, grossMinor: 36 });
  });

  it('when rule is down, then the invoice VAT drops the fraction [S19b]', () => {
    expect(invoiceTotals([{ quantityMilli: 1000, unitPriceMinor: 123458 }], 2000, 'down')).toEqual({
      netMinor: 123458,
      taxMinor: 24691,
      grossMinor: 148149,
    });
  });

  it('when there are no lines, then all totals are zero', () => {
    expect(invoiceTotals([], 2000)).toEqual({ netMinor: 0, taxMinor: 0, grossMinor: 0 });
  });

  it('when many lines, then totals are integers and gross = net + tax (property)', () => {
    const line = fc.record({ quantityMilli: fc.integer({ min: -100_000, max: 100_000 }), unitPriceMinor: fc.integer({ min: 0, max: 10_000_000 }) });
    fc.assert(
      fc.property(fc.array(line, { maxLength: 50 }), fc.integer({ min: 0, max: 10_000 }), fc.constantFrom('half-up' as const, 'down' as const), (lines, bp, rule) => {
        const totals = invoiceTotals(lines, bp, rule);
        expect(Number.isSafeInteger(totals.netMinor) && Number.isSafeInteger(totals.taxMinor)).toBe(true);
        expect(totals.grossMinor).toBe(totals.netMinor + totals.taxMinor);
        expect(Math.abs(totals.taxMinor * 10_000 - totals.netMinor * bp)).toBeLessThan(10_000);
      }),
    );
  });
});

describe('allocateMinor', () => {
  it.each([
    { total: 234567, weights: [30, 70], parts: [70370, 164197] }, // 30 % deposit: 70 370.1p / 164 196.9p
    { total: 367200, weights: [30, 70], parts: [110160, 257040] },
    { total: 100, weights: [1, 1, 1], parts: [34, 33, 33] }, // ties go to the earlier part
    { total: -100, weights: [1, 1, 1], parts: [-34, -33, -33] },
    { total: 5, weights: [0, 1], parts: [0, 5] },
    { total: 0, weights: [3, 7], parts: [0, 0] },
    { total: 1, weights: [1, 3], parts: [0, 1] },
  ])('when $total split by $weights, then $parts', ({ total, weights, parts }) => {
    expect(allocateMinor(total, weights)).toEqual(parts);
  });

  it.each([{ weights: [] }, { weights: [0, 0] }, { weights: [-1, 2] }, { weights: [0.5, 1] }])(
    'when weights are $weights, then RangeError',
    ({ weights }) => {
      expect(() => allocateMinor(100, weights)).toThrow(RangeError);
    },
  );

  it('when any total and weights, then parts are integers summing exactly to the total, each within 1 of its exact share (property)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: -1_000_000_000, max: 1_000_000_000 }),
        fc.array(fc.integer({ min: 0, max: 10_000 }), { minLength: 1, maxLength: 12 }).filter((w) => w.some((x) => x > 0)),
        (total, weights) => {
          const parts = allocateMinor(total, weights);
          const weightSum = weights.reduce((a, b) => a + b, 0);
          expect(parts.every(Number.isSafeInteger)).toBe(true);
          expect(parts.reduce((a, b) => a + b, 0)).toBe(total);
          parts.forEach((part, i) => expect(Math.abs(part - (total * (weights[i] ?? 0)) / weightSum)).toBeLessThan(1));
        },
      ),
    );
  });
});
