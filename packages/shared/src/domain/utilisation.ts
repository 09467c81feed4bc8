/**
 * Technician utilisation: minutes on job tasks ÷ minutes in the workshop's working days. Days are
 * local calendar days (YYYY-MM-DD); the working day is wall-clock "HH:mm", so a day of 08:00–17:30
 * counts 570 minutes whatever the clocks do that night.
 */
import { addDaysToDayKey, isoWeekday } from './time';

const minutesOfDay = (hhmm: string) => {
  const match = /^([01]\d|2[0-3]):([0-5]\d)$/.exec(hhmm);
  if (!match) throw new RangeError(`"${hhmm}" is not a HH:mm time`);
  return Number(match[1]) * 60 + Number(match[2]);
};

/**
 * Working minutes from `fromDay` to `toDay` inclusive: each day whose ISO weekday (1 = Monday) is in
 * `weekdays` counts end − start minutes. 0 when `toDay` is before `fromDay`.
 */
export function workingMinutesInPeriod(fromDay: string, toDay: string, weekdays: readonly number[], dayStart: string, dayEnd: string): number {
  const perDay = minutesOfDay(dayEnd) - minutesOfDay(dayStart);
  if (perDay <= 0) throw new RangeError('The working day must end after it starts');
  const working = new Set(weekdays);
  let days = 0;
  for (let day = fromDay; day <= toDay; day = addDaysToDayKey(day, 1)) if (working.has(isoWeekday(day))) days++;
  return days * perDay;
}

/** Worked ÷ available as a ratio (0.82 = 82 %); null when nothing was available. */
export function utilisationRatio(workedMinutes: number, availableMinutes: number): number | null {
  return availableMinutes > 0 ? workedMinutes / availableMinutes : null;
}
