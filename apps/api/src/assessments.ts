import { Router } from 'express';
import type { Database } from '@keybed/db/client';
import type { Config } from './config/env';
import type { Changed } from './lib/live-events';
import type { Logger } from './lib/logger';
import type { Mailer } from './lib/mail';
import { createStorage, type Storage } from './lib/storage';
import { createCatalogueRepo } from './modules/catalogue/catalogue.repo';
import { catalogueRouter } from './modules/catalogue/catalogue.router';
import { createCatalogueService } from './modules/catalogue/catalogue.service';
import { createSettingsRepo } from './modules/settings/settings.repo';
import { createSettingsService } from './modules/settings/settings.service';
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
 * photos, the work catalogue. `router` goes with the other routers.
 */
export function createAssessments({ config, db, logger, now, storage = createStorage(config.uploads) }: AssessmentDeps) {
  const settings = createSettingsService({ repo: createSettingsRepo(db), now });
  const surveys = createSurveysService({ repo: createSurveysRepo(db), now });
  const catalogue = createCatalogueService({ repo: createCatalogueRepo(db), settings, now });
  const uploads = createUploadsService({ repo: createUploadsRepo(db), storage, logger, now });

  const router = Router();
  router.use(surveysRouter(surveys));
  router.use(uploadsRouter(uploads, config.uploads));
  router.use(catalogueRouter(catalogue));
  return { router };
}
