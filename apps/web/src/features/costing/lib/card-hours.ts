import { formatHoursMinutes } from '@keybed/shared';
import { spokenHoursMinutes } from '@/lib/duration';
import { formatPercent } from '@/lib/money';

/** What a board card's hours indicator shows and says, from the job's estimated and logged minutes. */
export interface CardHours {
  /** "3:20 of 6:00"; "1:30" when nothing is estimated. */
  text: string;
  /** Shown beside the text in words: "1:10 over", "no estimate", or nothing. */
  note: string | null;
  /** The indicator's accessible name, every figure spelt out. */
  label: string;
  /** Share of the estimate used for the bar, 0 to 1. */
  fill: number;
  isOver: boolean;
}

/**
 * Hours used against the estimate for a card. Past the estimate, the card says by how much in
 * text (not only by colour); with no estimate it says so rather than counting every minute as over.
 */
export function cardHours(estimatedMinutes: number, loggedMinutes: number): CardHours {
  const used = spokenHoursMinutes(loggedMinutes);
  if (estimatedMinutes <= 0) {
    return { text: formatHoursMinutes(loggedMinutes), note: 'no estimate', label: `Hours: ${used} used, no estimate`, fill: 0, isOver: false };
  }
  const over = loggedMinutes - estimatedMinutes;
  const isOver = over > 0;
  const label = `Hours: ${used} used of ${spokenHoursMinutes(estimatedMinutes)} estimated${isOver ? `, ${spokenHoursMinutes(over)} over the estimate` : ''}`;
  return {
    text: `${formatHoursMinutes(loggedMinutes)} of ${formatHoursMinutes(estimatedMinutes)}`,
    note: isOver ? `${formatHoursMinutes(over)} over` : null,
    label,
    fill: Math.min(1, loggedMinutes / estimatedMinutes),
    isOver,
  };
}

/** The owner's margin indicator: its text, and its accessible name saying when it is below the workshop's target. */
export function cardMargin(forecastMarginPercent: number, isBelowTargetMargin: boolean) {
  const percent = formatPercent(forecastMarginPercent);
  return {
    text: `${percent} margin`,
    note: isBelowTargetMargin ? 'low' : null,
    label: `Forecast margin ${percent}${isBelowTargetMargin ? ', below the target' : ''}`,
  };
}
