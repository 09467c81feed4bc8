import type { ReactNode } from 'react';
import type { TimesheetWeek } from '@keybed/shared';
import { formatHoursMinutes } from '@keybed/shared';
import { dayLabel } from '../lib/week';
import type { TaskFieldProps } from './correction-form';
import { EntryRow } from './entry-row';

interface DayListProps {
  week: TimesheetWeek;
  /** Whether the viewer may correct this entry (foreman: open weeks; owner: any). */
  canCorrect: (entry: TimesheetWeek['days'][number]['entries'][number]['entry']) => boolean;
  renderTaskField: (props: TaskFieldProps) => ReactNode;
}

/** Monday to Sunday, each with its total and its entries. */
export function DayList({ week, canCorrect, renderTaskField }: DayListProps) {
  return (
    <div className="space-y-4">
      {week.days.map((day) => {
        const headingId = `day-${day.day}`;
        const isQuiet = day.entries.length === 0;
        return (
          <section key={day.day} aria-labelledby={headingId}>
            <h3 id={headingId} className="flex items-baseline justify-between gap-4 border-b-2 border-graphite-300 pb-1">
              <span className="font-semibold">{dayLabel(day.day)}</span>
              <span className="font-semibold tabular-figures">{formatHoursMinutes(day.minutes)}</span>
            </h3>
            {isQuiet ? (
              <p className="px-4 py-2 text-graphite-600">No time recorded.</p>
            ) : (
              <ul aria-label={`Entries on ${dayLabel(day.day)}`} className="rounded-b-lg border border-t-0 border-graphite-300 bg-white">
                {day.entries.map(({ entry, minutes }) => (
                  <EntryRow
                    key={entry.id}
                    entry={entry}
                    minutes={minutes}
                    timeZone={week.timeZone}
                    canCorrect={canCorrect(entry)}
                    renderTaskField={renderTaskField}
                  />
                ))}
              </ul>
            )}
          </section>
        );
      })}
    </div>
  );
}
