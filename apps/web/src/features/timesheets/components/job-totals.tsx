import type { TimesheetWeek } from '@keybed/shared';
import { formatHoursMinutes } from '@keybed/shared';

/** Minutes per job and task across the week. */
export function JobTotals({ byJob }: { byJob: TimesheetWeek['byJob'] }) {
  if (byJob.length === 0) return null;
  return (
    <table className="w-full rounded-lg border border-graphite-300 bg-white text-left">
      <caption className="sr-only">Time per job and task</caption>
      <thead>
        <tr className="text-sm text-graphite-600">
          <th scope="col" className="px-4 py-2 font-semibold">Job and task</th>
          <th scope="col" className="px-4 py-2 text-right font-semibold">Hours</th>
        </tr>
      </thead>
      {byJob.map(({ job, minutes, tasks }) => (
        <tbody key={job.id} className="border-t border-graphite-200">
          <tr>
            <th scope="row" className="px-4 pt-2 font-semibold">{job.title}</th>
            <td className="px-4 pt-2 text-right font-semibold tabular-figures">{formatHoursMinutes(minutes)}</td>
          </tr>
          {tasks.map(({ task, minutes: taskMinutes }) => (
            <tr key={task.id} className="text-graphite-700">
              <th scope="row" className="py-0.5 pr-4 pl-8 font-normal">{task.title}</th>
              <td className="px-4 py-0.5 text-right tabular-figures">{formatHoursMinutes(taskMinutes)}</td>
            </tr>
          ))}
          <tr aria-hidden="true"><td className="pb-2" colSpan={2} /></tr>
        </tbody>
      ))}
    </table>
  );
}
