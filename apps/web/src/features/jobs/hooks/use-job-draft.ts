import { useEffect, useState } from 'react';
import type { Job } from '@keybed/shared';
import { changedKeys, draftOf, reapply, type JobDraft } from '../lib/job-draft';

interface Conflict {
  theirs: Array<keyof JobDraft>;
  mine: Array<keyof JobDraft>;
  myBase: JobDraft;
  myDraft: JobDraft;
}

/**
 * The job form's state: the version being edited (`base`), what the member typed (`draft`), and a
 * conflict kept aside after a 409. Newer server data replaces an untouched form, never a typed one.
 */
export function useJobDraft(job: Job) {
  const [base, setBase] = useState(() => ({ draft: draftOf(job), version: job.version }));
  const [draft, setDraft] = useState(base.draft);
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const isDirty = changedKeys(base.draft, draft).length > 0;
  const isBehind = job.version > base.version;

  useEffect(() => {
    if (!isBehind || isDirty) return;
    const next = { draft: draftOf(job), version: job.version };
    setBase(next);
    setDraft(next.draft);
  }, [job, isBehind, isDirty]);

  return {
    base,
    draft,
    conflict,
    isDirty,
    /** A newer version exists and the member has unsaved changes: saving will meet a conflict. */
    isBehind: isBehind && isDirty,
    change: (changes: Partial<JobDraft>) => setDraft((current) => ({ ...current, ...changes })),
    saved: (saved: Job) => {
      const next = { draft: draftOf(saved), version: saved.version };
      setBase(next);
      setDraft(next.draft);
      setConflict(null);
    },
    conflicted: (current: Job) => {
      const latest = draftOf(current);
      setConflict({ theirs: changedKeys(base.draft, latest), mine: changedKeys(base.draft, draft), myBase: base.draft, myDraft: draft });
      setBase({ draft: latest, version: current.version });
      setDraft(latest);
    },
    reapply: () => {
      if (conflict) setDraft(reapply(base.draft, conflict.myBase, conflict.myDraft));
      setConflict(null);
    },
    discard: () => setConflict(null),
  };
}
