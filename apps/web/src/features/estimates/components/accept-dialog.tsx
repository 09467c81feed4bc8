import { useState } from 'react';
import { optionChoiceProblems, type Estimate } from '@keybed/shared';
import { ConfirmDialog } from '@/components/confirm-dialog';
import { formatMinor } from '@/lib/money';
import { choicesOf } from '../lib/estimate-draft';
import { estimateName } from '../lib/estimate-labels';

interface AcceptDialogProps {
  estimate: Estimate;
  isOpen: boolean;
  isPending: boolean;
  onAccept: (optionIds: string[]) => void;
  onCancel: () => void;
}

/** Records the client's yes, with the option they chose for each question. */
export function AcceptDialog({ estimate, isOpen, isPending, onAccept, onCancel }: AcceptDialogProps) {
  const [picked, setPicked] = useState<Record<string, string>>({});
  const [problems, setProblems] = useState<string[]>([]);
  const choices = choicesOf(estimate.options);
  const idOf = (key: string) => estimate.options.find((o) => o.key === key)!.id;

  function confirm() {
    const ids = Object.values(picked);
    const found = optionChoiceProblems(estimate.options, ids);
    setProblems(found);
    if (found.length === 0) onAccept(ids);
  }

  return (
    <ConfirmDialog
      isOpen={isOpen}
      title={`Accept ${estimateName(estimate).toLowerCase()} for the client`}
      confirmLabel="Accept for the client"
      isDestructive={false}
      isPending={isPending}
      onConfirm={confirm}
      onCancel={() => (setProblems([]), onCancel())}
    >
      <p>{estimate.kind === 'variation' ? 'The extra work joins the job’s budget and price.' : 'Its labour sets the tasks’ budgeted hours and its price becomes the job’s budget. A job waiting for the client’s answer joins the board in its first stage.'}</p>
      {choices.map((c) => (
        <fieldset key={c.choice} className="mt-3">
          <legend className="font-semibold text-ink">{c.choice}: which did the client choose?</legend>
          {c.options.map((o) => {
            const stored = estimate.options.find((s) => s.key === o.key)!;
            return (
              <label key={o.key} className="flex min-h-10 items-center gap-2 text-ink">
                <input type="radio" name={`accept-${c.choice}`} className="size-5 accent-walnut" checked={picked[c.choice] === idOf(o.key)} onChange={() => setPicked((p) => ({ ...p, [c.choice]: idOf(o.key) }))} />
                {o.name}
                {stored.netMinor !== undefined && <span className="text-graphite-600 tabular-figures">({formatMinor(stored.netMinor, estimate.currency)} ex VAT)</span>}
              </label>
            );
          })}
        </fieldset>
      ))}
      {problems.length > 0 && (
        <div role="alert">
          <ul className="mt-2 list-disc pl-5 text-sm font-semibold text-damper">
            {problems.map((p) => <li key={p}>{p}</li>)}
          </ul>
        </div>
      )}
    </ConfirmDialog>
  );
}
