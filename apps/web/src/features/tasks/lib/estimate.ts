import { formatHoursMinutes } from '@keybed/shared';

export type EstimateText = { ok: true; minutes: number | null } | { ok: false; message: string };

const HOURS_MINUTES = /^(\d{1,3}):([0-5]\d)$/;
const HOURS = /^\d{1,3}([.,]\d{1,2})?$/;

/**
 * Reads an estimate typed as h:mm ("1:30"), whole or decimal hours ("2", "1.5", "1,5"), in whole
 * minutes; empty means no estimate. Decimal hours round to the nearest minute.
 */
export function parseEstimate(text: string): EstimateText {
  const value = text.trim();
  if (value === '') return { ok: true, minutes: null };
  const hm = HOURS_MINUTES.exec(value);
  if (hm) return { ok: true, minutes: Number(hm[1]) * 60 + Number(hm[2]) };
  if (HOURS.test(value)) return { ok: true, minutes: Math.round(Number(value.replace(',', '.')) * 60) };
  return { ok: false, message: 'Write hours and minutes like 1:30, or hours like 2' };
}

/** An estimate for a text field: "1:30", or empty when there is none. */
export const estimateText = (minutes: number | null) => (minutes === null ? '' : formatHoursMinutes(minutes));
