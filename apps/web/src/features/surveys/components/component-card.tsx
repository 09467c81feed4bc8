import { useId } from 'react';
import type { SurveyComponent } from '@keybed/shared';
import { Field } from '@/components/field';
import { Textarea } from '@/components/textarea';
import { TextInput } from '@/components/text-input';
import { cx } from '@/lib/cx';
import { useQueueEntry } from '../hooks/use-survey-saving';
import { withGrade, withNotInspected, type ComponentAnswer } from '../lib/component-answer';
import type { SaveQueue } from '../lib/save-queue';
import { ComponentConflict } from './component-conflict';
import { GradeButtons } from './grade-buttons';
import { MeasurementField } from './measurement-field';
import { PhotoField } from './photo-field';
import { SaveStatus } from './save-status';

interface ComponentCardProps {
  surveyId: string;
  component: SurveyComponent;
  queue: SaveQueue<ComponentAnswer>;
  canShare: boolean;
}

/** One component: its grade, or why it was not inspected, a note, a measurement where asked, photos. */
export function ComponentCard({ surveyId, component, queue, canShare }: ComponentCardProps) {
  const headingId = useId();
  const entry = useQueueEntry(queue, component.id);
  if (!entry) return null;
  const { answer, state } = entry;
  const fields = state.kind === 'invalid' || state.kind === 'refused' ? state.fields : {};
  const edit = (next: ComponentAnswer, isUrgent = false) => queue.edit(component.id, next, { isUrgent });
  const measureText = component.measure === 'a4_pitch' ? answer.a4PitchText : answer.torqueText;

  return (
    <section aria-labelledby={headingId} className={cx('space-y-3 rounded-lg border bg-white p-4', state.kind === 'conflict' ? 'border-damper' : 'border-graphite-300')}>
      <div className="flex flex-wrap items-start justify-between gap-x-4 gap-y-1">
        <div className="min-w-0">
          <h3 id={headingId} className="text-lg font-semibold">{component.name}</h3>
          {component.hint && <p className="text-sm text-graphite-600">{component.hint}</p>}
        </div>
        <SaveStatus state={state} />
      </div>
      {state.kind === 'conflict' && (
        <ComponentConflict component={component} mine={answer} theirs={state.theirs.answer} onKeepMine={() => queue.keepMine(component.id)} onTakeTheirs={() => queue.takeTheirs(component.id)} />
      )}
      <GradeButtons
        label={`Grade for ${component.name}`}
        grade={answer.grade}
        onGrade={(grade) => edit(withGrade(answer, grade), true)}
        notInspected={{ isPressed: answer.isNotInspected, onToggle: () => edit(withNotInspected(answer, !answer.isNotInspected), true) }}
      />
      {answer.isNotInspected && (
        <Field label="Why was it not inspected?" hint="Required, e.g. “Action not removed”" error={fields.notInspectedReason?.[0]}>
          {(control) => <TextInput {...control} required value={answer.notInspectedReason} onChange={(e) => edit({ ...answer, notInspectedReason: e.target.value })} />}
        </Field>
      )}
      <div className="grid gap-3 md:grid-cols-[1fr_auto]">
        <Field label="Note" error={fields.note?.[0]}>
          {(control) => <Textarea {...control} rows={2} value={answer.note} onChange={(e) => edit({ ...answer, note: e.target.value })} />}
        </Field>
        {component.measure && (
          <MeasurementField
            measure={component.measure}
            componentName={component.name}
            value={measureText}
            error={(component.measure === 'a4_pitch' ? fields.a4PitchHz : fields.tuningPinTorqueNm)?.[0]}
            onChange={(text) => edit(component.measure === 'a4_pitch' ? { ...answer, a4PitchText: text } : { ...answer, torqueText: text })}
          />
        )}
      </div>
      <PhotoField surveyId={surveyId} component={component} canShare={canShare} />
    </section>
  );
}
