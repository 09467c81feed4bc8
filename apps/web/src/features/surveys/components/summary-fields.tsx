import { SURVEY_GRADE_LABELS, SURVEY_GRADES } from '@keybed/shared';
import { Checkbox } from '@/components/checkbox';
import { Field } from '@/components/field';
import { Textarea } from '@/components/textarea';
import type { ComponentAnswer } from '../lib/component-answer';
import { gradeCounts, worstGrade } from '../lib/grade-summary';
import type { SurveyAnswer } from '../lib/survey-answer';
import { ChoicesEditor } from './choices-editor';
import { GradeBadge } from '@/components/grade-mark';
import { GradeButtons } from './grade-buttons';

interface SummaryFieldsProps {
  answer: SurveyAnswer;
  componentAnswers: readonly ComponentAnswer[];
  fields: Record<string, string[] | undefined>;
  onChange: (next: SurveyAnswer, isUrgent?: boolean) => void;
}

/** The survey's conclusion: the grades so far, the overall condition, the work recommended, the client's choices. */
export function SummaryFields({ answer, componentAnswers, fields, onChange }: SummaryFieldsProps) {
  const set = (changes: Partial<SurveyAnswer>, isUrgent = false) => onChange({ ...answer, ...changes }, isUrgent);
  const counts = gradeCounts(componentAnswers);
  const worst = worstGrade(componentAnswers);
  return (
    <div className="space-y-5">
      <div>
        <h3 className="font-semibold">Grades so far</h3>
        <ul className="mt-2 flex flex-wrap gap-2" aria-label="Grades so far">
          {SURVEY_GRADES.map((g) => (
            <li key={g} className="flex items-center gap-1.5">
              <GradeBadge grade={g} />
              <span className="tabular-figures">× {counts[g]}</span>
              <span className="sr-only">{counts[g] === 1 ? 'component' : 'components'} {SURVEY_GRADE_LABELS[g]}</span>
            </li>
          ))}
          <li className="self-center text-sm text-graphite-600">
            {counts.notInspected} not inspected · {counts.open} still open
          </li>
        </ul>
      </div>
      <div>
        <p className="mb-1 font-semibold">Overall grade</p>
        {worst && <p className="mb-2 text-sm text-graphite-600">The most serious finding is {SURVEY_GRADE_LABELS[worst]}.</p>}
        <GradeButtons label="Overall grade" grade={answer.overallGrade} onGrade={(g) => set({ overallGrade: answer.overallGrade === g ? null : g }, true)} />
      </div>
      <Field label="Overall condition" hint="In plain words for the client" error={fields.overallCondition?.[0]}>
        {(control) => <Textarea {...control} rows={3} value={answer.overallCondition} onChange={(e) => set({ overallCondition: e.target.value })} />}
      </Field>
      <Field label="Recommended work" hint="The first line becomes the estimate’s title" error={fields.recommendedWork?.[0]}>
        {(control) => <Textarea {...control} rows={3} value={answer.recommendedWork} onChange={(e) => set({ recommendedWork: e.target.value })} />}
      </Field>
      <div>
        <h3 className="font-semibold">Options the client should weigh</h3>
        <p className="mb-3 text-sm text-graphite-600">Each becomes a choice on the estimate, with one option per alternative.</p>
        <ChoicesEditor choices={answer.choices} fields={fields} onChange={(choices) => set({ choices })} />
      </div>
      <Checkbox label="The survey is finished" checked={answer.isFinished} onChange={(e) => set({ isFinished: e.target.checked }, true)} />
    </div>
  );
}
