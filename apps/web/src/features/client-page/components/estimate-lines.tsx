import type { ClientPage } from '@keybed/shared';
import { formatMinor } from '@/lib/money';

type Line = ClientPage['estimate']['includedLines'][number];

/** Lines of work with how much and what each costs, ex VAT. */
export function EstimateLines({ lines, currency, label }: { lines: readonly Line[]; currency: string; label: string }) {
  if (lines.length === 0) return null;
  return (
    <table className="w-full text-left text-sm sm:text-base">
      <caption className="sr-only">{label}</caption>
      <thead className="sr-only">
        <tr>
          <th scope="col">Work</th>
          <th scope="col">How much</th>
          <th scope="col">Price ex VAT</th>
        </tr>
      </thead>
      <tbody className="divide-y divide-graphite-200">
        {lines.map((line, i) => (
          <tr key={i}>
            <td className="py-1.5 pr-3">{line.description}</td>
            <td className="py-1.5 pr-3 whitespace-nowrap text-graphite-600 tabular-figures">{line.quantityText}</td>
            <td className="py-1.5 text-right whitespace-nowrap tabular-figures">{formatMinor(line.amountMinor, currency)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
