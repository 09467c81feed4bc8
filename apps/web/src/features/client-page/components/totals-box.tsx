import type { MoneyTotals } from '@keybed/shared';
import { formatBasisPoints, formatMinor } from '@/lib/money';

interface TotalsBoxProps {
  totals: MoneyTotals;
  currency: string;
  taxRateBasisPoints: number;
  /** Says the totals follow the client's picks as they change. */
  isLive?: boolean;
}

/** Net, VAT and total; announced when the client's picks change them. */
export function TotalsBox({ totals, currency, taxRateBasisPoints, isLive = false }: TotalsBoxProps) {
  return (
    <dl aria-live={isLive ? 'polite' : undefined} aria-label="Totals" className="grid grid-cols-[1fr_auto] gap-y-1 tabular-figures">
      <dt>Work and parts</dt>
      <dd className="pl-4 text-right">{formatMinor(totals.netMinor, currency)}</dd>
      <dt>VAT at {formatBasisPoints(taxRateBasisPoints).replace('.0 %', ' %')}</dt>
      <dd className="pl-4 text-right">{formatMinor(totals.taxMinor, currency)}</dd>
      <dt className="border-t border-graphite-300 pt-1 text-lg font-bold">Total</dt>
      <dd className="border-t border-graphite-300 pt-1 pl-4 text-right text-lg font-bold">{formatMinor(totals.grossMinor, currency)}</dd>
    </dl>
  );
}
