import { sql } from 'drizzle-orm';
import { boolean, check, date, foreignKey, index, integer, jsonb, pgEnum, pgTable, text, unique, uuid } from 'drizzle-orm/pg-core';
import { jobs } from './board';
import { clients, keytopMaterialEnum, pianos } from './clients';
import { createdAt, id, instant } from './columns';
import { users } from './users';
import { workshops } from './workshops';

/*
 * Condition surveys. A survey copies its components from the workshop's template for the piano's
 * type when it starts, so editing a template never changes a survey already taken. Measurements
 * are integers in named units: A4 pitch in centihertz (440.00 Hz = 44000), tuning-pin torque in
 * decinewton-metres (12.4 N·m = 124).
 */

const workshopId = () =>
  uuid()
    .notNull()
    .references(() => workshops.id, { onDelete: 'cascade' });

export const surveyPianoTypeEnum = pgEnum('survey_piano_type', ['grand', 'upright']);
export const surveyGradeEnum = pgEnum('survey_grade', ['sound', 'serviceable', 'needs_work', 'replace']);
export const surveyMeasureEnum = pgEnum('survey_measure', ['a4_pitch', 'tuning_pin_torque']);

/** A workshop's own component list for one piano type; without a row the defaults apply. */
export const surveyTemplates = pgTable(
  'survey_templates',
  {
    id: id(),
    workshopId: workshopId(),
    pianoType: surveyPianoTypeEnum().notNull(),
    /** [{ key, area, name, hint, measure }], validated by the shared schema before it is stored. */
    items: jsonb().notNull(),
    updatedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('survey_templates_one_per_type').on(t.workshopId, t.pianoType),
    check('survey_templates_items_list', sql`jsonb_typeof(${t.items}) = 'array' and jsonb_array_length(${t.items}) between 1 and 120`),
  ],
);

export const surveys = pgTable(
  'surveys',
  {
    id: id(),
    workshopId: workshopId(),
    pianoId: uuid().notNull(),
    /** The piano's owner when surveyed. */
    clientId: uuid().notNull(),
    surveyedOn: date({ mode: 'string' }).notNull(),
    place: text().notNull().default(''),
    assessorId: uuid().references(() => users.id, { onDelete: 'set null' }),
    pianoType: surveyPianoTypeEnum().notNull(),
    serialNumber: text().notNull().default(''),
    isSerialConfirmed: boolean().notNull().default(false),
    sizeMm: integer(),
    keytopMaterial: keytopMaterialEnum().notNull().default('unknown'),
    overallGrade: surveyGradeEnum(),
    overallCondition: text().notNull().default(''),
    recommendedWork: text().notNull().default(''),
    /** [{ choice, alternatives: [..] }]: what the client should weigh. */
    choices: jsonb().notNull().default(sql`'[]'::jsonb`),
    finishedAt: instant(),
    /** The job (and its estimates) prepared from this survey. */
    jobId: uuid(),
    version: integer().notNull().default(1),
    createdBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('surveys_id_workshop').on(t.id, t.workshopId),
    foreignKey({ name: 'surveys_piano_same_workshop', columns: [t.pianoId, t.workshopId], foreignColumns: [pianos.id, pianos.workshopId] }).onDelete('cascade'),
    foreignKey({ name: 'surveys_client_same_workshop', columns: [t.clientId, t.workshopId], foreignColumns: [clients.id, clients.workshopId] }),
    foreignKey({ name: 'surveys_job_same_workshop', columns: [t.jobId, t.workshopId], foreignColumns: [jobs.id, jobs.workshopId] }),
    check('surveys_size_plausible', sql`${t.sizeMm} is null or (${t.sizeMm} > 0 and ${t.sizeMm} <= 4000)`),
    check('surveys_choices_list', sql`jsonb_typeof(${t.choices}) = 'array'`),
    check('surveys_version_positive', sql`${t.version} >= 1`),
    index().on(t.workshopId, t.pianoId),
  ],
);

/**
 * One component's answer: a grade, or not inspected with a reason, or nothing yet. A measurement
 * is stored only for a component that takes it.
 */
export const surveyComponents = pgTable(
  'survey_components',
  {
    id: id(),
    workshopId: workshopId(),
    surveyId: uuid().notNull(),
    key: text().notNull(),
    area: text().notNull(),
    name: text().notNull(),
    hint: text().notNull().default(''),
    measure: surveyMeasureEnum(),
    position: integer().notNull(),
    grade: surveyGradeEnum(),
    notInspectedReason: text(),
    note: text().notNull().default(''),
    a4PitchCentiHz: integer(),
    tuningPinTorqueDeciNm: integer(),
    version: integer().notNull().default(1),
    updatedBy: uuid().references(() => users.id, { onDelete: 'set null' }),
    updatedAt: instant().notNull().defaultNow(),
  },
  (t) => [
    unique('survey_components_id_workshop').on(t.id, t.workshopId),
    unique('survey_components_key').on(t.surveyId, t.key),
    unique('survey_components_position').on(t.surveyId, t.position),
    foreignKey({ name: 'survey_components_survey_same_workshop', columns: [t.surveyId, t.workshopId], foreignColumns: [surveys.id, surveys.workshopId] }).onDelete('cascade'),
    check('survey_components_graded_or_not_inspected', sql`${t.grade} is null or ${t.notInspectedReason} is null`),
    check('survey_components_reason_not_blank', sql`${t.notInspectedReason} is null or length(trim(${t.notInspectedReason})) > 0`),
    check('survey_components_pitch_measured_here', sql`${t.a4PitchCentiHz} is null or (${t.measure} is not null and ${t.measure} = 'a4_pitch' and ${t.a4PitchCentiHz} between 30000 and 50000)`),
    check('survey_components_torque_measured_here', sql`${t.tuningPinTorqueDeciNm} is null or (${t.measure} is not null and ${t.measure} = 'tuning_pin_torque' and ${t.tuningPinTorqueDeciNm} between 0 and 400)`),
    check('survey_components_position_non_negative', sql`${t.position} >= 0`),
    check('survey_components_version_positive', sql`${t.version} >= 1`),
  ],
);
