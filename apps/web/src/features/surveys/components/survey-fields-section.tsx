import type { ReactNode } from 'react';
import { useQueueEntry, SURVEY_KEY, type SurveySaving } from '../hooks/use-survey-saving';
import type { SurveyAnswer } from '../lib/survey-answer';
import { SaveStatus } from './save-status';
import { SurveyConflict } from './survey-conflict';
import type { PreferredLengthUnit } from '@/lib/length-unit';

interface SurveyFieldsSectionProps {
  id: string;
  title: string;
  saving: SurveySaving;
  unit: PreferredLengthUnit;
  children: (props: { answer: SurveyAnswer; fields: Record<string, string[] | undefined>; onChange: (next: SurveyAnswer, isUrgent?: boolean) => void }) => ReactNode;
}

/** A section of the survey's own fields, saved as you go like the components, with its status and any conflict. */
export function SurveyFieldsSection({ id, title, saving, unit, children }: SurveyFieldsSectionProps) {
  const entry = useQueueEntry(saving.fields, SURVEY_KEY);
  if (!entry) return null;
  const { answer, state } = entry;
  const fields = state.kind === 'invalid' || state.kind === 'refused' ? state.fields : {};
  return (
    <section id={id} aria-labelledby={`${id}-heading`} className="scroll-mt-4 space-y-4 rounded-lg border border-graphite-300 bg-white p-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={`${id}-heading`} className="text-xl font-bold">{title}</h2>
        <SaveStatus state={state} />
      </div>
      {state.kind === 'conflict' && (
        <SurveyConflict mine={answer} theirs={state.theirs.answer} unit={unit} onKeepMine={() => saving.fields.keepMine(SURVEY_KEY)} onTakeTheirs={() => saving.fields.takeTheirs(SURVEY_KEY)} />
      )}
      {children({ answer, fields, onChange: (next, isUrgent) => saving.fields.edit(SURVEY_KEY, next, { isUrgent }) })}
    </section>
  );
}
