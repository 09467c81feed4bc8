import { taxMinor, type ClientPage, type MoneyTotals } from '@keybed/shared';

type ClientEstimate = ClientPage['estimate'];

/** Option id per choice: the client's pick, starting from what the estimate shows (its chosen or first options). */
export type Picks = Record<string, string>;

/** The chosen options once answered; before that the first option of each choice, as the estimate's totals assume. */
export function initialPicks(estimate: ClientEstimate): Picks {
  const picks: Picks = {};
  for (const group of estimate.choices) {
    const option = group.options.find((o) => o.isChosen) ?? group.options[0];
    if (option) picks[group.choice] = option.id;
  }
  return picks;
}

export const pickedIds = (estimate: ClientEstimate, picks: Picks): string[] =>
  estimate.choices.flatMap((group) => (picks[group.choice] && group.options.some((o) => o.id === picks[group.choice]) ? [picks[group.choice]!] : []));

/**
 * Totals for the client's picks, by Keybed's money rule: net = the always-included lines plus the
 * picked options (each already a sum of rounded lines), tax once on that net, rounded half-up.
 */
export function totalsFor(estimate: ClientEstimate, picks: Picks): MoneyTotals {
  const picked = new Set(pickedIds(estimate, picks));
  const included = estimate.includedLines.reduce((sum, line) => sum + line.amountMinor, 0);
  const options = estimate.choices.flatMap((g) => g.options).filter((o) => picked.has(o.id)).reduce((sum, o) => sum + o.netMinor, 0);
  const netMinor = included + options;
  const tax = taxMinor(netMinor, estimate.taxRateBasisPoints);
  return { netMinor, taxMinor: tax, grossMinor: netMinor + tax };
}

/** How much more or less an option costs than the one picked now in its choice, with tax ("+ £1,044.00"). */
export function differenceMinor(estimate: ClientEstimate, picks: Picks, choice: string, optionId: string): number {
  const group = estimate.choices.find((g) => g.choice === choice);
  const current = group?.options.find((o) => o.id === picks[choice]);
  const option = group?.options.find((o) => o.id === optionId);
  if (!current || !option) return 0;
  const withOption = totalsFor(estimate, { ...picks, [choice]: option.id }).grossMinor;
  return withOption - totalsFor(estimate, picks).grossMinor;
}
