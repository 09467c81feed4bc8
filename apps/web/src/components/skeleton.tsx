import type { ReactNode } from 'react';
import { cx } from '@/lib/cx';

/** A grey placeholder block with the shape of content that is loading. */
export function Skeleton({ className }: { className?: string }) {
  return <div aria-hidden="true" className={cx('animate-pulse rounded-md bg-graphite-200', className)} />;
}

/** Announces loading once to screen readers while skeletons show. */
export function LoadingRegion({ label, children }: { label: string; children: ReactNode }) {
  return (
    <div role="status" aria-live="polite">
      <span className="sr-only">{label}</span>
      {children}
    </div>
  );
}
