import { useId, useRef, useState } from 'react';
import { useQueryClient } from '@tanstack/react-query';
import type { WallPart, WallTask } from '@keybed/shared';
import { wallKeys } from '../api/keys';
import type { LogPartOutcome } from '../hooks/use-technician-session';
import type { PartUse } from '../lib/part-messages';
import { quantityText } from '../lib/part-quantity';
import { defaultPartTask } from '../lib/wall-parts';
import { PartPicker } from './part-picker';
import { QuantityForm } from './quantity-form';
import { TaskPicker } from './task-picker';

interface LogPartStepProps {
  tasks: readonly WallTask[];
  /** The task they are on: parts go to it unless they choose another. */
  runningTaskId: string | undefined;
  isBusy: boolean;
  onLog: (use: PartUse) => Promise<LogPartOutcome>;
  /** Back to their tasks: after a part is logged, or when they cancel. */
  onDone: () => void;
}

const secondaryClasses = 'min-h-16 shrink-0 rounded-xl border-2 border-graphite-400 bg-white px-6 text-wall-sm font-semibold active:bg-graphite-200 disabled:opacity-60';

/** What has been chosen so far, with the button to choose again. */
function Chosen({ label, value, detail, action, isBusy, onChange }: { label: string; value: string; detail: string; action: string; isBusy: boolean; onChange: () => void }) {
  return (
    <div className="flex flex-wrap items-center gap-x-6 gap-y-2 rounded-xl border-2 border-graphite-300 bg-white px-5 py-2">
      <p className="min-w-0 flex-1 text-xl text-graphite-700">
        {label}: <span className="text-wall-sm font-bold text-ink">{value}</span>
        <span className="block">{detail}</span>
      </p>
      <button type="button" className={secondaryClasses} disabled={isBusy} onClick={onChange}>
        {action}
      </button>
    </div>
  );
}

/** Logging a part used: the task (the one they are on, unless they change it), the part, how much. */
export function LogPartStep({ tasks, runningTaskId, isBusy, onLog, onDone }: LogPartStepProps) {
  const headingId = useId();
  const queryClient = useQueryClient();
  const [task, setTask] = useState(() => defaultPartTask(tasks, runningTaskId));
  const [isChoosingTask, setIsChoosingTask] = useState(task === undefined);
  const [part, setPart] = useState<WallPart | undefined>();
  const [refusal, setRefusal] = useState<string | null>(null);
  const isSending = useRef(false);
  const stage = isChoosingTask || !task ? 'task' : !part ? 'part' : 'quantity';

  const chooseTask = (next: WallTask) => (setTask(next), setIsChoosingTask(false), setRefusal(null));
  const choosePart = (next: WallPart | undefined) => (setPart(next), setRefusal(null));
  const log = async (quantityMilli: number) => {
    if (!task || !part || isSending.current) return;
    isSending.current = true;
    const outcome = await onLog({ task, part, quantityMilli }).finally(() => (isSending.current = false));
    if (outcome.kind !== 'ended') void queryClient.invalidateQueries({ queryKey: wallKeys.parts() });
    if (outcome.kind === 'logged') onDone();
    if (outcome.kind === 'refused') setRefusal(outcome.text);
  };

  return (
    <section aria-labelledby={headingId} className="space-y-5">
      <div className="flex flex-wrap items-center gap-4">
        <h3 id={headingId} className="text-wall font-bold">
          Log a part
        </h3>
        <button type="button" className={`${secondaryClasses} ml-auto`} disabled={isBusy} onClick={onDone}>
          Cancel
        </button>
      </div>
      {refusal && (
        <p role="alert" className="rounded-xl border-4 border-damper bg-damper-light p-5 text-xl font-semibold">
          {refusal}
        </p>
      )}
      {stage !== 'task' && task && (
        <Chosen label="Task" value={task.title} detail={task.job.title} action="Change task" isBusy={isBusy} onChange={() => setIsChoosingTask(true)} />
      )}
      {stage === 'quantity' && part && (
        <Chosen label="Part" value={part.name} detail={`Unit: ${part.unit} · ${part.onHandMilli > 0 ? `${quantityText(part.onHandMilli, part.unit)} on hand` : 'none on hand'}`} action="Change part" isBusy={isBusy} onChange={() => choosePart(undefined)} />
      )}
      {stage === 'task' && (
        <>
          <p className="text-wall-sm font-semibold">Which task is the part for?</p>
          <TaskPicker tasks={tasks} runningTaskId={runningTaskId} canPickRunning isBusy={isBusy} onPick={chooseTask} />
        </>
      )}
      {stage === 'part' && <PartPicker isBusy={isBusy} onPick={choosePart} />}
      {stage === 'quantity' && part && <QuantityForm key={part.id} part={part} isBusy={isBusy} onSubmit={(q) => void log(q)} />}
    </section>
  );
}
