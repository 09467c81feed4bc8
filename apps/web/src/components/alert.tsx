import type { ReactNode } from 'react';
import { cx } from '@/lib/cx';

export type AlertTone = 'info' | 'success' | 'error';

const TONES: Record<AlertTone, { box: string; mark: string; label: string }> = {
  info: { box: 'border-graphite-300 bg-graphite-100', mark: 'bg-graphite-600', label: 'Note' },
  success: { box: 'border-felt bg-felt-light', mark: 'bg-felt', label: 'Done' },
  error: { box: 'border-damper bg-damper-light', mark: 'bg-damper', label: 'Problem' },
};

interface AlertProps {
  tone?: AlertTone;
  title?: string;
  children?: ReactNode;
  className?: string;
}

/** A calm, one-idea message in the page flow. Errors are announced straight away; others politely. */
export function Alert({ tone = 'info', title, children, className }: AlertProps) {
  const style = TONES[tone];
  return (
    <div
      role={tone === 'error' ? 'alert' : 'status'}
      className={cx('flex gap-3 rounded-md border-l-4 border p-3 text-ink', style.box, className)}
    >
      <span aria-hidden="true" className={cx('mt-1.5 size-2.5 shrink-0 rounded-full', style.mark)} />
      <div className="min-w-0">
        <span className="sr-only">{style.label}: </span>
        {title && <p className="font-semibold">{title}</p>}
        {children && <div className={title ? 'mt-0.5' : undefined}>{children}</div>}
      </div>
    </div>
  );
}
