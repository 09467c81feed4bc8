import { formatHoursMinutes, formatQuantityMilli, type JobCosting } from '@keybed/shared';
import { cx } from '@/lib/cx';
import { formatMinor } from '@/lib/money';

const th = 'px-3 py-2 text-left font-semibold';
const num = 'px-3 py-2 text-right tabular-figures';
const STATUS = { todo: 'To do', in_progress: 'In progress', done: 'Done' } as const;

/** Per task: hours against the estimate and the parts used; costs when the API sends them. */
export function TaskCostsTable({ costing }: { costing: JobCosting }) {
  const hasMoney = costing.tasks.some((t) => t.money !== undefined);
  const m = (minor: number) => formatMinor(minor, costing.currency);
  return (
    <div className="overflow-x-auto rounded-lg border border-graphite-300 bg-white">
      <table className="w-full min-w-[40rem] text-sm">
        <caption className="sr-only">Each task’s hours{hasMoney ? ' and costs' : ' and parts'}</caption>
        <thead className="border-b border-graphite-300 bg-graphite-100">
          <tr>
            <th scope="col" className={th}>Task</th>
            <th scope="col" className={`${th} text-right`}>Estimated</th>
            <th scope="col" className={`${th} text-right`}>Logged</th>
            {hasMoney && <th scope="col" className={`${th} text-right`}>Labour cost</th>}
            {hasMoney && <th scope="col" className={`${th} text-right`}>Parts cost</th>}
            {hasMoney && <th scope="col" className={`${th} text-right`}>Cost to date</th>}
          </tr>
        </thead>
        <tbody>
          {costing.tasks.map((t) => (
            <tr key={t.taskId} className="border-b border-graphite-200 align-top last:border-0">
              <th scope="row" className="px-3 py-2 text-left font-normal">
                <span className="font-semibold">{t.title}</span> <span className="text-graphite-600">· {STATUS[t.status]}</span>
                {t.parts.length > 0 && (
                  <ul className="mt-1 text-graphite-700">
                    {t.parts.map((p) => (
                      <li key={p.partId} className="tabular-figures">
                        {formatQuantityMilli(p.quantityMilli)} {p.unit} {p.name}
                        {p.costMinor !== undefined && <span className="text-graphite-600"> · {m(p.costMinor)}</span>}
                      </li>
                    ))}
                  </ul>
                )}
              </th>
              <td className={num}>{t.estimatedMinutes === null ? '—' : formatHoursMinutes(t.estimatedMinutes)}</td>
              <td className={cx(num, t.isOverEstimate && 'font-semibold text-damper')}>
                {formatHoursMinutes(t.actualMinutes)}
                {t.isOverEstimate && <span className="block text-xs">{formatHoursMinutes(t.minutesOverEstimate)} over</span>}
              </td>
              {hasMoney && <td className={num}>{t.money ? m(t.money.labourCostMinor) : '—'}</td>}
              {hasMoney && <td className={num}>{t.money ? m(t.money.partsCostMinor) : '—'}</td>}
              {hasMoney && <td className={num}>{t.money ? m(t.money.costToDateMinor) : '—'}</td>}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
