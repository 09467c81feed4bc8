import type { Estimate, EstimateLine } from '@keybed/shared';
import { formatMinor } from '@/lib/money';
import { choicesOf } from '../lib/estimate-draft';
import { LINE_KIND_LABELS } from '../lib/estimate-draft';
import { lineQuantity } from '../lib/estimate-labels';

const th = 'px-3 py-2 text-left font-semibold';
const num = 'px-3 py-2 text-right tabular-figures';

/** An issued or agreed estimate's lines, grouped as the client sees them; money columns only when sent. */
export function EstimateLines({ estimate }: { estimate: Estimate }) {
  const hasPrices = estimate.lines.some((l) => l.amountMinor !== undefined);
  const hasCosts = estimate.lines.some((l) => l.costMinor !== undefined);
  const columns = 2 + (hasPrices ? 2 : 0) + (hasCosts ? 1 : 0);
  const money = (minor: number | null | undefined) => (minor === null || minor === undefined ? '—' : formatMinor(minor, estimate.currency));
  const groups: Array<{ label: string; lines: EstimateLine[]; isLeftOut: boolean }> = [
    { label: 'Included in every version', lines: estimate.lines.filter((l) => l.optionId === null), isLeftOut: false },
  ];
  for (const choice of choicesOf(estimate.options)) {
    for (const option of choice.options) {
      const stored = estimate.options.find((o) => o.key === option.key)!;
      const isLeftOut = estimate.status === 'accepted' && !stored.isChosen;
      const marker = estimate.status === 'accepted' ? (stored.isChosen ? ' (chosen)' : ' (not chosen)') : '';
      groups.push({ label: `${choice.choice}: ${option.name}${marker}`, lines: estimate.lines.filter((l) => l.optionId === stored.id), isLeftOut });
    }
  }
  return (
    <div className="overflow-x-auto rounded-lg border border-graphite-300 bg-white">
      <table className="w-full min-w-[36rem] text-sm">
        <caption className="sr-only">Lines of the estimate, by option</caption>
        <thead className="border-b border-graphite-300 bg-graphite-100">
          <tr>
            <th scope="col" className={th}>Line</th>
            <th scope="col" className={`${th} text-right`}>Hours or quantity</th>
            {hasPrices && <th scope="col" className={`${th} text-right`}>Price each</th>}
            {hasPrices && <th scope="col" className={`${th} text-right`}>Amount</th>}
            {hasCosts && <th scope="col" className={`${th} text-right`}>Expected cost</th>}
          </tr>
        </thead>
        {groups
          .filter((g) => g.lines.length > 0 || g.label !== groups[0]!.label)
          .map((group) => (
            <tbody key={group.label} className={group.isLeftOut ? 'text-graphite-600' : undefined}>
              <tr className="border-b border-graphite-200 bg-paper">
                <th scope="colgroup" colSpan={columns} className="px-3 py-1.5 text-left font-semibold">
                  {group.label}
                </th>
              </tr>
              {group.lines.map((line) => (
                <tr key={line.id} className="border-b border-graphite-200">
                  <td className="px-3 py-2">
                    <span className="mr-2 rounded-sm bg-graphite-200 px-1 text-xs font-semibold text-graphite-700">{LINE_KIND_LABELS[line.kind]}</span>
                    {line.description}
                    {line.task && line.task.title !== line.description && <span className="block text-graphite-600">Task: {line.task.title}</span>}
                  </td>
                  <td className={num}>{lineQuantity(line)}</td>
                  {hasPrices && <td className={num}>{money(line.unitPriceMinor)}</td>}
                  {hasPrices && <td className={num}>{money(line.amountMinor)}</td>}
                  {hasCosts && <td className={num}>{line.kind === 'labour' ? 'by the hours worked' : money(line.costMinor)}</td>}
                </tr>
              ))}
              {group.lines.length === 0 && (
                <tr className="border-b border-graphite-200">
                  <td colSpan={columns} className="px-3 py-2 text-graphite-600">No lines.</td>
                </tr>
              )}
            </tbody>
          ))}
      </table>
    </div>
  );
}
