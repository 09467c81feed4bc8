import { z } from 'zod';
import { Id } from './common';
import { DateOnly } from './jobs';
import { KeytopMaterial, PianoType, SizeMm } from './pianos';

/*
 * Condition surveys. A technician assesses a piano part by part; each component gets one of
 * Keybed's four grades or is marked not inspected with a reason. Components come from the
 * workshop's template for the piano's type (grand, upright…), copied when the survey starts, so
 * later template edits never change a survey already taken.
 *
 * Saving as you go: `PUT /api/surveys/:id/components/:componentId` replaces the component's
 * answer. Sending the same answer twice changes nothing (a retry after a lost response is safe).
 * With `version` it is refused with 409 when someone else saved in between; without it the last
 * write wins.
 */

export const SURVEY_GRADES = ['sound', 'serviceable', 'needs_work', 'replace'] as const;
export const SurveyGrade = z.enum(SURVEY_GRADES, { error: 'Choose Sound, Serviceable, Needs work or Replace' });
export type SurveyGrade = z.infer<typeof SurveyGrade>;

/** How each grade reads on screen, in the PDF and on the client's page. */
export const SURVEY_GRADE_LABELS: Record<SurveyGrade, string> = {
  sound: 'Sound',
  serviceable: 'Serviceable',
  needs_work: 'Needs work',
  replace: 'Replace',
};

/** Grades that call for work: "prepare estimate" proposes operations for these. */
export const GRADES_NEEDING_WORK: readonly SurveyGrade[] = ['needs_work', 'replace'];

/** What a component can measure: A4's pitch in hertz, or tuning-pin torque in newton-metres. */
export const SURVEY_MEASURES = ['a4_pitch', 'tuning_pin_torque'] as const;
export const SurveyMeasure = z.enum(SURVEY_MEASURES, { error: 'Choose A4 pitch or tuning-pin torque' });
export type SurveyMeasure = z.infer<typeof SurveyMeasure>;

/** Piano types a survey template exists for. */
export const SURVEY_PIANO_TYPES = ['grand', 'upright'] as const;
export const SurveyPianoType = z.enum(SURVEY_PIANO_TYPES, { error: 'Templates exist for grand and upright pianos' });
export type SurveyPianoType = z.infer<typeof SurveyPianoType>;

/** Which template a piano's survey uses: squares and others use the upright one. */
export const surveyTemplateTypeOf = (type: z.infer<typeof PianoType>): SurveyPianoType => (type === 'grand' ? 'grand' : 'upright');

const Text = (what: string, max: number) =>
  z.string({ error: `${what} is required` }).trim().min(1, { error: `${what} is required` }).max(max, { error: `${what} is too long` });

/** A component's stable name within a template ("hammers", "pinblock"): catalogue operations name the components they remedy by it. */
export const ComponentKey = z.string({ error: 'Component key is required' }).regex(/^[a-z0-9][a-z0-9_-]{0,39}$/, { error: 'Use 1 to 40 lower-case letters, digits, - or _' });

// ── Templates ───────────────────────────────────────────────────────────────

export const SurveyTemplateItem = z.object({
  key: ComponentKey,
  /** The area it belongs to ("Action", "Strings and tuning"). */
  area: Text('Area', 80),
  name: Text('Component', 120),
  /** What to look for, shown under the component while surveying. */
  hint: z.string().trim().max(300, { error: 'Hint is too long' }).default(''),
  measure: SurveyMeasure.nullable().default(null),
});
export type SurveyTemplateItem = z.infer<typeof SurveyTemplateItem>;

/** `PUT /api/survey-templates/:pianoType` (owner, foreman): the whole list, in order. */
export const PutSurveyTemplateInput = z.object({
  items: z
    .array(SurveyTemplateItem)
    .min(1, { error: 'A template needs at least one component' })
    .max(120, { error: 'At most 120 components' })
    .superRefine((items, ctx) => {
      const seen = new Set<string>();
      items.forEach((item, i) => {
        if (seen.has(item.key)) ctx.addIssue({ code: 'custom', message: 'This key is used twice', path: [i, 'key'] });
        seen.add(item.key);
      });
    }),
});
export type PutSurveyTemplateInput = z.infer<typeof PutSurveyTemplateInput>;

export const SurveyTemplatePianoTypeParams = z.object({ pianoType: SurveyPianoType });

export const SurveyTemplate = z.object({
  pianoType: SurveyPianoType,
  items: z.array(SurveyTemplateItem.extend({ hint: z.string(), measure: SurveyMeasure.nullable() })),
  /** False while the workshop still uses Keybed's default list. */
  isCustomised: z.boolean(),
  updatedAt: z.string().nullable(),
});
export type SurveyTemplate = z.infer<typeof SurveyTemplate>;

// ── Measurements ────────────────────────────────────────────────────────────

const decimals = (places: number) => (v: number) => Math.abs(Math.round(v * 10 ** places) - v * 10 ** places) < 1e-6;

/** Measured pitch of A4 in hertz, to 0.01 Hz (a piano left for decades can sit far below 440). */
export const A4PitchHz = z
  .number({ error: 'Enter the pitch in hertz' })
  .min(300, { error: 'Between 300 and 500 Hz' })
  .max(500, { error: 'Between 300 and 500 Hz' })
  .refine(decimals(2), { error: 'At most two decimals' });

/**
 * Tuning-pin torque in newton-metres, to 0.1 N·m. A new pinblock holds about 12.4–13.6 N·m
 * (110–120 in·lbf); about 5.6 N·m (50 in·lbf) or less is a concern (TRADE.md §5 [S12d, S12e]).
 */
export const TuningPinTorqueNm = z
  .number({ error: 'Enter the torque in newton-metres' })
  .min(0, { error: 'Cannot be negative' })
  .max(40, { error: 'Above 40 N·m: check the unit (in·lbf ÷ 8.85 = N·m)' })
  .refine(decimals(1), { error: 'At most one decimal' });

// ── Surveys ─────────────────────────────────────────────────────────────────

/** One alternative the client should weigh, as named in the summary ("Hammers": new, or recover the old ones). */
export const SurveyChoice = z.object({
  /** The question ("Hammers", "Case"). */
  choice: Text('Choice', 120),
  alternatives: z.array(Text('Alternative', 120)).min(2, { error: 'Name at least two alternatives' }).max(5, { error: 'At most five alternatives' }),
});
export type SurveyChoice = z.infer<typeof SurveyChoice>;

const Place = z.string().trim().max(200, { error: 'Place is too long' });
const LongText = (what: string) => z.string().trim().max(5000, { error: `${what} is too long` });

/** `POST /api/pianos/:id/surveys` (any member): starts a survey with the template's components. */
export const CreateSurveyInput = z.object({
  surveyedOn: DateOnly,
  /** Where it took place ("Client's home, 3 Mill Lane", "Workshop"). */
  place: Place.default(''),
  /** Who assessed: a member of the workshop; the caller when left out. */
  assessorId: Id.optional(),
  /** The piano's particulars at the time; each defaults to the piano's record. */
  serialNumber: z.string().trim().max(100).optional(),
  isSerialConfirmed: z.boolean().default(false),
  sizeMm: SizeMm.nullable().optional(),
  keytopMaterial: KeytopMaterial.optional(),
});
export type CreateSurveyInput = z.infer<typeof CreateSurveyInput>;

/** `PATCH /api/surveys/:id`: particulars and summary; carries the version it was based on. */
export const UpdateSurveyInput = z
  .object({
    version: z.number({ error: 'Version must be a number' }).int().min(1),
    surveyedOn: DateOnly.optional(),
    place: Place.optional(),
    assessorId: Id.optional(),
    serialNumber: z.string().trim().max(100).optional(),
    isSerialConfirmed: z.boolean().optional(),
    sizeMm: SizeMm.nullable().optional(),
    keytopMaterial: KeytopMaterial.optional(),
    overallGrade: SurveyGrade.nullable().optional(),
    /** The overall condition in words. */
    overallCondition: LongText('Overall condition').optional(),
    recommendedWork: LongText('Recommended work').optional(),
    choices: z.array(SurveyChoice).max(10, { error: 'At most ten choices' }).optional(),
    /** Finished surveys can still be corrected; finishing records when. */
    isFinished: z.boolean().optional(),
  })
  .refine(({ version: _version, ...changes }) => Object.values(changes).some((x) => x !== undefined), { error: 'Nothing to change', path: ['place'] });
export type UpdateSurveyInput = z.infer<typeof UpdateSurveyInput>;

/**
 * `PUT /api/surveys/:id/components/:componentId`: the component's whole answer. A grade, or
 * `notInspectedReason` (then no grade), or neither yet. Measurements only where the component
 * measures that.
 */
export const PutSurveyComponentInput = z
  .object({
    version: z.number({ error: 'Version must be a number' }).int().min(1).optional(),
    grade: SurveyGrade.nullable().default(null),
    notInspectedReason: z.string().trim().max(300, { error: 'Reason is too long' }).nullable().default(null),
    note: z.string().trim().max(2000, { error: 'Note is too long' }).default(''),
    a4PitchHz: A4PitchHz.nullable().default(null),
    tuningPinTorqueNm: TuningPinTorqueNm.nullable().default(null),
  })
  .refine((v) => !(v.grade && v.notInspectedReason), { error: 'A component not inspected has no grade', path: ['notInspectedReason'] })
  .refine((v) => v.notInspectedReason === null || v.notInspectedReason.length > 0, { error: 'Say why it was not inspected', path: ['notInspectedReason'] });
export type PutSurveyComponentInput = z.infer<typeof PutSurveyComponentInput>;

export const SurveyComponentParams = z.object({ id: Id, componentId: Id });

export const SurveyPhoto = z.object({
  id: z.string(),
  /** Shown to the client on their page. */
  isSharedWithClient: z.boolean(),
  width: z.number(),
  height: z.number(),
  createdAt: z.string(),
});
export type SurveyPhoto = z.infer<typeof SurveyPhoto>;

export const SurveyComponent = z.object({
  id: z.string(),
  key: z.string(),
  area: z.string(),
  name: z.string(),
  hint: z.string(),
  measure: SurveyMeasure.nullable(),
  position: z.number(),
  grade: SurveyGrade.nullable(),
  isNotInspected: z.boolean(),
  notInspectedReason: z.string().nullable(),
  note: z.string(),
  a4PitchHz: z.number().nullable(),
  tuningPinTorqueNm: z.number().nullable(),
  photos: z.array(SurveyPhoto),
  version: z.number(),
  updatedAt: z.string(),
  updatedBy: z.object({ id: z.string(), name: z.string() }).nullable(),
});
export type SurveyComponent = z.infer<typeof SurveyComponent>;

export const SurveyArea = z.object({ area: z.string(), components: z.array(SurveyComponent) });
export type SurveyArea = z.infer<typeof SurveyArea>;

/** A caution the survey, the estimate and the client's page carry (ivory keytops, moving a piano). */
export const Caution = z.object({ key: z.enum(['ivory', 'moving']), title: z.string(), text: z.string() });
export type Caution = z.infer<typeof Caution>;

export const SurveySummary = z.object({
  id: z.string(),
  pianoId: z.string(),
  surveyedOn: z.string(),
  place: z.string(),
  assessor: z.object({ id: z.string(), name: z.string() }).nullable(),
  overallGrade: SurveyGrade.nullable(),
  isFinished: z.boolean(),
  /** Components graded so far, and in all (not inspected counts as done). */
  answeredCount: z.number(),
  componentCount: z.number(),
  jobId: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type SurveySummary = z.infer<typeof SurveySummary>;

export const Survey = SurveySummary.extend({
  piano: z.object({
    id: z.string(),
    maker: z.string(),
    model: z.string(),
    type: PianoType,
    yearApprox: z.number().nullable(),
    caseFinish: z.string(),
  }),
  client: z.object({ id: z.string(), name: z.string() }),
  pianoType: SurveyPianoType,
  serialNumber: z.string(),
  isSerialConfirmed: z.boolean(),
  sizeMm: z.number().nullable(),
  keytopMaterial: KeytopMaterial,
  overallCondition: z.string(),
  recommendedWork: z.string(),
  choices: z.array(SurveyChoice),
  finishedAt: z.string().nullable(),
  version: z.number(),
  areas: z.array(SurveyArea),
  cautions: z.array(Caution),
});
export type Survey = z.infer<typeof Survey>;

export const SurveyList = z.object({ surveys: z.array(SurveySummary) });
export type SurveyList = z.infer<typeof SurveyList>;
