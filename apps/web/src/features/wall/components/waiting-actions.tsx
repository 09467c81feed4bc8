import { useId, useState } from 'react';
import { cx } from '@/lib/cx';
import type { QueuedClockAction } from '../lib/clock-queue';

const timeFormat = (timeZone: string) => new Intl.DateTimeFormat('en-GB', { hour: '2-digit', minute: '2-digit', hourCycle: 'h23', timeZone });

interface WaitingActionsProps {
  actions: readonly QueuedClockAction[];
  timeZone: string;
  isDurable: boolean;
  onDismiss: (key: string) => void;
}

const describe = (a: QueuedClockAction) => (a.kind === 'clock-on' ? `Clock on to ${a.task?.title ?? 'a task'}` : 'Clock off');
const firstName = (name: string) => name.split(/\s+/)[0] ?? name;

/** Where a waiting action stands: it goes by itself with its grant, or it needs its technician's PIN. */
const waitingState = (a: QueuedClockAction) => (a.grant ? 'Sends by itself when the network is back' : `Waits for ${firstName(a.technician.name)} to enter a PIN here`);

/** "N actions waiting to send": opens the list of what this screen holds and why. */
export function WaitingActions({ actions, timeZone, isDurable, onDismiss }: WaitingActionsProps) {
  const [isOpen, setIsOpen] = useState(false);
  const listId = useId();
  const waiting = actions.filter((a) => a.state === 'waiting').length;
  const refused = actions.length - waiting;
  if (actions.length === 0) return null;
  const format = timeFormat(timeZone);
  const label = [waiting > 0 && `${waiting} ${waiting === 1 ? 'action' : 'actions'} waiting to send`, refused > 0 && `${refused} not accepted`].filter(Boolean).join(' · ');
  return (
    <div className="relative">
      <button
        type="button"
        aria-expanded={isOpen}
        aria-controls={listId}
        onClick={() => setIsOpen((open) => !open)}
        className={cx('min-h-16 rounded-xl px-5 text-xl font-bold', refused > 0 ? 'bg-damper text-white' : 'bg-spruce text-ink')}
      >
        {label}
      </button>
      <div role="status" className="sr-only">{label}</div>
      {isOpen && (
        <div id={listId} className="absolute right-0 z-30 mt-2 w-[min(44rem,90vw)] space-y-3 rounded-xl border-2 border-graphite-400 bg-white p-5 text-ink shadow-xl">
          <p className="text-xl">
            Each waits on this screen and is sent in order, with the time it was made. Actions made after a PIN check here go by themselves when the network is back; the
            others go when their technician next enters a PIN here.
            {!isDurable && ' This browser does not keep them if the page is closed: keep this page open.'}
          </p>
          <ul className="space-y-2">
            {actions.map((a) => (
              <li key={a.key} className={cx('flex flex-wrap items-center gap-x-4 gap-y-1 rounded-lg border-2 p-3 text-xl', a.state === 'refused' ? 'border-damper' : 'border-graphite-300')}>
                <span className="font-semibold tabular-figures">{format.format(new Date(a.at))}</span>
                <span className="font-semibold">{a.technician.name}</span>
                <span>{describe(a)}</span>
                {a.state === 'waiting' && <span className="basis-full text-graphite-700">{waitingState(a)}</span>}
                {a.state === 'refused' && (
                  <>
                    <span className="basis-full text-damper">Not accepted: {a.refusal?.message}</span>
                    <button type="button" onClick={() => onDismiss(a.key)} className="min-h-16 rounded-xl border-2 border-graphite-400 px-5 font-semibold">
                      Dismiss<span className="sr-only"> {a.technician.name}’s {describe(a).toLowerCase()} at {format.format(new Date(a.at))}</span>
                    </button>
                  </>
                )}
              </li>
            ))}
          </ul>
        </div>
      )}
    </div>
  );
}
