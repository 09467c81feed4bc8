import type { Job, JobPriority, JobStatus, UpdateJobInput } from '@keybed/shared';

/** The editable part of a job, as the form holds it (empty strings for unset dates and reasons). */
export interface JobDraft {
  title: string;
  status: JobStatus;
  priority: JobPriority;
  promisedOn: string;
  isBlocked: boolean;
  blockedReason: string;
  notes: string;
}

export const FIELD_LABELS: Record<keyof JobDraft, string> = {
  title: 'title',
  status: 'status',
  priority: 'priority',
  promisedOn: 'promised date',
  isBlocked: 'blocked',
  blockedReason: 'blocked reason',
  notes: 'notes',
};

export function draftOf(job: Job): JobDraft {
  return {
    title: job.title,
    status: job.status,
    priority: job.priority,
    promisedOn: job.promisedOn ?? '',
    isBlocked: job.isBlocked,
    blockedReason: job.blockedReason ?? '',
    notes: job.notes,
  };
}

/** Fields whose values differ between two drafts. */
export function changedKeys(from: JobDraft, to: JobDraft): Array<keyof JobDraft> {
  return (Object.keys(from) as Array<keyof JobDraft>).filter((key) => from[key] !== to[key]);
}

/** Only what the member changed from `base`, as the API's edit (without `version`). */
export function editFrom(base: JobDraft, draft: JobDraft): Omit<UpdateJobInput, 'version'> {
  const edit: Omit<UpdateJobInput, 'version'> = {};
  for (const key of changedKeys(base, draft)) {
    if (key === 'promisedOn') edit.promisedOn = draft.promisedOn === '' ? null : draft.promisedOn;
    else if (key === 'blockedReason') edit.blockedReason = draft.blockedReason.trim() === '' ? null : draft.blockedReason;
    else Object.assign(edit, { [key]: draft[key] });
  }
  // The API needs the reason whenever the job is (still) blocked and either part changed.
  if (draft.isBlocked && (edit.isBlocked !== undefined || edit.blockedReason !== undefined)) {
    edit.isBlocked = true;
    edit.blockedReason = draft.blockedReason;
  }
  return edit;
}

/** The member's changes laid over someone else's newer version of the job. */
export function reapply(current: JobDraft, base: JobDraft, draft: JobDraft): JobDraft {
  const merged = { ...current };
  for (const key of changedKeys(base, draft)) Object.assign(merged, { [key]: draft[key] });
  return merged;
}
