import type { InvoiceTotals } from '@keybed/shared';
import { formatBasisPoints, formatMinor } from '@/lib/money';
import { choicesOf, type OptionDraft } from '../lib/estimate-draft';

interface TotalsPanelProps {
  totals: InvoiceTotals;
  currency: string;
  taxRateBasisPoints: number;
  options: readonly OptionDraft[];
  /** The options the totals include, one per choice. */
  chosenKeys: readonly string[];
  /** While editing: which option of each choice to total; left out once the client has chosen. */
  onPreview?: (key: string) => void;
  /** Lines left out because something in them cannot be read yet. */
  unreadableCount?: number;
  heading?: string;
}

/** Subtotal ex VAT, VAT and total, with the options they include. */
export function TotalsPanel({ totals, currency, taxRateBasisPoints, options, chosenKeys, onPreview, unreadableCount = 0, heading = 'Totals' }: TotalsPanelProps) {
  const choices = choicesOf(options);
  return (
    <section aria-label={heading} className="space-y-3 rounded-lg border border-graphite-300 bg-white p-4">
      <h4 className="font-semibold">{heading}</h4>
      {choices.length > 0 &&
        (onPreview ? (
          choices.map((c) => (
            <fieldset key={c.choice} className="text-sm">
              <legend className="font-semibold">Total with, for {c.choice || 'this choice'}:</legend>
              {c.options.map((o, i) => (
                <label key={o.key} className="flex min-h-8 items-center gap-2">
                  <input type="radio" name={`preview-${c.choice}`} className="size-4 accent-walnut" checked={chosenKeys.includes(o.key)} onChange={() => onPreview(o.key)} />
                  {o.name || `Option ${i + 1}`}
                </label>
              ))}
            </fieldset>
          ))
        ) : (
          <p className="text-sm text-graphite-700">With {options.filter((o) => chosenKeys.includes(o.key)).map((o) => o.name).join(', ')}</p>
        ))}
      <dl className="grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 tabular-figures">
        <dt>Subtotal ex VAT</dt>
        <dd className="text-right">{formatMinor(totals.netMinor, currency)}</dd>
        <dt>VAT at {formatBasisPoints(taxRateBasisPoints)}</dt>
        <dd className="text-right">{formatMinor(totals.taxMinor, currency)}</dd>
        <dt className="border-t border-graphite-300 pt-1 font-bold">Total</dt>
        <dd className="border-t border-graphite-300 pt-1 text-right font-bold">{formatMinor(totals.grossMinor, currency)}</dd>
      </dl>
      {unreadableCount > 0 && (
        <p className="text-sm font-semibold text-damper">
          {unreadableCount === 1 ? 'One line is' : `${unreadableCount} lines are`} left out until {unreadableCount === 1 ? 'its' : 'their'} figures can be read.
        </p>
      )}
    </section>
  );
}
