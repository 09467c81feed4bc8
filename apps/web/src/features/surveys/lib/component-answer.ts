import { z } from 'zod';
import { PutSurveyComponentInput, SurveyGrade, type FieldErrors, type SurveyComponent, type SurveyMeasure } from '@keybed/shared';
import { issuesToFields } from '@/lib/form';

/** One component's answer as the assessor is editing it; measurements stay as typed until sent. */
export const ComponentAnswer = z.object({
  grade: SurveyGrade.nullable(),
  isNotInspected: z.boolean(),
  notInspectedReason: z.string(),
  note: z.string(),
  a4PitchText: z.string(),
  torqueText: z.string(),
});
export type ComponentAnswer = z.infer<typeof ComponentAnswer>;

/** The fields of `PUT /api/surveys/:id/components/:componentId` besides the version. */
export type ComponentWire = Omit<PutSurveyComponentInput, 'version'>;

export const EMPTY_ANSWER: ComponentAnswer = { grade: null, isNotInspected: false, notInspectedReason: '', note: '', a4PitchText: '', torqueText: '' };

/** Shown back as plain decimals ("438.5", "9.6"), the way they were typed. */
const numberText = (n: number | null) => (n === null ? '' : String(n));

export function answerOf(c: SurveyComponent): ComponentAnswer {
  return {
    grade: c.grade,
    isNotInspected: c.isNotInspected,
    notInspectedReason: c.notInspectedReason ?? '',
    note: c.note,
    a4PitchText: numberText(c.a4PitchHz),
    torqueText: numberText(c.tuningPinTorqueNm),
  };
}

/** A typed decimal ("438.5", "438,5") as a number; null when empty; NaN when unreadable. */
export function readDecimal(text: string): number | null {
  const trimmed = text.trim().replace(',', '.');
  if (trimmed === '') return null;
  return /^\d+(\.\d+)?$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}

type WireResult = { ok: true; wire: ComponentWire } | { ok: false; fields: FieldErrors };

/**
 * The answer as the API takes it, checked with the API's own schema. Measurements count only on
 * the component that takes them; not inspected sends the reason and no grade.
 */
export function toWire(answer: ComponentAnswer, measure: SurveyMeasure | null): WireResult {
  const fields: FieldErrors = {};
  const a4 = measure === 'a4_pitch' ? readDecimal(answer.a4PitchText) : null;
  const torque = measure === 'tuning_pin_torque' ? readDecimal(answer.torqueText) : null;
  if (Number.isNaN(a4)) fields.a4PitchHz = ['Enter the pitch in hertz, like 438.5'];
  if (Number.isNaN(torque)) fields.tuningPinTorqueNm = ['Enter the torque in newton-metres, like 9.5'];
  const parsed = PutSurveyComponentInput.safeParse({
    grade: answer.isNotInspected ? null : answer.grade,
    notInspectedReason: answer.isNotInspected ? answer.notInspectedReason : null,
    note: answer.note,
    a4PitchHz: Number.isNaN(a4) ? null : a4,
    tuningPinTorqueNm: Number.isNaN(torque) ? null : torque,
  });
  if (!parsed.success) Object.assign(fields, issuesToFields(parsed.error.issues), fields);
  if (Object.keys(fields).length > 0 || !parsed.success) return { ok: false, fields };
  const { version: _version, ...wire } = parsed.data;
  return { ok: true, wire };
}

/** Same answer as far as the server is concerned ("438.50" and "438.5" are one pitch). */
export function isSameAnswer(a: ComponentAnswer, b: ComponentAnswer, measure: SurveyMeasure | null): boolean {
  const wa = toWire(a, measure);
  const wb = toWire(b, measure);
  if (wa.ok && wb.ok) return JSON.stringify(wa.wire) === JSON.stringify(wb.wire);
  return JSON.stringify(a) === JSON.stringify(b);
}

/** Whether a component counts as done: graded, or not inspected with its reason. */
export function isAnswered(answer: ComponentAnswer): boolean {
  return answer.isNotInspected ? answer.notInspectedReason.trim() !== '' : answer.grade !== null;
}

/** Tapping a grade: chooses it (and ends "not inspected"), or clears it when tapped again. */
export function withGrade(answer: ComponentAnswer, grade: SurveyGrade): ComponentAnswer {
  return { ...answer, grade: answer.grade === grade && !answer.isNotInspected ? null : grade, isNotInspected: false };
}

/** Tapping "Not inspected": marks it so (the grade goes) or back to inspected. */
export function withNotInspected(answer: ComponentAnswer, isNotInspected: boolean): ComponentAnswer {
  return { ...answer, isNotInspected, grade: isNotInspected ? null : answer.grade };
}
