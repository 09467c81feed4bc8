import { Field } from '@/components/field';
import { TextInput } from '@/components/text-input';

interface PinFieldsProps {
  errorFor: (name: string) => string | undefined;
  onEdit: (name: string) => void;
  /** Whose PIN, in the labels ("Priya's new PIN"); the member's own when absent. */
  whose?: string;
}

/**
 * A new PIN typed twice. The inputs are uncontrolled and the form is cleared after sending, so
 * the PIN lives only in the input until the one request that carries it.
 */
export function PinFields({ errorFor, onEdit, whose }: PinFieldsProps) {
  const pinProps = { type: 'password', inputMode: 'numeric', autoComplete: 'off', maxLength: 6, pattern: '[0-9]*', className: 'w-40 tabular-figures' } as const;
  return (
    <div className="flex flex-wrap gap-4">
      <Field label={whose ? `New PIN for ${whose}` : 'New PIN'} hint="6 digits" error={errorFor('pin')}>
        {(control) => <TextInput {...control} {...pinProps} name="pin" onChange={() => onEdit('pin')} />}
      </Field>
      <Field label="Type it again" error={errorFor('pinRepeat')}>
        {(control) => <TextInput {...control} {...pinProps} name="pinRepeat" onChange={() => onEdit('pinRepeat')} />}
      </Field>
    </div>
  );
}
