import {
  CreateEstimateInput,
  GRADES_NEEDING_WORK,
  SurveyChoice,
  type CreateSurveyEstimateInput,
  type EstimateLineInput,
  type EstimateProposal,
  type SurveyEstimateResult,
  type SurveyGrade,
} from '@keybed/shared';
import type { AuthContext } from '../../http/context';
import { AppError, notFound } from '../../http/errors';
import { notifyLive, type Changed } from '../../lib/live-events';
import type { CatalogueLineRow, CatalogueRepo } from '../catalogue/catalogue.repo';
import type { CatalogueService } from '../catalogue/catalogue.service';
import type { EstimatesService } from '../estimates/estimates.service';
import type { ProposedJobsRepo } from './proposed-jobs.repo';
import type { SurveysRepo } from './surveys.repo';

interface Deps {
  surveys: SurveysRepo;
  jobs: ProposedJobsRepo;
  catalogueRepo: CatalogueRepo;
  catalogue: CatalogueService;
  estimates: EstimatesService;
  now: () => Date;
  changed: Changed;
}

/** A catalogue line as an estimate line, in the option the assessor put its operation in. */
function toEstimateLine({ line }: CatalogueLineRow, optionKey: string | null): EstimateLineInput {
  if (line.kind === 'labour') return { kind: 'labour', description: line.description, minutes: line.minutes!, optionKey };
  if (line.kind === 'part') return { kind: 'part', partId: line.partId!, description: line.description, quantityMilli: line.quantityMilli!, optionKey };
  const description = line.supplier ? `${line.description} (${line.supplier})` : line.description;
  return { kind: 'sublet', description, quantityMilli: line.quantityMilli!, unitPriceMinor: line.unitPriceMinor!, unitCostMinor: line.unitCostMinor ?? undefined, optionKey };
}

/**
 * "Prepare estimate": proposes catalogue operations for the components found wanting, and turns
 * the assessor's choice into a proposed job on the piano with a draft estimate made by the
 * estimates service (the same rules, prices and revisions as any other estimate).
 */
export function createSurveyEstimateService({ surveys, jobs, catalogueRepo, catalogue, estimates, now, changed }: Deps) {
  return {
    async proposal(auth: AuthContext, surveyId: string): Promise<EstimateProposal> {
      const survey = await surveys.find(auth.workshopId, surveyId);
      if (!survey) throw notFound('That survey');
      const wanting = await surveys.needingWork(surveyId);
      const ops = await catalogueRepo.list(auth.workshopId, { pianoType: survey.pianoType });
      const views = await catalogue.views(auth.role, auth.workshopId, ops);
      return {
        surveyId,
        jobId: survey.jobId,
        choices: SurveyChoice.array().parse(survey.choices),
        components: wanting.map((c) => ({
          componentId: c.id,
          key: c.key,
          area: c.area,
          name: c.name,
          grade: c.grade as SurveyGrade,
          note: c.note,
          operations: views.filter((op) => op.componentKeys.includes(c.key)),
        })),
      };
    },

    async create(auth: AuthContext, surveyId: string, input: CreateSurveyEstimateInput): Promise<SurveyEstimateResult> {
      const survey = await surveys.find(auth.workshopId, surveyId);
      if (!survey) throw notFound('That survey');
      const wanting = new Set((await surveys.components(surveyId)).filter((c) => c.grade && GRADES_NEEDING_WORK.includes(c.grade)).map((c) => c.id));
      const operationIds = [...new Set(input.items.flatMap((i) => (i.operationId ? [i.operationId] : [])))];
      const known = new Set((await catalogueRepo.list(auth.workshopId, { includeInactive: true, ids: operationIds })).map((o) => o.id));
      const catalogueLines = await catalogueRepo.linesOf([...known]);
      const lines = input.items.flatMap((item, i) => {
        if (item.operationId && !known.has(item.operationId)) throw new AppError('validation_failed', 400, 'There is no such catalogue operation', { [`items.${i}.operationId`]: ['There is no such catalogue operation'] });
        const stray = item.componentIds.find((id) => !wanting.has(id));
        if (stray) throw new AppError('validation_failed', 400, 'Choose components of this survey graded Needs work or Replace', { [`items.${i}.componentIds`]: ['Choose components of this survey graded Needs work or Replace'] });
        if (item.lines) return item.lines.map((l) => ({ ...l, optionKey: item.optionKey }));
        return catalogueLines.filter((r) => r.line.operationId === item.operationId).map((r) => toEstimateLine(r, item.optionKey));
      });
      const title = input.title ?? (survey.recommendedWork.split('\n')[0]?.trim().slice(0, 200) || `Work from the survey of ${survey.surveyedOn}`);
      const estimateInput = CreateEstimateInput.parse({ title, notes: input.notes, options: input.options, lines });

      let jobId = survey.jobId;
      let isNewJob = false;
      if (jobId) {
        const job = await jobs.jobOf(auth.workshopId, jobId);
        if (job?.status !== 'proposed') throw new AppError('estimate_status', 409, 'The work from this survey is already agreed. Add further work to its job as a variation.');
      } else {
        const at = now();
        jobId = await jobs.transaction(async (tx) => {
          const id = await jobs.create(tx, { workshopId: auth.workshopId, surveyId, clientId: survey.clientId, pianoId: survey.pianoId, title, at });
          if (id) await notifyLive(tx, auth.workshopId, 'job.updated', id, at);
          return id;
        });
        if (!jobId) throw new AppError('conflict', 409, 'The board has no active stage. Restore or add a stage first.');
        isNewJob = true;
        changed(auth.workshopId);
      }
      try {
        const estimate = await estimates.create(auth, jobId, estimateInput);
        return { jobId, estimate };
      } catch (err) {
        if (isNewJob) await jobs.remove(auth.workshopId, surveyId, jobId);
        throw err;
      }
    },
  };
}

export type SurveyEstimateService = ReturnType<typeof createSurveyEstimateService>;
