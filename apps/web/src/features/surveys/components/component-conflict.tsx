import { SURVEY_GRADE_LABELS, type SurveyComponent } from '@keybed/shared';
import { Alert } from '@/components/alert';
import { Button } from '@/components/button';
import { formatDateTime } from '@/lib/format';
import type { ComponentAnswer } from '../lib/component-answer';

function describe(answer: ComponentAnswer, measureUnit: string | null, measureText: string): string {
  const parts = [answer.isNotInspected ? `Not inspected (${answer.notInspectedReason})` : answer.grade ? SURVEY_GRADE_LABELS[answer.grade] : 'No grade'];
  if (measureUnit && measureText) parts.push(`${measureText} ${measureUnit}`);
  if (answer.note.trim()) parts.push(`“${answer.note.trim()}”`);
  return parts.join(' · ');
}

interface ComponentConflictProps {
  component: SurveyComponent;
  mine: ComponentAnswer;
  theirs: ComponentAnswer;
  onKeepMine: () => void;
  onTakeTheirs: () => void;
}

/** Someone else saved this component first: both answers side by side, the assessor decides. */
export function ComponentConflict({ component, mine, theirs, onKeepMine, onTakeTheirs }: ComponentConflictProps) {
  const unit = component.measure === 'a4_pitch' ? 'Hz' : component.measure === 'tuning_pin_torque' ? 'N·m' : null;
  const text = (a: ComponentAnswer) => (component.measure === 'a4_pitch' ? a.a4PitchText : a.torqueText);
  const who = component.updatedBy ? `${component.updatedBy.name} saved` : 'Someone saved';
  return (
    <Alert tone="error" title={`${who} ${component.name} at ${formatDateTime(component.updatedAt)}, after you started.`}>
      <dl className="mt-1 grid gap-x-3 gap-y-1 sm:grid-cols-[auto_1fr]">
        <dt className="font-semibold">Theirs</dt>
        <dd>{describe(theirs, unit, text(theirs))}</dd>
        <dt className="font-semibold">Yours</dt>
        <dd>{describe(mine, unit, text(mine))}</dd>
      </dl>
      <div className="mt-3 flex flex-wrap gap-2">
        <Button size="sm" onClick={onKeepMine}>Keep my answer</Button>
        <Button size="sm" variant="secondary" onClick={onTakeTheirs}>Use their answer</Button>
      </div>
    </Alert>
  );
}
