import { currencyExponent, formatMoney, minorToDecimalString, parseQuantityMilli, roundHalfUp } from '@keybed/shared';

/** Money is shown the same way on every screen: the workshop's currency, British English layout. */
const LOCALE = 'en-GB';

/** "£1,234.56" from minor units in the workshop's currency. */
export function formatMinor(minor: number, currency: string): string {
  return formatMoney(minor, currency, LOCALE);
}

/** The currency's symbol as this locale writes it ("£" for GBP, "CHF" where there is none). */
export function currencySymbol(currency: string): string {
  const part = new Intl.NumberFormat(LOCALE, { style: 'currency', currency }).formatToParts(0).find((p) => p.type === 'currency');
  return part?.value ?? currency;
}

export type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

/**
 * Minor units from an amount as typed ("55", "1,234.50", "£18.00"), read digit by digit so no
 * binary float is involved. Refuses negatives, more decimals than the currency has, and anything
 * that is not a number.
 */
export function parseMoneyInput(text: string, currency: string): Parsed<number> {
  const exponent = currencyExponent(currency);
  const cleaned = text.trim().replace(currencySymbol(currency), '').replace(/[\s,]/g, '');
  if (cleaned === '') return { ok: false, message: 'Enter an amount' };
  if (cleaned.startsWith('-')) return { ok: false, message: 'Cannot be negative' };
  const match = /^(\d{1,12})(?:\.(\d*))?$/.exec(cleaned);
  if (!match) return { ok: false, message: `Write an amount like ${exponent > 0 ? `12.${'5'.padEnd(exponent, '0')}` : '125'}` };
  const fraction = match[2] ?? '';
  if (fraction.length > exponent) {
    return { ok: false, message: exponent === 0 ? 'This currency has no decimal places' : `Use at most ${exponent} decimal places` };
  }
  const minor = Number(match[1]) * 10 ** exponent + Number(fraction.padEnd(exponent, '0') || '0');
  return Number.isSafeInteger(minor) ? { ok: true, value: minor } : { ok: false, message: 'Amount is too large' };
}

/** Text for an amount field ("55.00"), the inverse of {@link parseMoneyInput}. */
export function moneyInputText(minor: number, currency: string): string {
  return minorToDecimalString(minor, currency);
}

/** Basis points from a percentage as typed ("20" → 2000, "17.5 %" → 1750), at most two decimals. */
export function parsePercentInput(text: string): Parsed<number> {
  const cleaned = text.trim().replace(/\s*%$/, '').replace(',', '.');
  if (cleaned === '') return { ok: false, message: 'Enter a percentage' };
  const match = /^(\d{1,5})(?:\.(\d{1,2}))?$/.exec(cleaned);
  if (!match) return { ok: false, message: cleaned.startsWith('-') ? 'Cannot be negative' : 'Write a percentage like 20 or 17.5' };
  return { ok: true, value: Number(match[1]) * 100 + Number((match[2] ?? '').padEnd(2, '0')) };
}

/** "20", "17.5" from basis points, for a percentage field. */
export function percentInputText(basisPoints: number): string {
  const whole = Math.trunc(basisPoints / 100);
  const fraction = String(Math.abs(basisPoints % 100)).padStart(2, '0').replace(/0+$/, '');
  return fraction ? `${whole}.${fraction}` : String(whole);
}

const percentFormat = new Intl.NumberFormat(LOCALE, { maximumFractionDigits: 1, minimumFractionDigits: 1 });

/** "20.0 %" from basis points. */
export function formatBasisPoints(basisPoints: number): string {
  return `${percentFormat.format(basisPoints / 100)} %`;
}

/** "33.2 %" from a percentage the API sends as a number (33.196…); "–" when there is none. */
export function formatPercent(percent: number | null): string {
  return percent === null ? '–' : `${percentFormat.format(percent)} %`;
}

/**
 * Whole minutes from hours as typed: "1:30", "2", "1.5" or "1,25". Decimal hours are read exactly
 * and rounded half-up to the minute (0.33 h → 20 min).
 */
export function parseHoursInput(text: string): Parsed<number> {
  const value = text.trim();
  if (value === '') return { ok: false, message: 'Enter hours, like 1:30 or 1.5' };
  const hm = /^(\d{1,3}):([0-5]\d)$/.exec(value);
  if (hm) return { ok: true, value: Number(hm[1]) * 60 + Number(hm[2]) };
  const milliHours = /^\d{1,3}([.,]\d{1,3})?$/.test(value) ? parseQuantityMilli(value.replace(',', '.')) : null;
  if (milliHours === null) return { ok: false, message: 'Write hours and minutes like 1:30, or hours like 1.5' };
  return { ok: true, value: roundHalfUp(milliHours * 60, 1000) };
}

/** Thousandths of a unit from a quantity as typed ("2", "1.5", "0,25"); refuses zero and negatives. */
export function parseQuantityInput(text: string): Parsed<number> {
  const milli = text.trim() === '' ? null : parseQuantityMilli(text.trim().replace(',', '.'));
  if (milli === null) return { ok: false, message: 'Write a quantity like 2 or 1.5 (at most three decimals)' };
  if (milli <= 0) return { ok: false, message: 'Quantity must be above zero' };
  return { ok: true, value: milli };
}
