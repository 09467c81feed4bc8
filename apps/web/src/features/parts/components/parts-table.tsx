import type { Part } from '@keybed/shared';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { formatMinor, formatBasisPoints } from '@/lib/money';
import { quantityWithUnit } from '../lib/part-form';
import { LowStockBadge } from './low-stock-badge';

const th = 'px-3 py-2 text-left font-semibold';
const num = 'px-3 py-2 text-right tabular-figures';

/** The sell price as set: fixed, or the cost plus a markup. */
function priceText(part: Part, currency: string) {
  if (part.sellPriceMinor === undefined) return null;
  const price = formatMinor(part.sellPriceMinor, currency);
  return part.markupBasisPoints != null ? `${price} (cost + ${formatBasisPoints(part.markupBasisPoints)})` : price;
}

/** The catalogue with stock on hand; price and cost columns appear only when the API sends them. */
export function PartsTable({ parts, currency }: { parts: Part[]; currency: string }) {
  const hasPrices = parts.some((p) => p.sellPriceMinor !== undefined);
  const hasCosts = parts.some((p) => p.unitCostMinor !== undefined);
  return (
    <div className="overflow-x-auto rounded-lg border border-graphite-300 bg-white">
      <table className="w-full min-w-[40rem] text-sm">
        <caption className="sr-only">Parts, with stock on hand{hasPrices ? ' and prices' : ''}</caption>
        <thead className="border-b border-graphite-300 bg-graphite-100">
          <tr>
            <th scope="col" className={th}>Part</th>
            <th scope="col" className={th}>SKU</th>
            <th scope="col" className={th}>Supplier</th>
            <th scope="col" className={`${th} text-right`}>On hand</th>
            <th scope="col" className={`${th} text-right`}>Reorder at</th>
            {hasPrices && <th scope="col" className={`${th} text-right`}>Sell price</th>}
            {hasCosts && <th scope="col" className={`${th} text-right`}>Average cost</th>}
            {hasCosts && <th scope="col" className={`${th} text-right`}>Stock value</th>}
          </tr>
        </thead>
        <tbody>
          {parts.map((part) => (
            <tr key={part.id} className="border-b border-graphite-200 last:border-0">
              <th scope="row" className="px-3 py-2 text-left font-normal">
                <TextLink to={paths.part.build(part.id)}>{part.name}</TextLink>
                {!part.isActive && <span className="ml-2 text-graphite-600">(not in use)</span>}
              </th>
              <td className="px-3 py-2 font-mono text-xs">{part.sku}</td>
              <td className="px-3 py-2 text-graphite-700">{part.supplier || '—'}</td>
              <td className={num}>
                <span className="inline-flex flex-wrap items-center justify-end gap-2">
                  {part.isLowStock && <LowStockBadge />}
                  {quantityWithUnit(part.onHandMilli, part.unit)}
                </span>
              </td>
              <td className={`${num} text-graphite-700`}>{part.reorderLevelMilli === 0 ? '—' : quantityWithUnit(part.reorderLevelMilli, part.unit)}</td>
              {hasPrices && <td className={num}>{priceText(part, currency) ?? '—'}</td>}
              {hasCosts && <td className={num}>{part.averageUnitCostMinor != null ? formatMinor(part.averageUnitCostMinor, currency) : '—'}</td>}
              {hasCosts && <td className={num}>{part.stockValueMinor !== undefined ? formatMinor(part.stockValueMinor, currency) : '—'}</td>}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
