import { formatHoursMinutes } from '@keybed/shared';
import { spokenHoursMinutes } from '@/lib/duration';
import { cx } from '@/lib/cx';
import { hoursUse } from '../lib/margins-filters';

interface HoursMeterProps {
  estimatedMinutes: number;
  actualMinutes: number;
  isCompact?: boolean;
  className?: string;
}

/** Hours used against the estimate: a bar that fills as time is logged and turns to damper past it. */
export function HoursMeter({ estimatedMinutes, actualMinutes, isCompact = false, className }: HoursMeterProps) {
  const { ratio, isOver } = hoursUse(estimatedMinutes, actualMinutes);
  const spoken =
    estimatedMinutes > 0
      ? `${spokenHoursMinutes(actualMinutes)} used of ${spokenHoursMinutes(estimatedMinutes)} estimated${isOver ? ', over the estimate' : ''}`
      : `${spokenHoursMinutes(actualMinutes)} used, no estimate`;
  return (
    <span className={cx('inline-flex items-center gap-1.5', className)} title={isCompact ? spoken : undefined}>
      <span aria-hidden="true" className={cx('relative block overflow-hidden rounded-full bg-graphite-200', isCompact ? 'h-1.5 w-10' : 'h-2 w-24')}>
        <span className={cx('absolute inset-y-0 left-0 rounded-full', isOver ? 'bg-damper' : 'bg-felt')} style={{ width: `${Math.min(1, ratio) * 100}%` }} />
      </span>
      <span aria-hidden="true" className={cx('tabular-figures', isOver && 'font-semibold text-damper', isCompact && 'text-xs')}>
        {formatHoursMinutes(actualMinutes)}
        {estimatedMinutes > 0 ? `/${formatHoursMinutes(estimatedMinutes)}` : ''}
      </span>
      <span className="sr-only">Hours: {spoken}</span>
    </span>
  );
}
