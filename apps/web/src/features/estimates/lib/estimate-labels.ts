import { formatHoursMinutes, formatQuantityMilli, type Estimate, type EstimateLine, type EstimateStatus } from '@keybed/shared';

export const STATUS_LABELS: Record<EstimateStatus, string> = {
  draft: 'Draft',
  issued: 'Issued, awaiting the client',
  accepted: 'Accepted',
  declined: 'Declined',
  superseded: 'Replaced by a later revision',
};

/** "Estimate 1", "Variation 3". */
export const estimateName = (e: Pick<Estimate, 'kind' | 'revision'>) => `${e.kind === 'variation' ? 'Variation' : 'Estimate'} ${e.revision}`;

/** "6:00 h", "2.5 m", "1 set", "1" for a line's hours or quantity. */
export function lineQuantity(line: EstimateLine): string {
  if (line.kind === 'labour') return `${formatHoursMinutes(line.minutes ?? 0)} h`;
  const quantity = formatQuantityMilli(line.quantityMilli ?? 0);
  return line.part ? `${quantity} ${line.part.unit}` : quantity;
}

/** What a job's estimates come to: the original the client is deciding on (or agreed), its variations, and older revisions. */
export function arrange(estimates: readonly Estimate[]) {
  const originals = estimates.filter((e) => e.kind === 'original');
  const current = originals.find((e) => e.status === 'accepted') ?? [...originals].reverse().find((e) => e.status !== 'superseded') ?? originals.at(-1);
  return {
    current,
    variations: estimates.filter((e) => e.kind === 'variation'),
    earlier: originals.filter((e) => e !== current).reverse(),
    hasAccepted: originals.some((e) => e.status === 'accepted'),
    hasDraftOriginal: originals.some((e) => e.status === 'draft'),
    hasDraftVariation: estimates.some((e) => e.kind === 'variation' && e.status === 'draft'),
  };
}
