import { formatQuantityMilli, type StockMovement } from '@keybed/shared';
import { EmptyState } from '@/components/empty-state';
import { TextLink } from '@/components/text-link';
import { paths } from '@/config/paths';
import { cx } from '@/lib/cx';
import { formatDateTime } from '@/lib/format';
import { formatMinor } from '@/lib/money';
import { MOVEMENT_LABELS } from '../lib/part-form';

const th = 'px-3 py-2 text-left font-semibold';

/** Every movement of one part, newest first; costs only when the API sends them (the owner). */
export function StockLedger({ movements, unit, currency }: { movements: StockMovement[]; unit: string; currency: string }) {
  if (movements.length === 0) {
    return (
      <EmptyState title="No stock movements yet" headingLevel="h3">
        <p>Record the first delivery to put this part in stock.</p>
      </EmptyState>
    );
  }
  const hasCosts = movements.some((m) => m.unitCostMinor !== undefined);
  return (
    <div className="overflow-x-auto rounded-lg border border-graphite-300 bg-white">
      <table className="w-full min-w-[44rem] text-sm">
        <caption className="sr-only">Stock movements, newest first</caption>
        <thead className="border-b border-graphite-300 bg-graphite-100">
          <tr>
            <th scope="col" className={th}>When</th>
            <th scope="col" className={th}>Movement</th>
            <th scope="col" className={`${th} text-right`}>Quantity ({unit})</th>
            <th scope="col" className={th}>Job and task, or reason</th>
            <th scope="col" className={th}>By</th>
            {hasCosts && <th scope="col" className={`${th} text-right`}>Cost each</th>}
            {hasCosts && <th scope="col" className={`${th} text-right`}>Value</th>}
          </tr>
        </thead>
        <tbody>
          {movements.map((m) => (
            <tr key={m.id} className="border-b border-graphite-200 align-top last:border-0">
              <td className="px-3 py-2 whitespace-nowrap tabular-figures">
                <time dateTime={m.at}>{formatDateTime(m.at)}</time>
              </td>
              <td className="px-3 py-2">{MOVEMENT_LABELS[m.kind]}</td>
              <td className={cx('px-3 py-2 text-right font-semibold tabular-figures', m.quantityMilli < 0 ? 'text-damper' : 'text-felt')}>
                {m.quantityMilli > 0 ? '+' : ''}
                {formatQuantityMilli(m.quantityMilli)}
              </td>
              <td className="px-3 py-2">
                {m.job && (
                  <span className="block">
                    <TextLink to={paths.job.build(m.job.id)}>{m.job.title}</TextLink>
                    {m.task && <span className="text-graphite-700"> · {m.task.title}</span>}
                  </span>
                )}
                {m.reason && <span className="block text-graphite-700">{m.reason}</span>}
                {!m.job && !m.reason && <span className="text-graphite-600">—</span>}
              </td>
              <td className="px-3 py-2">{m.by?.name ?? '—'}</td>
              {hasCosts && <td className="px-3 py-2 text-right whitespace-nowrap tabular-figures">{m.unitCostMinor !== undefined ? formatMinor(m.unitCostMinor, currency) : '—'}</td>}
              {hasCosts && <td className="px-3 py-2 text-right whitespace-nowrap tabular-figures">{m.valueMinor !== undefined ? formatMinor(m.valueMinor, currency) : '—'}</td>}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
