import type { SurveyMeasure } from '@keybed/shared';
import { Field } from '@/components/field';
import { TextInput } from '@/components/text-input';
import { cx } from '@/lib/cx';
import { describePitch, describeTorque } from '../lib/measurements';

interface MeasurementFieldProps {
  measure: SurveyMeasure;
  componentName: string;
  value: string;
  error: string | undefined;
  onChange: (text: string) => void;
}

/** A4's measured pitch in hertz with its distance from A440 in cents, or tuning-pin torque in N·m. */
export function MeasurementField({ measure, componentName, value, error, onChange }: MeasurementFieldProps) {
  const isPitch = measure === 'a4_pitch';
  const reading = isPitch ? describePitch(value) : describeTorque(value);
  const isConcern = reading !== null && ('isRaiseNeeded' in reading ? reading.isRaiseNeeded : reading.isLow);
  const concern = isPitch ? 'a pitch raise comes before fine tuning' : 'low: the pinblock may not hold a tuning';
  return (
    <Field label={isPitch ? 'Measured pitch of A4 (Hz)' : 'Tuning-pin torque (N·m)'} error={error} className="max-w-xs">
      {(control) => (
        <>
          <div className="flex items-center gap-2">
            <TextInput
              {...control}
              inputMode="decimal"
              autoComplete="off"
              value={value}
              onChange={(e) => onChange(e.target.value)}
              placeholder={isPitch ? '440.0' : '9.5'}
              className="w-32 tabular-figures"
            />
            <span aria-hidden="true" className="text-graphite-600">{isPitch ? 'Hz' : 'N·m'}</span>
          </div>
          {reading && (
            <p className={cx('mt-1 text-sm tabular-figures', isConcern ? 'font-semibold text-damper' : 'text-graphite-600')}>
              {reading.text}
              {isConcern ? ` — ${concern}` : ''}
            </p>
          )}
        </>
      )}
    </Field>
  );
}
