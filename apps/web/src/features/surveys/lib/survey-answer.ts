import { z } from 'zod';
import {
  KeytopMaterial,
  SurveyGrade,
  UpdateSurveyInput,
  formatLengthMm,
  parseLengthMm,
  type FieldErrors,
  type Survey,
} from '@keybed/shared';
import { issuesToFields } from '@/lib/form';
import type { PreferredLengthUnit } from '@/lib/length-unit';

/** The survey's particulars and summary as edited; the size stays as typed until sent. */
export const SurveyAnswer = z.object({
  surveyedOn: z.string(),
  place: z.string(),
  assessorId: z.string(),
  serialNumber: z.string(),
  isSerialConfirmed: z.boolean(),
  sizeText: z.string(),
  /** The stored size, sent back unchanged while the text is not edited (no rounding creep). */
  sizeMm: z.number().nullable(),
  isSizeEdited: z.boolean(),
  keytopMaterial: KeytopMaterial,
  overallGrade: SurveyGrade.nullable(),
  overallCondition: z.string(),
  recommendedWork: z.string(),
  choices: z.array(z.object({ choice: z.string(), alternatives: z.array(z.string()) })),
  isFinished: z.boolean(),
});
export type SurveyAnswer = z.infer<typeof SurveyAnswer>;

export type SurveyWire = Omit<UpdateSurveyInput, 'version'>;

export function surveyAnswerOf(survey: Survey, unit: PreferredLengthUnit): SurveyAnswer {
  return {
    surveyedOn: survey.surveyedOn,
    place: survey.place,
    assessorId: survey.assessor?.id ?? '',
    serialNumber: survey.serialNumber,
    isSerialConfirmed: survey.isSerialConfirmed,
    sizeText: survey.sizeMm === null ? '' : formatLengthMm(survey.sizeMm, unit),
    sizeMm: survey.sizeMm,
    isSizeEdited: false,
    keytopMaterial: survey.keytopMaterial,
    overallGrade: survey.overallGrade,
    overallCondition: survey.overallCondition,
    recommendedWork: survey.recommendedWork,
    choices: survey.choices.map((c) => ({ choice: c.choice, alternatives: [...c.alternatives] })),
    isFinished: survey.isFinished,
  };
}

/** Size text → whole millimetres; a bare number is centimetres for members who work in them. */
export function readSizeMm(text: string, unit: PreferredLengthUnit): { ok: true; mm: number | null } | { ok: false; message: string } {
  if (text.trim() === '') return { ok: true, mm: null };
  const parsed = parseLengthMm(text, unit === 'cm' ? { defaultUnit: 'cm' } : {});
  return parsed.ok ? { ok: true, mm: Math.round(parsed.mm) } : parsed;
}

/** Choice rows left wholly empty are ignored; empty alternatives inside a row are dropped. */
function cleanChoices(choices: SurveyAnswer['choices']) {
  return choices
    .map((c) => ({ choice: c.choice.trim(), alternatives: c.alternatives.map((a) => a.trim()).filter((a) => a !== '') }))
    .filter((c) => c.choice !== '' || c.alternatives.length > 0);
}

type WireResult = { ok: true; wire: SurveyWire } | { ok: false; fields: FieldErrors };

/** The answer as `PATCH /api/surveys/:id` takes it, checked with the API's schema. */
export function toSurveyWire(answer: SurveyAnswer, unit: PreferredLengthUnit): WireResult {
  const fields: FieldErrors = {};
  const size = answer.isSizeEdited ? readSizeMm(answer.sizeText, unit) : { ok: true as const, mm: answer.sizeMm };
  if (!size.ok) fields.sizeMm = [size.message];
  const parsed = UpdateSurveyInput.safeParse({
    version: 1,
    surveyedOn: answer.surveyedOn,
    place: answer.place,
    ...(answer.assessorId ? { assessorId: answer.assessorId } : {}),
    serialNumber: answer.serialNumber,
    isSerialConfirmed: answer.isSerialConfirmed,
    sizeMm: size.ok ? size.mm : null,
    keytopMaterial: answer.keytopMaterial,
    overallGrade: answer.overallGrade,
    overallCondition: answer.overallCondition,
    recommendedWork: answer.recommendedWork,
    choices: cleanChoices(answer.choices),
    isFinished: answer.isFinished,
  });
  if (!parsed.success) for (const [key, messages] of Object.entries(issuesToFields(parsed.error.issues))) fields[key] ??= messages;
  if (!parsed.success || Object.keys(fields).length > 0) return { ok: false, fields };
  const { version: _version, ...wire } = parsed.data;
  return { ok: true, wire };
}

export function isSameSurveyAnswer(a: SurveyAnswer, b: SurveyAnswer, unit: PreferredLengthUnit): boolean {
  const wa = toSurveyWire(a, unit);
  const wb = toSurveyWire(b, unit);
  if (wa.ok && wb.ok) return JSON.stringify(wa.wire) === JSON.stringify(wb.wire);
  return JSON.stringify(a) === JSON.stringify(b);
}

const LABELS: Partial<Record<keyof SurveyWire, string>> = {
  surveyedOn: 'date',
  place: 'place',
  assessorId: 'assessor',
  serialNumber: 'serial number',
  isSerialConfirmed: 'serial check',
  sizeMm: 'size',
  keytopMaterial: 'keytops',
  overallGrade: 'overall grade',
  overallCondition: 'overall condition',
  recommendedWork: 'recommended work',
  choices: 'options for the client',
  isFinished: 'finished mark',
};

/** Which parts differ between two answers, in words ("place and overall condition"), for a conflict notice. */
export function changedParts(a: SurveyAnswer, b: SurveyAnswer, unit: PreferredLengthUnit): string[] {
  const wa = toSurveyWire(a, unit);
  const wb = toSurveyWire(b, unit);
  if (!wa.ok || !wb.ok) return [];
  return (Object.keys(LABELS) as Array<keyof SurveyWire>)
    .filter((key) => JSON.stringify(wa.wire[key]) !== JSON.stringify(wb.wire[key]))
    .map((key) => LABELS[key]!);
}
