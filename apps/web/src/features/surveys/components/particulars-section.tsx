import { KEYTOP_MATERIALS, formatLengthMm, type KeytopMaterial } from '@keybed/shared';
import { Checkbox } from '@/components/checkbox';
import { Field } from '@/components/field';
import { IvoryCaution } from '@/components/ivory-caution';
import { Select } from '@/components/select';
import { TextInput } from '@/components/text-input';
import type { PreferredLengthUnit } from '@/lib/length-unit';
import { readSizeMm, type SurveyAnswer } from '../lib/survey-answer';

export const KEYTOP_LABELS: Record<KeytopMaterial, string> = { ivory: 'Ivory', plastic: 'Plastic', other: 'Other', unknown: 'Not known' };
const KEYTOP_OPTIONS = KEYTOP_MATERIALS.map((m) => ({ value: m, label: KEYTOP_LABELS[m] }));

export interface Person {
  id: string;
  name: string;
}

interface ParticularsFieldsProps {
  answer: SurveyAnswer;
  people: readonly Person[];
  unit: PreferredLengthUnit;
  fields: Record<string, string[] | undefined>;
  onChange: (next: SurveyAnswer) => void;
}

/** Date, place, who assessed, and the piano as found: serial checked, size, keytops (with the ivory caution). */
export function ParticularsFields({ answer, people, unit, fields, onChange }: ParticularsFieldsProps) {
  const set = (changes: Partial<SurveyAnswer>) => onChange({ ...answer, ...changes });
  const size = answer.isSizeEdited ? readSizeMm(answer.sizeText, unit) : { ok: true as const, mm: answer.sizeMm };
  const assessors = people.some((p) => p.id === answer.assessorId) || !answer.assessorId ? people : [...people, { id: answer.assessorId, name: 'A former member' }];
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <Field label="Date of the survey" error={fields.surveyedOn?.[0]}>
        {(control) => <TextInput {...control} type="date" value={answer.surveyedOn} onChange={(e) => set({ surveyedOn: e.target.value })} />}
      </Field>
      <Field label="Place" hint="The client’s home, or the workshop" error={fields.place?.[0]}>
        {(control) => <TextInput {...control} value={answer.place} onChange={(e) => set({ place: e.target.value })} />}
      </Field>
      <Field label="Assessed by" error={fields.assessorId?.[0]}>
        {(control) => <Select {...control} value={answer.assessorId} options={assessors.map((p) => ({ value: p.id, label: p.name }))} onChange={(e) => set({ assessorId: e.target.value })} />}
      </Field>
      <div>
        <Field label="Serial number" error={fields.serialNumber?.[0]}>
          {(control) => <TextInput {...control} value={answer.serialNumber} autoComplete="off" onChange={(e) => set({ serialNumber: e.target.value })} />}
        </Field>
        <Checkbox label="Checked on the piano" checked={answer.isSerialConfirmed} onChange={(e) => set({ isSerialConfirmed: e.target.checked })} />
      </div>
      <Field label="Size" hint={unit === 'cm' ? 'Length of a grand, height of an upright: 178 cm' : 'Length of a grand, height of an upright: 5 ft 10 in'} error={fields.sizeMm?.[0]}>
        {(control) => (
          <>
            <TextInput {...control} value={answer.sizeText} autoComplete="off" onChange={(e) => set({ sizeText: e.target.value, isSizeEdited: true })} />
            {size.ok && size.mm !== null && (
              <p className="mt-1 text-sm text-graphite-600 tabular-figures">
                Reads as {formatLengthMm(size.mm, 'ft-in')} · {formatLengthMm(size.mm, 'cm')} · {size.mm} mm
              </p>
            )}
          </>
        )}
      </Field>
      <Field label="Keytops" error={fields.keytopMaterial?.[0]}>
        {(control) => <Select {...control} value={answer.keytopMaterial} options={KEYTOP_OPTIONS} onChange={(e) => set({ keytopMaterial: e.target.value as KeytopMaterial })} />}
      </Field>
      {answer.keytopMaterial === 'ivory' && <IvoryCaution className="sm:col-span-2" />}
    </div>
  );
}
