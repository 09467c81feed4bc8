import { useId, type ReactNode } from 'react';

/** Props a field hands to its control so label, hint and error are wired for assistive tech. */
export interface FieldControlProps {
  id: string;
  'aria-invalid': true | undefined;
  'aria-describedby': string | undefined;
}

interface FieldProps {
  label: string;
  /** Short guidance shown under the label, e.g. "At least 8 characters". */
  hint?: string;
  /** The first problem with this field, shown under it and announced with it. */
  error?: string | undefined;
  /** Hide the label visually (it stays for screen readers), e.g. in table rows. */
  isLabelHidden?: boolean;
  className?: string;
  children: (control: FieldControlProps) => ReactNode;
}

export function Field({ label, hint, error, isLabelHidden = false, className, children }: FieldProps) {
  const id = useId();
  const hintId = hint ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [errorId, hintId].filter(Boolean).join(' ') || undefined;

  return (
    <div className={className}>
      <label htmlFor={id} className={isLabelHidden ? 'sr-only' : 'mb-1 block font-semibold'}>
        {label}
      </label>
      {hint && !isLabelHidden && (
        <p id={hintId} className="mb-1 text-sm text-graphite-500">
          {hint}
        </p>
      )}
      {children({ id, 'aria-invalid': error ? true : undefined, 'aria-describedby': describedBy })}
      {error && (
        <p id={errorId} className="mt-1 flex gap-1 text-sm font-semibold text-damper">
          <span aria-hidden="true">!</span>
          {error}
        </p>
      )}
    </div>
  );
}
