import { z } from 'zod';
import { Id } from './common';
import { CatalogueOperation } from './catalogue';
import { Estimate, EstimateLineInput, EstimateOptionInput, OptionKey } from './estimates';
import { SurveyChoice, SurveyGrade } from './surveys';

/*
 * Preparing an estimate from a survey. `GET /api/surveys/:id/estimate-proposal` lists every
 * component graded Needs work or Replace with the catalogue operations that remedy it, and the
 * choices the summary named. The assessor ticks, edits and adds, and `POST /api/surveys/:id/estimate`
 * creates a job on the piano that waits off the board (status "proposed") until the client
 * accepts, and a draft estimate on it.
 */

export const ProposedComponent = z.object({
  componentId: z.string(),
  key: z.string(),
  area: z.string(),
  name: z.string(),
  grade: SurveyGrade,
  note: z.string(),
  operations: z.array(CatalogueOperation),
});
export type ProposedComponent = z.infer<typeof ProposedComponent>;

export const EstimateProposal = z.object({
  surveyId: z.string(),
  components: z.array(ProposedComponent),
  choices: z.array(SurveyChoice),
  /** The job already prepared from this survey: a new draft goes on it as the next revision. */
  jobId: z.string().nullable(),
});
export type EstimateProposal = z.infer<typeof EstimateProposal>;

/**
 * One ticked operation (its catalogue lines, or `lines` as edited) or an added piece of work
 * (`lines` without an operation). `optionKey` puts all its lines in one option.
 */
export const SurveyEstimateItem = z
  .object({
    operationId: Id.optional(),
    componentIds: z.array(Id).max(20).default([]),
    optionKey: OptionKey.nullable().default(null),
    lines: z.array(EstimateLineInput).min(1, { error: 'Add at least one line' }).max(50).optional(),
  })
  .refine((v) => v.operationId || v.lines, { error: 'Choose an operation or add lines', path: ['operationId'] });
export type SurveyEstimateItem = z.infer<typeof SurveyEstimateItem>;

export const CreateSurveyEstimateInput = z
  .object({
    title: z.string().trim().max(200, { error: 'Title is too long' }).optional(),
    notes: z.string().trim().max(5000, { error: 'Notes are too long' }).default(''),
    options: z.array(EstimateOptionInput).max(20, { error: 'At most 20 options' }).default([]),
    items: z.array(SurveyEstimateItem).min(1, { error: 'Tick at least one operation' }).max(100, { error: 'At most 100 items' }),
  })
  .superRefine((v, ctx) => {
    const keys = new Set(v.options.map((o) => o.key));
    v.items.forEach((item, i) => {
      if (item.optionKey && !keys.has(item.optionKey)) ctx.addIssue({ code: 'custom', message: 'No option has this key', path: ['items', i, 'optionKey'] });
    });
  });
export type CreateSurveyEstimateInput = z.infer<typeof CreateSurveyEstimateInput>;

export const SurveyEstimateResult = z.object({ jobId: z.string(), estimate: Estimate });
export type SurveyEstimateResult = z.infer<typeof SurveyEstimateResult>;
