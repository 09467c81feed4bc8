import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import type { PreferredLengthUnit } from '@/lib/length-unit';
import { changedParts, type SurveyAnswer } from '../lib/survey-answer';

interface SurveyConflictProps {
  mine: SurveyAnswer;
  theirs: SurveyAnswer;
  unit: PreferredLengthUnit;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}

/** Someone else saved the survey's details first: what differs, and whose version stands. */
export function SurveyConflict({ mine, theirs, unit, onKeepMine, onTakeTheirs }: SurveyConflictProps) {
  const parts = changedParts(theirs, mine, unit);
  const list = parts.length <= 1 ? (parts[0] ?? 'details') : `${parts.slice(0, -1).join(', ')} and ${parts.at(-1)}`;
  return (
    <Alert tone="error" title="Someone else saved the survey’s details after you started.">
      <p>Their version and yours differ in the {list}. The fields show yours, kept on this device.</p>
      {theirs.overallCondition !== mine.overallCondition && theirs.overallCondition && (
        <p className="mt-1">
          Their overall condition: “{theirs.overallCondition}”
        </p>
      )}
      <div className="mt-3 flex flex-wrap gap-2">
        <Button size="sm" onClick={onKeepMine}>Keep my version</Button>
        <Button size="sm" variant="secondary" onClick={onTakeTheirs}>Use their version</Button>
      </div>
    </Alert>
  );
}
