import { Router } from 'express';
import type { Database } from '@keybed/db/client';
import type { Config } from './config/env';
import type { Changed } from './lib/live-events';
import type { Logger } from './lib/logger';
import type { Mailer } from './lib/mail';
import { createPaymentsClient } from './lib/payments';
import { createStorage, type Storage } from './lib/storage';
import { createCatalogueRepo } from './modules/catalogue/catalogue.repo';
import { catalogueRouter } from './modules/catalogue/catalogue.router';
import { createCatalogueService } from './modules/catalogue/catalogue.service';
import { createClientPageRepo } from './modules/client-page/client-page.repo';
import { clientPageRouter } from './modules/client-page/client-page.router';
import { createClientPageService } from './modules/client-page/client-page.service';
import { createEstimatesRepo } from './modules/estimates/estimates.repo';
import { createEstimatesService } from './modules/estimates/estimates.service';
import { createPaymentsRepo } from './modules/payments/payments.repo';
import { paymentsRouter, paymentsWebhookRouter } from './modules/payments/payments.router';
import { createPaymentsService } from './modules/payments/payments.service';
import { createSettingsRepo } from './modules/settings/settings.repo';
import { createSettingsService } from './modules/settings/settings.service';
import { createProposedJobsRepo } from './modules/surveys/proposed-jobs.repo';
import { createSurveyEstimateService } from './modules/surveys/survey-estimate.service';
import { createSurveysRepo } from './modules/surveys/surveys.repo';
import { surveysRouter } from './modules/surveys/surveys.router';
import { createSurveysService } from './modules/surveys/surveys.service';
import { createUploadsRepo } from './modules/uploads/uploads.repo';
import { uploadsRouter } from './modules/uploads/uploads.router';
import { createUploadsService } from './modules/uploads/uploads.service';

interface AssessmentDeps {
  config: Config;
  db: Database;
  mailer: Mailer;
  logger: Logger;
  now: () => Date;
  changed: Changed;
  /** Where photos go; by default the local folder or the S3 bucket the configuration names. */
  storage?: Storage;
}

/**
 * From assessment to accepted work, wired in one place: condition surveys and their templates,
 * photos, the work catalogue, estimates prepared from a survey, sending them, the client's page
 * and card deposits. `router` goes with the other routers; `webhookRouter` before the JSON body
 * parser (the payment provider's signature covers the raw body).
 */
export function createAssessments({ config, db, mailer, logger, now, changed, storage = createStorage(config.uploads) }: AssessmentDeps) {
  const settings = createSettingsService({ repo: createSettingsRepo(db), now });
  const estimates = createEstimatesService({ repo: createEstimatesRepo(db), settings, now, changed });
  const surveysRepo = createSurveysRepo(db);
  const surveys = createSurveysService({ repo: surveysRepo, now });
  const uploads = createUploadsService({ repo: createUploadsRepo(db), storage, logger, now });
  const catalogueRepo = createCatalogueRepo(db);
  const catalogue = createCatalogueService({ repo: catalogueRepo, settings, now });
  const jobs = createProposedJobsRepo(db);
  const prepare = createSurveyEstimateService({ surveys: surveysRepo, jobs, catalogueRepo, catalogue, estimates, now, changed });
  const payments = createPaymentsService({ repo: createPaymentsRepo(db), client: config.payments ? createPaymentsClient(config.payments) : null, logger, now, changed });
  const clientPage = createClientPageService({ repo: createClientPageRepo(db), jobs, estimates, payments, storage, mailer, logger, appOrigin: config.appOrigin, now, changed });

  const router = Router();
  router.use(surveysRouter(surveys, prepare));
  router.use(uploadsRouter(uploads, config.uploads));
  router.use(catalogueRouter(catalogue));
  router.use(clientPageRouter(clientPage));
  router.use(paymentsRouter(payments, async (workshopId, jobId) => Boolean(await jobs.jobOf(workshopId, jobId))));
  return { router, webhookRouter: paymentsWebhookRouter(payments) };
}
