import { useId, type ComponentProps } from 'react';
import { cx } from '@/lib/cx';

interface CheckboxProps extends Omit<ComponentProps<'input'>, 'type'> {
  label: string;
  isCompact?: boolean;
}

/** A checkbox with its label beside it; the whole row is the click target. */
export function Checkbox({ label, isCompact = false, className, id, ...rest }: CheckboxProps) {
  const generated = useId();
  const inputId = id ?? generated;
  return (
    <label htmlFor={inputId} className={cx('inline-flex items-center gap-2 font-semibold', isCompact ? 'min-h-9 text-sm' : 'min-h-11', className)}>
      <input id={inputId} type="checkbox" className="size-5 shrink-0 accent-walnut" {...rest} />
      {label}
    </label>
  );
}
