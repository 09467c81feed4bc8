import { Router } from 'express';
import type { Database } from '@keybed/db/client';
import type { Changed } from './lib/live-events';
import { createSurveysRepo } from './modules/surveys/surveys.repo';
import { surveysRouter } from './modules/surveys/surveys.router';
import { createSurveysService } from './modules/surveys/surveys.service';

interface AssessmentDeps {
  db: Database;
  now: () => Date;
  changed: Changed;
}

/**
 * From assessment to accepted work, wired in one place: condition surveys and their templates.
 * `router` goes with the other routers.
 */
export function createAssessments({ db, now }: AssessmentDeps) {
  const surveys = createSurveysService({ repo: createSurveysRepo(db), now });

  const router = Router();
  router.use(surveysRouter(surveys));
  return { router };
}
