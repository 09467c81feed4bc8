/**
 * Money arithmetic in integer minor units (pence for GBP). Products that could pass 2^53 are done in
 * BigInt; every rounding rule is one named function here.
 *
 * Keybed's money rule, applied everywhere (estimates, invoices, costing):
 * - a line's amount = quantity × unit price, rounded half away from zero to the minor unit, per line
 *   ({@link lineAmountMinor}; labour lines minutes × hourly price / 60 the same way);
 * - tax is taken once on the total net of the document, rounded half-up ({@link taxMinor} with the
 *   default 'half-up'), not per line. HMRC VAT Notice 700 §17.5 and VATREC12010 allow the total VAT
 *   on an invoice to be rounded down to the whole penny; Keybed uses half-up, which the same
 *   guidance accepts when applied consistently, and keeps 'down' available as a rule.
 * - a cost is rounded the same way per item (a time entry, a stock issue) before summing.
 */

/** How a fractional amount of minor units is made whole. */
export type RoundingRule = 'half-up' | 'down';

/** One invoice or estimate line: quantity in thousandths (1.5 m = 1500), unit price in minor units. */
export interface PricedLine {
  quantityMilli: number;
  unitPriceMinor: number;
}

/** Invoice totals in minor units; grossMinor = netMinor + taxMinor. */
export interface InvoiceTotals {
  netMinor: number;
  taxMinor: number;
  grossMinor: number;
}

function toSafeNumber(value: bigint, what: string): number {
  const n = Number(value);
  if (!Number.isSafeInteger(n)) throw new RangeError(`${what} is too large to hold exactly`);
  return n;
}

function requireInteger(value: number | bigint, what: string): bigint {
  if (typeof value === 'number' && !Number.isSafeInteger(value)) throw new RangeError(`${what} must be a safe integer`);
  return BigInt(value);
}

/**
 * Minor-unit exponent of an ISO 4217 currency (GBP 2, JPY 0, BHD 3), as the runtime's Intl data
 * reports it. Throws RangeError for a code that is not three letters or that Intl rejects.
 */
export function currencyExponent(currency: string): number {
  if (!/^[A-Z]{3}$/.test(currency)) throw new RangeError(`"${currency}" is not an ISO 4217 code`);
  return new Intl.NumberFormat('en', { style: 'currency', currency }).resolvedOptions().maximumFractionDigits ?? 2;
}

/** Exact decimal string of a minor-unit amount ("-12.34" for -1234 GBP), no binary floats involved. */
export function minorToDecimalString(minor: number | bigint, currency: string): string {
  const amount = requireInteger(minor, 'Amount');
  const exponent = currencyExponent(currency);
  const digits = (amount < 0n ? -amount : amount).toString().padStart(exponent + 1, '0');
  const whole = digits.slice(0, digits.length - exponent);
  const fraction = exponent === 0 ? '' : `.${digits.slice(digits.length - exponent)}`;
  return `${amount < 0n ? '-' : ''}${whole}${fraction}`;
}

/** Formats a minor-unit amount as currency for a locale (`formatMoney(123456, 'GBP', 'en-GB')` → "£1,234.56"). Exact: the amount reaches Intl as a decimal string. */
export function formatMoney(minor: number | bigint, currency: string, locale: string): string {
  const text = minorToDecimalString(minor, currency) as `${number}`;
  return new Intl.NumberFormat(locale, { style: 'currency', currency }).format(text);
}

/**
 * Rounds the rational numerator/denominator to an integer, halves away from zero (2.5 → 3,
 * −2.5 → −3). Denominator must be non-zero. Inputs are integers; result must fit a safe integer.
 */
export function roundHalfUp(numerator: number | bigint, denominator: number | bigint): number {
  return roundRational(numerator, denominator, 'half-up');
}

/** Rounds numerator/denominator to an integer by `rule`: 'half-up' (halves away from zero) or 'down' (towards zero). */
export function roundRational(numerator: number | bigint, denominator: number | bigint, rule: RoundingRule): number {
  let n = requireInteger(numerator, 'Numerator');
  let d = requireInteger(denominator, 'Denominator');
  if (d === 0n) throw new RangeError('Denominator must not be zero');
  if (d < 0n) [n, d] = [-n, -d];
  const magnitude = n < 0n ? -n : n;
  const quotient = magnitude / d;
  const isRoundedUp = rule === 'half-up' && (magnitude % d) * 2n >= d;
  const rounded = isRoundedUp ? quotient + 1n : quotient;
  return toSafeNumber(n < 0n ? -rounded : rounded, 'Rounded amount');
}

/** Line amount in minor units = quantityMilli × unitPriceMinor / 1000, rounded half away from zero. */
export function lineAmountMinor(quantityMilli: number, unitPriceMinor: number): number {
  return roundHalfUp(requireInteger(quantityMilli, 'Quantity') * requireInteger(unitPriceMinor, 'Unit price'), 1000n);
}

/**
 * Tax in minor units = netMinor × rateBasisPoints / 10 000 (2000 bp = 20 %). Rule 'half-up' (the
 * default) rounds halves away from zero; 'down' drops the fraction (towards zero, so a credit note
 * mirrors its invoice) — HMRC allows total VAT on an invoice to be rounded down to the whole penny.
 */
export function taxMinor(netMinor: number, rateBasisPoints: number, rule: RoundingRule = 'half-up'): number {
  const product = requireInteger(netMinor, 'Net amount') * requireInteger(rateBasisPoints, 'Tax rate');
  return roundRational(product, 10_000n, rule);
}

/**
 * Totals of an invoice or estimate. Each line is rounded half-up to minor units
 * ({@link lineAmountMinor}); tax is then computed once on the total net (not per line) by `rule`.
 */
export function invoiceTotals(lines: readonly PricedLine[], rateBasisPoints: number, rule: RoundingRule = 'half-up'): InvoiceTotals {
  const net = lines.reduce((sum, line) => sum + BigInt(lineAmountMinor(line.quantityMilli, line.unitPriceMinor)), 0n);
  const netMinor = toSafeNumber(net, 'Net total');
  const tax = taxMinor(netMinor, rateBasisPoints, rule);
  return { netMinor, taxMinor: tax, grossMinor: toSafeNumber(net + BigInt(tax), 'Gross total') };
}

/**
 * Splits totalMinor in proportion to non-negative integer weights (e.g. [30, 70] for a 30 % deposit)
 * so the parts sum exactly to the total: each part gets its floor share, then the leftover minor
 * units go one each to the largest remainders (ties to the earlier part). A negative total is split
 * as its magnitude and negated. Throws RangeError when no weight is positive.
 */
export function allocateMinor(totalMinor: number, weights: readonly number[]): number[] {
  const total = requireInteger(totalMinor, 'Total');
  const w = weights.map((weight) => requireInteger(weight, 'Weight'));
  const weightSum = w.reduce((a, b) => a + b, 0n);
  if (w.some((weight) => weight < 0n) || weightSum === 0n) throw new RangeError('Weights must be non-negative with a positive sum');
  const magnitude = total < 0n ? -total : total;
  const shares = w.map((weight) => ({ floor: (magnitude * weight) / weightSum, rest: (magnitude * weight) % weightSum }));
  let leftover = magnitude - shares.reduce((sum, s) => sum + s.floor, 0n);
  const order = shares.map((s, i) => ({ rest: s.rest, i })).sort((a, b) => (a.rest === b.rest ? a.i - b.i : a.rest > b.rest ? -1 : 1));
  const parts = shares.map((s) => s.floor);
  for (const { i } of order) {
    if (leftover === 0n) break;
    parts[i] = (parts[i] ?? 0n) + 1n;
    leftover -= 1n;
  }
  return parts.map((part) => toSafeNumber(total < 0n ? -part : part, 'Share'));
}
