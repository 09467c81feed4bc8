import { useState, type FormEvent } from 'react';
import { CreateTaskInput, UpdateTaskInput, type Task } from '@keybed/shared';
import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { FormError } from '@/components/form-error';
import { Select } from '@/components/select';
import { TextInput } from '@/components/text-input';
import { validateForm } from '@/lib/form';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { useCreateTask } from '../api/create-task';
import { useUpdateTask } from '../api/update-task';
import { estimateText, parseEstimate } from '../lib/estimate';
import { AssigneePicker, type Person } from './assignee-picker';

export interface TaskFormProps {
  jobId: string;
  /** The task being edited; a new task when absent. */
  task?: Task;
  stages: readonly Person[];
  people: readonly Person[];
  /** The stage a new task starts in (the job's current stage). */
  defaultStageId?: string | undefined;
  onDone: () => void;
}

/** Adds a task to the job, or edits one: title, stage, estimate (h:mm) and who is assigned. */
export function TaskForm({ jobId, task, stages, people, defaultStageId, onDone }: TaskFormProps) {
  const create = useCreateTask(jobId);
  const update = useUpdateTask(jobId, { handlesError: true });
  const form = useFormErrors();
  const [title, setTitle] = useState(task?.title ?? '');
  const [stageId, setStageId] = useState(task ? (task.stage?.id ?? '') : (defaultStageId ?? ''));
  const [estimate, setEstimate] = useState(estimateText(task?.estimatedMinutes ?? null));
  const [assigneeIds, setAssigneeIds] = useState<string[]>(task?.assignees.map((a) => a.id) ?? []);
  const mutation = task ? update : create;

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const minutes = parseEstimate(estimate);
    if (!minutes.ok) return form.showFields({ estimatedMinutes: [minutes.message] });
    const values = { title, stageId: stageId || null, estimatedMinutes: minutes.minutes, assigneeIds };
    form.reset();
    const onError = (error: unknown) => void form.showApiFields(error);
    if (task) {
      const result = validateForm(UpdateTaskInput, { version: task.version, ...values });
      if (result.fields) return form.showFields(result.fields);
      update.mutate({ taskId: task.id, changes: result.data }, { onSuccess: (saved) => done(`Saved “${saved.title}”.`), onError });
    } else {
      const result = validateForm(CreateTaskInput, values);
      if (result.fields) return form.showFields(result.fields);
      create.mutate(result.data, { onSuccess: (saved) => done(`Added “${saved.title}”.`), onError });
    }
  }

  function done(message: string) {
    showToast('success', message);
    onDone();
  }

  const stageOptions = [{ value: '', label: 'No stage' }, ...stages.map((s) => ({ value: s.id, label: s.name }))];
  return (
    <form ref={form.formRef} noValidate onSubmit={submit} aria-label={task ? `Edit ${task.title}` : 'New task'} className="space-y-4 rounded-md border border-graphite-300 bg-graphite-100 p-4">
      <FormError error={mutation.error} except={['validation_failed']} />
      <Field label="Task" error={form.errorFor('title')}>
        {(control) => <TextInput {...control} value={title} placeholder="e.g. Hang new hammers" onChange={(e) => { setTitle(e.target.value); form.clearField('title'); }} />}
      </Field>
      <div className="flex flex-wrap gap-4">
        <Field label="Stage" error={form.errorFor('stageId')} className="w-56">
          {(control) => <Select {...control} options={stageOptions} value={stageId} onChange={(e) => setStageId(e.target.value)} />}
        </Field>
        <Field label="Estimate" hint="h:mm, e.g. 1:30" error={form.errorFor('estimatedMinutes')} className="w-40">
          {(control) => (
            <TextInput {...control} inputMode="decimal" value={estimate} className="tabular-figures" onChange={(e) => { setEstimate(e.target.value); form.clearField('estimatedMinutes'); }} />
          )}
        </Field>
      </div>
      <AssigneePicker people={people} selected={assigneeIds} onChange={setAssigneeIds} error={form.errorFor('assigneeIds')} />
      <div className="flex flex-wrap gap-2">
        <Button type="submit" isPending={mutation.isPending}>
          {task ? 'Save the task' : 'Add the task'}
        </Button>
        <Button variant="secondary" onClick={onDone} disabled={mutation.isPending}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
