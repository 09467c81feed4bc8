import type { ComponentProps } from 'react';
import { cx } from '@/lib/cx';
import { controlClasses } from './text-input';

export interface SelectOption {
  value: string;
  label: string;
}

interface SelectProps extends ComponentProps<'select'> {
  options: readonly SelectOption[];
  isCompact?: boolean;
}

export function Select({ options, isCompact = false, className, ...rest }: SelectProps) {
  return (
    <select className={cx(controlClasses, isCompact ? 'min-h-9 text-sm' : 'min-h-11', 'pr-8', className)} {...rest}>
      {options.map((option) => (
        <option key={option.value} value={option.value}>
          {option.label}
        </option>
      ))}
    </select>
  );
}
