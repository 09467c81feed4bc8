import type { ReactNode } from 'react';
import { cx } from '@/lib/cx';

interface EmptyStateProps {
  title: string;
  /** What this place is for and what to do first. */
  children?: ReactNode;
  action?: ReactNode;
  headingLevel?: 'h2' | 'h3' | 'h4';
  className?: string;
}

export function EmptyState({ title, children, action, headingLevel: Heading = 'h2', className }: EmptyStateProps) {
  return (
    <div className={cx('rounded-lg border border-dashed border-graphite-400 bg-white px-6 py-10 text-center', className)}>
      <Heading className="text-lg font-semibold">{title}</Heading>
      {children && <div className="mx-auto mt-2 max-w-prose text-graphite-600">{children}</div>}
      {action && <div className="mt-5 flex justify-center">{action}</div>}
    </div>
  );
}
