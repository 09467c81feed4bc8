import { formatQuantityMilli, type JobCosting } from '@keybed/shared';
import { cx } from '@/lib/cx';
import { formatMinor } from '@/lib/money';

const th = 'px-3 py-2 text-left font-semibold';
const num = 'px-3 py-2 text-right tabular-figures';

/** Each part used on the job against what the agreed estimates budgeted. */
export function JobPartsTable({ costing }: { costing: JobCosting }) {
  if (costing.parts.length === 0) return <p className="text-graphite-600">No parts budgeted or used yet.</p>;
  const hasMoney = costing.parts.some((p) => p.costMinor !== undefined);
  const m = (minor: number | undefined) => (minor === undefined ? '—' : formatMinor(minor, costing.currency));
  return (
    <div className="overflow-x-auto rounded-lg border border-graphite-300 bg-white">
      <table className="w-full min-w-[32rem] text-sm">
        <caption className="sr-only">Parts used against the budget</caption>
        <thead className="border-b border-graphite-300 bg-graphite-100">
          <tr>
            <th scope="col" className={th}>Part</th>
            <th scope="col" className={`${th} text-right`}>Budgeted</th>
            <th scope="col" className={`${th} text-right`}>Used</th>
            {hasMoney && <th scope="col" className={`${th} text-right`}>Budgeted cost</th>}
            {hasMoney && <th scope="col" className={`${th} text-right`}>Cost of use</th>}
          </tr>
        </thead>
        <tbody>
          {costing.parts.map((p) => (
            <tr key={p.partId} className="border-b border-graphite-200 last:border-0">
              <th scope="row" className="px-3 py-2 text-left font-normal">
                {p.name} <span className="font-mono text-xs text-graphite-600">{p.sku}</span>
              </th>
              <td className={num}>{formatQuantityMilli(p.budgetedQuantityMilli)} {p.unit}</td>
              <td className={cx(num, p.usedQuantityMilli > p.budgetedQuantityMilli && 'font-semibold text-damper')}>
                {formatQuantityMilli(p.usedQuantityMilli)} {p.unit}
              </td>
              {hasMoney && <td className={num}>{m(p.budgetCostMinor)}</td>}
              {hasMoney && <td className={num}>{m(p.costMinor)}</td>}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
