import { useState } from 'react';
import type { Estimate } from '@keybed/shared';
import { draftFromEstimate, type EstimateDraft } from '../lib/estimate-draft';

/**
 * A draft estimate being edited against the version it was loaded at. Saving moves the base on;
 * a conflict keeps what was typed and lets it be saved over the other version or dropped.
 */
export function useEstimateDraft(estimate: Estimate) {
  const [base, setBase] = useState(() => ({ version: estimate.version, draft: draftFromEstimate(estimate, estimate.currency) }));
  const [draft, setDraft] = useState<EstimateDraft>(base.draft);
  const [theirs, setTheirs] = useState<Estimate | null>(null);

  return {
    draft,
    version: base.version,
    isDirty: draft !== base.draft,
    /** Someone saved another version while this one was being edited. */
    theirs,
    edit: (fn: (d: EstimateDraft) => EstimateDraft) => setDraft(fn),
    saved(saved: Estimate) {
      const next = { version: saved.version, draft: draftFromEstimate(saved, saved.currency) };
      setBase(next);
      setDraft(next.draft);
      setTheirs(null);
    },
    conflicted: (current: Estimate) => setTheirs(current),
    /** Keep my draft, to be saved over their version next. */
    keepMine() {
      if (theirs) setBase((b) => ({ ...b, version: theirs.version }));
      setTheirs(null);
    },
    /** Drop my changes and load theirs. */
    takeTheirs() {
      if (!theirs) return;
      const next = { version: theirs.version, draft: draftFromEstimate(theirs, theirs.currency) };
      setBase(next);
      setDraft(next.draft);
      setTheirs(null);
    },
  };
}

export type EstimateDraftState = ReturnType<typeof useEstimateDraft>;
