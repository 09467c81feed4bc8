import type { ComponentProps } from 'react';
import { cx } from '@/lib/cx';
import { controlClasses } from './text-input';

export function Textarea({ className, rows = 4, ...rest }: ComponentProps<'textarea'>) {
  return <textarea rows={rows} className={cx(controlClasses, 'py-2', className)} {...rest} />;
}
