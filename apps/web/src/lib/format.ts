const dateFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });
const dateTimeFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', hour: '2-digit', minute: '2-digit' });

/** "3 Mar 2025" from an ISO timestamp; the raw text if it is not a date. */
export function formatDate(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateFormat.format(date);
}

/** "3 Mar, 14:05" from an ISO timestamp. */
export function formatDateTime(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : dateTimeFormat.format(date);
}

/** Calendar dates (YYYY-MM-DD) are shown as written, never shifted by the viewer's time zone. */
const dayFormat = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric', timeZone: 'UTC' });
const DAY_KEY = /^\d{4}-\d{2}-\d{2}$/;

/** "24 Dec 2026" from "2026-12-24"; the raw text if it is not a calendar date. */
export function formatDay(dayKey: string): string {
  const date = new Date(`${dayKey}T00:00:00Z`);
  return DAY_KEY.test(dayKey) && !Number.isNaN(date.getTime()) ? dayFormat.format(date) : dayKey;
}

/** Today's calendar date (YYYY-MM-DD) where this browser is. */
export function todayKey(now: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** A promised date is overdue once the day after it has begun. */
export function isOverdue(promisedOn: string | null, today: string): boolean {
  return promisedOn !== null && promisedOn < today;
}

/** "3 d 4 h", "5 h 20 min", "12 min", "under a minute", from milliseconds. */
export function formatElapsed(ms: number): string {
  const minutes = Math.floor(Math.max(0, ms) / 60_000);
  if (minutes < 1) return 'under a minute';
  const days = Math.floor(minutes / 1440);
  const hours = Math.floor((minutes % 1440) / 60);
  const mins = minutes % 60;
  if (days > 0) return hours > 0 ? `${days} d ${hours} h` : `${days} d`;
  if (hours > 0) return mins > 0 ? `${hours} h ${mins} min` : `${hours} h`;
  return `${mins} min`;
}
