import { useState, type FormEvent, type ReactNode } from 'react';
import { CorrectionInput, type TimeEntry } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { TextInput } from '@/components/text-input';
import { Textarea } from '@/components/textarea';
import { validateForm } from '@/lib/form';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { useCorrectEntry } from '../api/correct-entry';
import { fromLocalInput, toLocalInput } from '../lib/week';

/** What the page supplies to choose another task of the entry's job. */
export interface TaskFieldProps {
  jobId: string;
  value: string;
  onChange: (taskId: string) => void;
  error?: string | undefined;
}

interface CorrectionFormProps {
  entry: TimeEntry;
  timeZone: string;
  renderTaskField: (props: TaskFieldProps) => ReactNode;
  onDone: () => void;
}

/** New start, end or task for an entry, with the reason kept in its audit trail. Only changed values are sent. */
export function CorrectionForm({ entry, timeZone, renderTaskField, onDone }: CorrectionFormProps) {
  const correct = useCorrectEntry();
  const form = useFormErrors();
  const original = { start: toLocalInput(entry.startedAt, timeZone), end: entry.endedAt ? toLocalInput(entry.endedAt, timeZone) : '' };
  const [start, setStart] = useState(original.start);
  const [end, setEnd] = useState(original.end);
  const [taskId, setTaskId] = useState(entry.task.id);
  const [reason, setReason] = useState('');

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const startedAt = start !== original.start ? fromLocalInput(start, timeZone) : undefined;
    const endedAt = end !== original.end && end !== '' ? fromLocalInput(end, timeZone) : undefined;
    if (start !== original.start && !startedAt) return form.showFields({ startedAt: ['Enter a date and time'] });
    if (end !== original.end && end !== '' && !endedAt) return form.showFields({ endedAt: ['Enter a date and time'] });
    const result = validateForm(CorrectionInput, { reason, startedAt, endedAt, taskId: taskId !== entry.task.id ? taskId : undefined });
    if (result.fields) return form.showFields(result.fields);
    form.reset();
    correct.mutate(
      { entryId: entry.id, correction: result.data },
      {
        onSuccess: () => {
          showToast('success', `Corrected ${entry.technician.name}’s entry on “${entry.task.title}”.`);
          onDone();
        },
        onError: (error) => void form.showApiFields(error),
      },
    );
  }

  const edit = (name: string, set: (value: string) => void) => (value: string) => {
    set(value);
    form.clearField(name);
  };
  return (
    <form ref={form.formRef} noValidate onSubmit={submit} aria-label={`Correct the entry on ${entry.task.title}`} className="mt-3 space-y-3 rounded-md border border-graphite-300 bg-graphite-100 p-4">
      <FormError error={correct.error} except={['validation_failed']} />
      <div className="flex flex-wrap gap-4">
        <Field label="Start" error={form.errorFor('startedAt')}>
          {(control) => <TextInput {...control} type="datetime-local" value={start} onChange={(e) => edit('startedAt', setStart)(e.target.value)} className="w-56 tabular-figures" />}
        </Field>
        <Field label="End" hint={entry.endedAt ? undefined : 'Leave empty to keep it running'} error={form.errorFor('endedAt')}>
          {(control) => <TextInput {...control} type="datetime-local" value={end} onChange={(e) => edit('endedAt', setEnd)(e.target.value)} className="w-56 tabular-figures" />}
        </Field>
      </div>
      {renderTaskField({ jobId: entry.job.id, value: taskId, onChange: edit('taskId', setTaskId), error: form.errorFor('taskId') })}
      <Field label="Reason" hint="Kept with the entry, beside the old and new values" error={form.errorFor('reason')}>
        {(control) => <Textarea {...control} rows={2} value={reason} onChange={(e) => edit('reason', setReason)(e.target.value)} />}
      </Field>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" isPending={correct.isPending}>
          Save the correction
        </Button>
        <Button variant="secondary" onClick={onDone} disabled={correct.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
