import { useState, type FormEvent } from 'react';
import { z } from 'zod';
import { formatQuantityMilli, parseQuantityMilli, type Part } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { Select } from '@/components/select';
import { TextInput } from '@/components/text-input';
import { errorDetail, isApiError } from '@/lib/api-client';
import { parseQuantityInput } from '@/lib/money';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { useCorrectPartsUsed, useLogPartsUsed } from '../api/log-parts-used';
import { quantityWithUnit } from '../lib/part-form';

export interface TaskChoice {
  id: string;
  title: string;
}

interface LogPartsUsedProps {
  tasks: readonly TaskChoice[];
  parts: readonly Part[];
  /** Owner and foreman may also correct a wrong record, with a reason. */
  canCorrect: boolean;
  onRecorded?: () => void;
}

const partLabel = (p: Part) => `${p.name} (${p.sku}) · ${quantityWithUnit(p.onHandMilli, p.unit)} on hand`;

/** "Not enough in stock: 1.5 m on hand", from the API's refusal. */
function stockProblem(error: unknown, unit: string): string | undefined {
  if (!isApiError(error) || error.code !== 'insufficient_stock') return undefined;
  const onHand = errorDetail(error, 'onHandMilli', z.number());
  return onHand === undefined ? 'Not enough in stock for that' : `Not enough in stock: ${formatQuantityMilli(Math.max(0, onHand))} ${unit} on hand`;
}

/** Parts taken from stock for a task, and (for the owner and foreman) corrections with a reason. */
export function LogPartsUsed({ tasks, parts, canCorrect, onRecorded }: LogPartsUsedProps) {
  const [mode, setMode] = useState<'use' | 'correct'>('use');
  if (tasks.length === 0) return <p className="text-graphite-600">There are no tasks here to log parts against yet.</p>;
  if (parts.length === 0) return <p className="text-graphite-600">The parts catalogue is empty: the owner adds parts first.</p>;
  return (
    <div className="space-y-3 rounded-lg border border-graphite-300 bg-white p-4">
      {canCorrect && (
        <div role="radiogroup" aria-label="What to record" className="flex flex-wrap gap-x-4">
          {(['use', 'correct'] as const).map((m) => (
            <label key={m} className="inline-flex min-h-9 items-center gap-2 font-semibold">
              <input type="radio" name="parts-mode" className="size-4 accent-walnut" checked={mode === m} onChange={() => setMode(m)} />
              {m === 'use' ? 'Parts used' : 'Correct a record'}
            </label>
          ))}
        </div>
      )}
      <PartsUsedForm key={mode} mode={mode} tasks={tasks} parts={parts} onRecorded={onRecorded} />
    </div>
  );
}

function PartsUsedForm({ mode, tasks, parts, onRecorded }: { mode: 'use' | 'correct'; tasks: readonly TaskChoice[]; parts: readonly Part[]; onRecorded?: (() => void) | undefined }) {
  const log = useLogPartsUsed();
  const correct = useCorrectPartsUsed();
  const mutation = mode === 'use' ? log : correct;
  const form = useFormErrors();
  const [taskId, setTaskId] = useState(tasks[0]!.id);
  const [partId, setPartId] = useState(parts[0]!.id);
  const [quantity, setQuantity] = useState('');
  const [reason, setReason] = useState('');
  const part = parts.find((p) => p.id === partId) ?? parts[0]!;

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const done = () => {
      setQuantity('');
      setReason('');
      onRecorded?.();
    };
    const onError = (error: unknown) => {
      const problem = stockProblem(error, part.unit);
      if (problem) return form.showFields({ quantityMilli: [problem] });
      form.showApiFields(error);
    };
    if (mode === 'use') {
      const q = parseQuantityInput(quantity);
      if (!q.ok) return form.showFields({ quantityMilli: [q.message] });
      form.reset();
      return log.mutate(
        { taskId, input: { partId, quantityMilli: q.value } },
        { onSuccess: () => (showToast('success', `Logged ${quantityWithUnit(q.value, part.unit)} of ${part.name}.`), done()), onError },
      );
    }
    const milli = parseQuantityMilli(quantity.trim().replace(',', '.'));
    const fields = {
      ...(milli === null || milli === 0 ? { quantityMilli: ['Write the change, like 1 if more was used or -0.5 if less'] } : {}),
      ...(reason.trim().length < 3 ? { reason: ['Say why, in a few words'] } : {}),
    };
    if (Object.keys(fields).length > 0 || milli === null) return form.showFields(fields);
    form.reset();
    correct.mutate(
      { taskId, input: { partId, quantityMilli: milli, reason: reason.trim() } },
      { onSuccess: () => (showToast('success', `Corrected ${part.name} on the task.`), done()), onError },
    );
  }

  return (
    <form ref={form.formRef} noValidate onSubmit={submit} aria-label={mode === 'use' ? 'Log parts used' : 'Correct parts used'} className="space-y-3">
      <FormError error={mutation.error} except={['validation_failed', 'insufficient_stock']} />
      <div className="grid gap-3 md:grid-cols-[1fr_1fr_10rem]">
        <Field label="Task" error={form.errorFor('taskId')}>
          {(control) => <Select {...control} options={tasks.map((t) => ({ value: t.id, label: t.title }))} value={taskId} onChange={(e) => setTaskId(e.target.value)} />}
        </Field>
        <Field label="Part" error={form.errorFor('partId')}>
          {(control) => <Select {...control} options={parts.map((p) => ({ value: p.id, label: partLabel(p) }))} value={partId} onChange={(e) => setPartId(e.target.value)} />}
        </Field>
        <Field label={mode === 'use' ? `Quantity (${part.unit})` : `Change (${part.unit})`} error={form.errorFor('quantityMilli')}>
          {(control) => <TextInput {...control} inputMode="decimal" className="tabular-figures" value={quantity} onChange={(e) => (setQuantity(e.target.value), form.clearField('quantityMilli'))} />}
        </Field>
      </div>
      {mode === 'correct' && (
        <Field label="Reason" hint="For example: logged 2 m, only 1.5 m was used" error={form.errorFor('reason')}>
          {(control) => <TextInput {...control} value={reason} onChange={(e) => (setReason(e.target.value), form.clearField('reason'))} />}
        </Field>
      )}
      <Button type="submit" isPending={mutation.isPending}>
        {mode === 'use' ? 'Log parts used' : 'Record the correction'}
      </Button>
    </form>
  );
}
