import type { FormEvent } from 'react';
import { UpdateJobInput, type Job } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { FormError } from '@/components/form-error';
import { isApiError } from '@/lib/api-client';
import { validateForm } from '@/lib/form';
import { showToast } from '@/lib/toast';
import { useFormErrors } from '@/lib/use-form-errors';
import { conflictingJob, useUpdateJob } from '../api/update-job';
import { useJobDraft } from '../hooks/use-job-draft';
import { editFrom } from '../lib/job-draft';
import { JobConflictNotice } from './job-conflict-notice';
import { JobFields } from './job-fields';

/** Edits a job against the version it was loaded at; a conflict keeps the member's changes aside. */
export function JobEditForm({ job }: { job: Job }) {
  const update = useUpdateJob();
  const form = useFormErrors();
  const state = useJobDraft(job);

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const edit = editFrom(state.base.draft, state.draft);
    if (Object.keys(edit).length === 0) return showToast('info', 'Nothing has changed yet.');
    const result = validateForm(UpdateJobInput, { version: state.base.version, ...edit });
    if (result.fields) return form.showFields(result.fields);
    form.reset();
    update.mutate(
      { jobId: job.id, changes: result.data },
      {
        onSuccess: (saved) => {
          state.saved(saved);
          showToast('success', `Saved ${saved.title}.`);
        },
        onError: (error) => {
          const current = conflictingJob(error);
          if (current) return state.conflicted(current);
          form.showApiFields(error);
        },
      },
    );
  }

  const isConflictError = isApiError(update.error) && update.error.code === 'version_conflict';
  return (
    <form ref={form.formRef} noValidate onSubmit={submit} className="space-y-4">
      {state.conflict && (
        <JobConflictNotice
          theirs={state.conflict.theirs}
          mine={state.conflict.mine}
          onReapply={() => {
            update.reset();
            state.reapply();
          }}
          onDiscard={() => {
            update.reset();
            state.discard();
          }}
        />
      )}
      {state.isBehind && !state.conflict && (
        <Alert title="This job changed on another screen while you were typing.">
          <p>Save to see both sets of changes; nothing you typed is lost.</p>
        </Alert>
      )}
      {!(isConflictError && state.conflict) && <FormError error={update.error} except={['validation_failed']} />}
      <JobFields
        draft={state.draft}
        errorFor={form.errorFor}
        onChange={(changes) => {
          state.change(changes);
          for (const key of Object.keys(changes)) form.clearField(key);
        }}
      />
      <Button type="submit" isPending={update.isPending} disabled={!state.isDirty}>
        Save changes
      </Button>
    </form>
  );
}
