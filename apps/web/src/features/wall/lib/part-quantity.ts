import { MAX_QUANTITY_MILLI, formatQuantityMilli, parseQuantityMilli } from '@keybed/shared';

/**
 * How a part's quantity is counted at the wall, from its unit: whole items (a set, a job) only in
 * whole numbers; measures (metres, kilograms) in decimals, a half at a time on the − / + buttons;
 * anything else (a coil, a box of 100) one at a time, with decimals typed for a part of one.
 * Quantities are thousandths of the unit, as the API takes them (1.5 m = 1500).
 */
export interface QuantityRule {
  kind: 'whole' | 'measure' | 'pack';
  /** What one press of − or + changes, in thousandths. */
  stepMilli: number;
  allowsDecimals: boolean;
}

const WHOLE = new Set(['set', 'sets', 'job', 'jobs', 'each', 'ea', 'piece', 'pieces', 'pc', 'pcs', 'pair', 'pairs', 'item', 'items']);
const MEASURES = new Set([
  'm', 'metre', 'metres', 'meter', 'meters', 'ft', 'foot', 'feet', 'yd', 'yard', 'yards',
  'kg', 'kilo', 'kilos', 'kilogram', 'kilograms', 'lb', 'lbs', 'l', 'litre', 'litres', 'liter', 'liters',
]);

/** The rule for a unit as the catalogue writes it ("set", "m", "coil (1 lb)", "box of 100"). */
export function quantityRule(unit: string): QuantityRule {
  const text = unit.trim().toLowerCase().replace(/\.$/, '');
  const first = text.split(/[\s(]+/)[0] ?? '';
  if (WHOLE.has(first)) return { kind: 'whole', stepMilli: 1000, allowsDecimals: false };
  if (MEASURES.has(text)) return { kind: 'measure', stepMilli: 500, allowsDecimals: true };
  return { kind: 'pack', stepMilli: 1000, allowsDecimals: true };
}

export type ParsedQuantity = { ok: true; milli: number } | { ok: false; message: string };

const NUMBER = /^\+?(\d*)(?:\.(\d*))?$/;

/** Thousandths from the quantity as typed ("2", "1.5", "0,25"), or what is wrong with it in plain words. */
export function parsePartQuantity(text: string, rule: QuantityRule): ParsedQuantity {
  const typed = text.trim().replace(',', '.');
  if (typed === '') return { ok: false, message: 'Enter how many you used.' };
  if (/^-\s*\d/.test(typed)) return { ok: false, message: 'The quantity must be above zero.' };
  const match = NUMBER.exec(typed);
  if (!match || !/\d/.test(typed)) return { ok: false, message: rule.allowsDecimals ? 'Write a number, like 1 or 0.5.' : 'Write a whole number, like 1 or 2.' };
  const decimals = (match[2] ?? '').replace(/0+$/, '');
  if (!rule.allowsDecimals && decimals !== '') return { ok: false, message: 'Use a whole number, like 1 or 2.' };
  if (decimals.length > 3) return { ok: false, message: 'Use at most three decimals, like 0.125.' };
  const whole = match[1] || '0';
  const milli = parseQuantityMilli(decimals === '' ? whole : `${whole}.${decimals}`);
  if (milli === null) return { ok: false, message: 'That quantity is too large.' };
  if (milli <= 0) return { ok: false, message: 'The quantity must be above zero.' };
  return { ok: true, milli };
}

/**
 * The quantity after one press of + (`direction` 1) or − (−1), as text for the field: the next
 * whole step above or below (1.3 m goes to 1.5 m or 1 m). Text that does not read as a quantity
 * counts as nothing; − never goes to zero or below (it leaves the text as it is), + never passes
 * the largest quantity Keybed stores.
 */
export function stepPartQuantity(text: string, rule: QuantityRule, direction: 1 | -1): string {
  const parsed = parsePartQuantity(text, { ...rule, allowsDecimals: true });
  const current = parsed.ok ? parsed.milli : 0;
  const steps = current / rule.stepMilli;
  const next = (direction === 1 ? Math.floor(steps) + 1 : Math.ceil(steps) - 1) * rule.stepMilli;
  if (next <= 0) return text;
  return formatQuantityMilli(Math.min(next, MAX_QUANTITY_MILLI));
}

/** Whether − would change the quantity (it stops above zero). */
export function canStepDown(text: string, rule: QuantityRule): boolean {
  const parsed = parsePartQuantity(text, { ...rule, allowsDecimals: true });
  return parsed.ok && parsed.milli > rule.stepMilli;
}

/** "1 set", "0.5 m": a quantity in thousandths with the part's unit, as the wall says it. */
export const quantityText = (milli: number, unit: string) => `${formatQuantityMilli(milli)} ${unit}`;
