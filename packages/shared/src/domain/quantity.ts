/**
 * Quantities of stock and estimate lines are integer thousandths of their unit (1.5 m = 1500), so
 * sums stay exact. These convert between that and the decimal text people type and read.
 */

/** The largest quantity Keybed stores: a million whole units. */
export const MAX_QUANTITY_MILLI = 1_000_000_000;

const DECIMAL = /^([+-])?(\d{1,10})(?:\.(\d{1,3}))?$/;

/**
 * Thousandths from a decimal ("1.5" → 1500, "-0.25" → -250, 2 → 2000). Exact: the text is read
 * digit by digit, never through a binary float. Null for anything with more than three decimals,
 * exponents, blanks or non-finite numbers. A number is read through its shortest decimal form.
 */
export function parseQuantityMilli(value: string | number): number | null {
  const text = typeof value === 'number' ? (Number.isFinite(value) ? String(value) : '') : value.trim();
  const match = DECIMAL.exec(text);
  if (!match) return null;
  const milli = Number(match[2]) * 1000 + Number((match[3] ?? '').padEnd(3, '0'));
  const signed = match[1] === '-' ? -milli : milli;
  return Number.isSafeInteger(signed) && Math.abs(signed) <= MAX_QUANTITY_MILLI ? signed || 0 : null;
}

/** Decimal text of thousandths without trailing zeros (1500 → "1.5", 2000 → "2", -250 → "-0.25"). */
export function formatQuantityMilli(milli: number): string {
  if (!Number.isSafeInteger(milli)) throw new RangeError('Quantity must be whole thousandths');
  const magnitude = Math.abs(milli);
  const fraction = String(magnitude % 1000).padStart(3, '0').replace(/0+$/, '');
  return `${milli < 0 ? '-' : ''}${Math.floor(magnitude / 1000)}${fraction ? `.${fraction}` : ''}`;
}
