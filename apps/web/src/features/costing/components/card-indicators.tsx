import { cx } from '@/lib/cx';
import { formatPercent } from '@/lib/money';
import { HoursMeter } from './hours-meter';

export interface CardFigures {
  estimatedMinutes: number;
  actualMinutes: number;
  /** Owner only. */
  forecastMarginPercent?: number | null;
  isBelowTargetMargin?: boolean;
}

/** Whether a card has anything to show: hours against an estimate, or a margin. */
export const hasCardFigures = (f: CardFigures | undefined): f is CardFigures =>
  f !== undefined && (f.estimatedMinutes > 0 || f.actualMinutes > 0 || (f.forecastMarginPercent ?? null) !== null);

/** The board card's footer: hours used against the estimate, and the forecast margin when it is known. */
export function CardIndicators({ figures }: { figures: CardFigures | undefined }) {
  if (!figures) return null;
  const hasMargin = figures.forecastMarginPercent !== undefined;
  return (
    <>
      {(figures.estimatedMinutes > 0 || figures.actualMinutes > 0) && <HoursMeter isCompact estimatedMinutes={figures.estimatedMinutes} actualMinutes={figures.actualMinutes} />}
      {hasMargin && figures.forecastMarginPercent !== null && (
        <span className={cx('rounded-sm px-1 text-xs font-semibold tabular-figures', figures.isBelowTargetMargin ? 'bg-damper-light text-damper' : 'bg-felt-light text-felt')}>
          <span className="sr-only">Forecast margin </span>
          {formatPercent(figures.forecastMarginPercent ?? null)}
          {figures.isBelowTargetMargin && <span className="sr-only">, below target</span>}
        </span>
      )}
    </>
  );
}
