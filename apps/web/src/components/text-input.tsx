import type { ComponentProps } from 'react';
import { cx } from '@/lib/cx';

export const controlClasses = cx(
  'block w-full rounded-md border border-graphite-400 bg-white px-3 text-base text-ink',
  'placeholder:text-graphite-500 disabled:bg-graphite-100 disabled:text-graphite-500',
  'aria-invalid:border-damper aria-invalid:border-2',
);

export function TextInput({ className, ...rest }: ComponentProps<'input'>) {
  return <input className={cx(controlClasses, 'min-h-11', className)} {...rest} />;
}
