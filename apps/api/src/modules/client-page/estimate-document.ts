import { allocateMinor, type ClientPage, type Estimate, type EstimateLine } from '@keybed/shared';

type ClientEstimate = ClientPage['estimate'];
type ClientLine = ClientEstimate['includedLines'][number];

/** "10 h", "7.5 h", "2.5 m", "1 set": how much a line is, in words the client reads. */
export function quantityText(line: EstimateLine): string {
  const number = (n: number) => new Intl.NumberFormat('en-GB', { maximumFractionDigits: 3 }).format(n);
  if (line.kind === 'labour') return `${number(Math.round(((line.minutes ?? 0) / 60) * 100) / 100)} h`;
  const quantity = number((line.quantityMilli ?? 0) / 1000);
  return line.part ? `${quantity} ${line.part.unit}` : quantity;
}

const toClientLine = (l: EstimateLine): ClientLine => ({ description: l.description, quantityText: quantityText(l), amountMinor: l.amountMinor ?? 0 });

/**
 * The estimate as the client sees it (page and PDF): always-included lines, then each choice with
 * its options and their lines. Costs never reach it; it is built from the owner's view of prices.
 */
export function toClientEstimate(estimate: Estimate): ClientEstimate {
  const choices: ClientEstimate['choices'] = [];
  for (const option of estimate.options) {
    let group = choices.find((c) => c.choice.toLowerCase() === option.choice.toLowerCase());
    if (!group) choices.push((group = { choice: option.choice, options: [] }));
    group.options.push({
      id: option.id,
      name: option.name,
      netMinor: option.netMinor ?? 0,
      isChosen: option.isChosen,
      lines: estimate.lines.filter((l) => l.optionId === option.id).map(toClientLine),
    });
  }
  return {
    id: estimate.id,
    revision: estimate.revision,
    title: estimate.title,
    notes: estimate.notes,
    status: estimate.status === 'accepted' || estimate.status === 'declined' ? estimate.status : 'issued',
    currency: estimate.currency,
    taxRateBasisPoints: estimate.taxRateBasisPoints ?? 0,
    includedLines: estimate.lines.filter((l) => l.optionId === null).map(toClientLine),
    choices,
    totals: estimate.totals ?? { netMinor: 0, taxMinor: 0, grossMinor: 0 },
    issuedAt: estimate.issuedAt,
  };
}

/** The deposit on a total with tax: `basisPoints` of it, split exactly with `allocateMinor` (no penny lost). */
export function depositMinor(grossMinor: number, basisPoints: number): number {
  if (basisPoints <= 0 || grossMinor <= 0) return 0;
  return allocateMinor(grossMinor, [basisPoints, 10_000 - basisPoints])[0]!;
}
