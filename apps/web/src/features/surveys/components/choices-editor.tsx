import { Button } from '@/components/button';
import { Field } from '@/components/field';
import { TextInput } from '@/components/text-input';
import type { SurveyAnswer } from '../lib/survey-answer';

type Choices = SurveyAnswer['choices'];

interface ChoicesEditorProps {
  choices: Choices;
  fields: Record<string, string[] | undefined>;
  onChange: (next: Choices) => void;
}

const MAX_CHOICES = 10;
const MAX_ALTERNATIVES = 5;

/** The options the client should weigh ("Case": revive the shellac, or strip and refinish). */
export function ChoicesEditor({ choices, fields, onChange }: ChoicesEditorProps) {
  const setChoice = (i: number, next: Choices[number]) => onChange(choices.map((c, n) => (n === i ? next : c)));
  return (
    <div className="space-y-4">
      {choices.map((choice, i) => (
        <fieldset key={i} className="space-y-3 rounded-md border border-graphite-300 bg-graphite-100 p-3">
          <legend className="px-1 font-semibold">Choice {i + 1}</legend>
          <Field label="What the client decides" hint="e.g. Case, or Hammers" error={fields[`choices.${i}.choice`]?.[0]}>
            {(control) => <TextInput {...control} value={choice.choice} onChange={(e) => setChoice(i, { ...choice, choice: e.target.value })} />}
          </Field>
          <div className="grid gap-3 sm:grid-cols-2">
            {choice.alternatives.map((alternative, j) => (
              <Field key={j} label={`Alternative ${j + 1}`} error={j === 0 ? fields[`choices.${i}.alternatives`]?.[0] : fields[`choices.${i}.alternatives.${j}`]?.[0]}>
                {(control) => (
                  <TextInput {...control} value={alternative} onChange={(e) => setChoice(i, { ...choice, alternatives: choice.alternatives.map((a, n) => (n === j ? e.target.value : a)) })} />
                )}
              </Field>
            ))}
          </div>
          <div className="flex flex-wrap gap-2">
            {choice.alternatives.length < MAX_ALTERNATIVES && (
              <Button size="sm" variant="secondary" onClick={() => setChoice(i, { ...choice, alternatives: [...choice.alternatives, ''] })}>
                Add an alternative<span className="sr-only"> to choice {i + 1}</span>
              </Button>
            )}
            <Button size="sm" variant="quiet" onClick={() => onChange(choices.filter((_, n) => n !== i))}>
              Remove choice {i + 1}
            </Button>
          </div>
        </fieldset>
      ))}
      {choices.length < MAX_CHOICES && (
        <Button variant="secondary" onClick={() => onChange([...choices, { choice: '', alternatives: ['', ''] }])}>
          Add a choice for the client
        </Button>
      )}
    </div>
  );
}
