import { useState } from 'react';
import { formatLengthMm } from '@keybed/shared';
import { Field } from '@/components/field';
import { TextInput } from '@/components/text-input';
import type { PreferredLengthUnit } from '@/lib/length-unit';
import { readSize } from '../lib/piano-form-values';

interface SizeFieldProps {
  defaultValue: string;
  unit: PreferredLengthUnit;
  error?: string | undefined;
}

/** Size typed in feet and inches or centimetres, with what it reads as shown underneath. */
export function SizeField({ defaultValue, unit, error }: SizeFieldProps) {
  const [text, setText] = useState(defaultValue);
  const reading = text.trim() === '' ? null : readSize(text, unit);
  const hint = unit === 'cm' ? 'Length of a grand, height of an upright: 126 cm, or 4 ft 1½ in' : 'Length of a grand, height of an upright: 5 ft 10 in, or 177.8 cm';

  return (
    <Field label="Size" hint={hint} error={error}>
      {(control) => (
        <>
          <TextInput {...control} name="size" value={text} onChange={(e) => setText(e.target.value)} autoComplete="off" />
          {reading?.ok && reading.mm !== null && (
            <p className="mt-1 text-sm text-graphite-600 tabular-figures">
              Reads as {formatLengthMm(reading.mm, 'ft-in')} · {formatLengthMm(reading.mm, 'cm')} · {reading.mm} mm
            </p>
          )}
        </>
      )}
    </Field>
  );
}
