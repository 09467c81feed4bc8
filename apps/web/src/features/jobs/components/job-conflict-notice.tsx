import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { FIELD_LABELS, type JobDraft } from '../lib/job-draft';

interface JobConflictNoticeProps {
  /** What the other person changed, between the version this member edited and the current one. */
  theirs: Array<keyof JobDraft>;
  /** What this member had changed, kept aside. */
  mine: Array<keyof JobDraft>;
  onReapply: () => void;
  onDiscard: () => void;
}

/** "title", "title and priority", "title, priority and notes". */
function list(keys: Array<keyof JobDraft>) {
  const labels = keys.map((key) => FIELD_LABELS[key]);
  return labels.length <= 1 ? (labels[0] ?? '') : `${labels.slice(0, -1).join(', ')} and ${labels.at(-1)}`;
}

/** After a 409: says what happened and lets the member put their changes back over the latest version. */
export function JobConflictNotice({ theirs, mine, onReapply, onDiscard }: JobConflictNoticeProps) {
  return (
    <Alert tone="error" title="Someone else saved this job while you were editing it.">
      <p>
        {theirs.length > 0 ? `They changed the ${list(theirs)}. ` : 'It moved or changed in the meantime. '}
        The form now shows the job as it is. Your changes to the {list(mine)} are kept aside.
      </p>
      <div className="mt-3 flex flex-wrap gap-2">
        <Button size="sm" onClick={onReapply}>
          Put my changes back
        </Button>
        <Button size="sm" variant="secondary" onClick={onDiscard}>
          Keep theirs
        </Button>
      </div>
    </Alert>
  );
}
