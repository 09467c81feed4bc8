import type { JobStageEvent } from '@keybed/shared';
import { formatDateTime, formatElapsed } from '@/lib/format';
import { stageSpells } from '../lib/stage-durations';

function What({ event }: { event: JobStageEvent }) {
  if (!event.fromStage) return <>Started in <strong>{event.toStage.name}</strong></>;
  return (
    <>
      {event.fromStage.name} <span aria-hidden="true">→</span>
      <span className="sr-only"> to </span> <strong>{event.toStage.name}</strong>
    </>
  );
}

/** Every stage the job has been through, oldest first, with who moved it and how long it stayed. */
export function StageHistory({ history, now = new Date() }: { history: JobStageEvent[]; now?: Date }) {
  if (history.length === 0) return <p className="text-graphite-600">No stage changes recorded yet.</p>;
  return (
    <ol aria-label="Stage history" className="relative space-y-4 border-l-2 border-graphite-300 pl-5">
      {stageSpells(history, now).map(({ event, durationMs, isCurrent }) => (
        <li key={event.id} className="relative">
          <span aria-hidden="true" className={`absolute top-1.5 -left-[1.6rem] size-3 rounded-full ${isCurrent ? 'bg-walnut' : 'bg-graphite-400'}`} />
          <p>
            <What event={event} />
          </p>
          <p className="text-sm text-graphite-600">
            {event.by ? event.by.name : 'Someone no longer in the workshop'} ·{' '}
            <time dateTime={event.at} className="tabular-figures">{formatDateTime(event.at)}</time>
          </p>
          <p className="text-sm tabular-figures">
            {isCurrent ? `In ${event.toStage.name} for ${formatElapsed(durationMs)} so far` : `${formatElapsed(durationMs)} in ${event.toStage.name}`}
          </p>
        </li>
      ))}
    </ol>
  );
}
