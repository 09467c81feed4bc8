import { formatHoursMinutes, type MarginsReport } from '@keybed/shared';
import { formatPercent } from '@/lib/money';

const th = 'px-3 py-2 text-left font-semibold';
const num = 'px-3 py-2 text-right tabular-figures';
const percent = (ratio: number | null) => formatPercent(ratio === null ? null : ratio * 100);

/** Each technician's hours on job tasks against the hours of the period's working days. */
export function UtilisationTable({ utilisation }: { utilisation: MarginsReport['utilisation'] }) {
  if (utilisation.technicians.length === 0) return <p className="text-graphite-600">Nobody logged time on job tasks in this period.</p>;
  return (
    <div className="overflow-x-auto rounded-lg border border-graphite-300 bg-white">
      <table className="w-full min-w-[28rem] text-sm">
        <caption className="px-3 pt-3 text-left text-sm text-graphite-600">Hours on job tasks ÷ hours in the working days of the period, up to today.</caption>
        <thead className="border-b border-graphite-300 bg-graphite-100">
          <tr>
            <th scope="col" className={th}>Technician</th>
            <th scope="col" className={`${th} text-right`}>On job tasks</th>
            <th scope="col" className={`${th} text-right`}>Working hours</th>
            <th scope="col" className={`${th} text-right`}>Utilisation</th>
          </tr>
        </thead>
        <tbody>
          {utilisation.technicians.map((t) => (
            <tr key={t.id} className="border-b border-graphite-200">
              <th scope="row" className="px-3 py-2 text-left font-normal">{t.name}</th>
              <td className={num}>{formatHoursMinutes(t.workedMinutes)}</td>
              <td className={num}>{formatHoursMinutes(t.availableMinutes)}</td>
              <td className={num}>{percent(t.utilisation)}</td>
            </tr>
          ))}
        </tbody>
        <tfoot className="border-t-2 border-graphite-400 font-bold">
          <tr>
            <th scope="row" className="px-3 py-2 text-left">Everyone</th>
            <td className={num}>{formatHoursMinutes(utilisation.total.workedMinutes)}</td>
            <td className={num}>{formatHoursMinutes(utilisation.total.availableMinutes)}</td>
            <td className={num}>{percent(utilisation.total.utilisation)}</td>
          </tr>
        </tfoot>
      </table>
    </div>
  );
}
