import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { TextInput } from '@/components/text-input';
import { mondayOf, shiftWeek, weekLabel } from '../lib/week';

interface WeekPickerProps {
  weekStart: string;
  thisWeek: string;
  onChange: (weekStart: string) => void;
}

/** Steps a week at a time, back to this week, or jumps to the week of any date. */
export function WeekPicker({ weekStart, thisWeek, onChange }: WeekPickerProps) {
  return (
    <div className="flex flex-wrap items-end gap-2">
      <Button variant="secondary" onClick={() => onChange(shiftWeek(weekStart, -1))}>
        <span aria-hidden="true">←</span> Previous week
      </Button>
      <p aria-live="polite" className="min-w-52 px-2 pb-2 text-center text-lg font-semibold tabular-figures">
        {weekLabel(weekStart)}
      </p>
      <Button variant="secondary" onClick={() => onChange(shiftWeek(weekStart, 1))} disabled={weekStart >= thisWeek}>
        Next week <span aria-hidden="true">→</span>
      </Button>
      {weekStart !== thisWeek && (
        <Button variant="quiet" onClick={() => onChange(thisWeek)}>
          This week
        </Button>
      )}
      <Field label="Week of" className="ml-2">
        {(control) => (
          <TextInput
            {...control}
            type="date"
            value={weekStart}
            max={shiftWeek(thisWeek, 1)}
            onChange={(e) => {
              if (/^\d{4}-\d{2}-\d{2}$/.test(e.target.value)) onChange(mondayOf(e.target.value));
            }}
            className="w-44"
          />
        )}
      </Field>
    </div>
  );
}
