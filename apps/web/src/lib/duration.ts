import { formatHoursMinutes } from '@keybed/shared';

/** Elapsed time from an ISO instant to `nowMs` as h:mm ("0:05", "3:20"); never negative. */
export function elapsedHoursMinutes(startedAt: string, nowMs: number): string {
  const minutes = Math.max(0, Math.floor((nowMs - Date.parse(startedAt)) / 60_000));
  return formatHoursMinutes(Number.isFinite(minutes) ? minutes : 0);
}

/** Minutes as h:mm, spelt out for screen readers ("3 hours 20 minutes"). */
export function spokenHoursMinutes(minutes: number): string {
  const h = Math.floor(minutes / 60);
  const m = minutes % 60;
  const part = (n: number, word: string) => `${n} ${word}${n === 1 ? '' : 's'}`;
  if (h === 0) return part(m, 'minute');
  return m === 0 ? part(h, 'hour') : `${part(h, 'hour')} ${part(m, 'minute')}`;
}
