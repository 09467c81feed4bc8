import { Checkbox } from '@/components/checkbox';
import { Field } from '@/components/field';
import { Select } from '@/components/select';
import { Textarea } from '@/components/textarea';
import { TextInput } from '@/components/text-input';
import type { JobDraft } from '../lib/job-draft';
import { PRIORITY_OPTIONS, STATUS_OPTIONS } from '../lib/job-labels';

interface JobFieldsProps {
  draft: JobDraft;
  onChange: (changes: Partial<JobDraft>) => void;
  errorFor: (name: string) => string | undefined;
}

/** The editable fields of a job, controlled so nothing typed is lost when the job changes underneath. */
export function JobFields({ draft, onChange, errorFor }: JobFieldsProps) {
  return (
    <div className="space-y-4">
      <Field label="Title" error={errorFor('title')}>
        {(control) => <TextInput {...control} name="title" value={draft.title} onChange={(e) => onChange({ title: e.target.value })} />}
      </Field>
      <div className="grid gap-4 sm:grid-cols-3">
        <Field label="Status" error={errorFor('status')}>
          {(control) => (
            <Select {...control} name="status" options={STATUS_OPTIONS} value={draft.status} onChange={(e) => onChange({ status: e.target.value as JobDraft['status'] })} />
          )}
        </Field>
        <Field label="Priority" error={errorFor('priority')}>
          {(control) => (
            <Select {...control} name="priority" options={PRIORITY_OPTIONS} value={draft.priority} onChange={(e) => onChange({ priority: e.target.value as JobDraft['priority'] })} />
          )}
        </Field>
        <Field label="Promised date" error={errorFor('promisedOn')}>
          {(control) => <TextInput {...control} name="promisedOn" type="date" value={draft.promisedOn} onChange={(e) => onChange({ promisedOn: e.target.value })} />}
        </Field>
      </div>
      <div className="space-y-2">
        <Checkbox label="Blocked" name="isBlocked" checked={draft.isBlocked} onChange={(e) => onChange({ isBlocked: e.target.checked })} />
        {draft.isBlocked && (
          <Field label="Why is it blocked?" hint="For example: waiting for parts, waiting for the client" error={errorFor('blockedReason')}>
            {(control) => (
              <TextInput {...control} name="blockedReason" value={draft.blockedReason} onChange={(e) => onChange({ blockedReason: e.target.value })} />
            )}
          </Field>
        )}
      </div>
      <Field label="Notes" error={errorFor('notes')}>
        {(control) => <Textarea {...control} name="notes" rows={6} value={draft.notes} onChange={(e) => onChange({ notes: e.target.value })} />}
      </Field>
    </div>
  );
}
