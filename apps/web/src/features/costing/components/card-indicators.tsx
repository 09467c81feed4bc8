import type { BoardJobHours } from '@keybed/shared';
import { cx } from '@/lib/cx';
import { cardHours, cardMargin } from '../lib/card-hours';

/** The owner's money figures for a card, from the margins report. */
export interface CardMarginFigures {
  /** Null while the job has no agreed price. */
  forecastMarginPercent: number | null;
  isBelowTargetMargin: boolean;
}

/** Hours used against the estimate, for every member: a small bar and "h:mm of h:mm", with any overrun in words. */
export function CardHours({ hours }: { hours: BoardJobHours }) {
  const view = cardHours(hours.estimatedMinutes, hours.loggedMinutes);
  return (
    <span role="img" aria-label={view.label} title={view.label} className="inline-flex items-center gap-1.5 text-xs tabular-figures">
      {hours.estimatedMinutes > 0 && (
        <span className="relative block h-1.5 w-8 overflow-hidden rounded-full bg-graphite-200">
          <span className={cx('absolute inset-y-0 left-0 rounded-full', view.isOver ? 'bg-damper' : 'bg-felt')} style={{ width: `${view.fill * 100}%` }} />
        </span>
      )}
      <span className={view.isOver ? 'font-semibold text-damper' : 'text-graphite-700'}>{view.text}</span>
      {view.note && <span className={view.isOver ? 'font-semibold text-damper' : 'text-graphite-600'}>{view.note}</span>}
    </span>
  );
}

/** The owner's forecast margin, with "low" in words when it is below the workshop's target. */
export function CardMargin({ figures }: { figures: CardMarginFigures }) {
  if (figures.forecastMarginPercent === null) return null;
  const view = cardMargin(figures.forecastMarginPercent, figures.isBelowTargetMargin);
  return (
    <span
      role="img"
      aria-label={view.label}
      title={view.label}
      className={cx('rounded-sm px-1 text-xs font-semibold tabular-figures', figures.isBelowTargetMargin ? 'bg-damper-light text-damper' : 'bg-felt-light text-felt')}
    >
      {view.text}
      {view.note && ` · ${view.note}`}
    </span>
  );
}
