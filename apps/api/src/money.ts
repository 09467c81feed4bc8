import { Router } from 'express';
import type { Database } from '@keybed/db/client';
import type { Config } from './config/env';
import type { Changed } from './lib/live-events';
import type { Logger } from './lib/logger';
import { createCostingRepo } from './modules/costing/costing.repo';
import { costingRouter } from './modules/costing/costing.router';
import { createCostingService } from './modules/costing/costing.service';
import { createEstimatesRepo } from './modules/estimates/estimates.repo';
import { estimatesRouter } from './modules/estimates/estimates.router';
import { createEstimatesService } from './modules/estimates/estimates.service';
import { createPartsRepo } from './modules/parts/parts.repo';
import { partsRouter } from './modules/parts/parts.router';
import { createPartsService } from './modules/parts/parts.service';
import { createStockService } from './modules/parts/stock.service';
import { createPinsRepo } from './modules/pins/pins.repo';
import { createPinsService } from './modules/pins/pins.service';
import { createSettingsRepo } from './modules/settings/settings.repo';
import { settingsRouter } from './modules/settings/settings.router';
import { createSettingsService } from './modules/settings/settings.service';

interface MoneyDeps {
  db: Database;
  logger: Logger;
  limits: Config['limits'];
  now: () => Date;
  /** Told after a committed change that may alter the board (tasks an accepted estimate creates). */
  changed?: Changed;
}

/**
 * Settings, cost rates, parts and stock, estimates and costing wired in one place; `router` goes
 * with the other routers. The wall screen's parts-used check their PIN like its clock actions.
 */
export function createMoney({ db, logger, limits, now, changed }: MoneyDeps) {
  const settings = createSettingsService({ repo: createSettingsRepo(db), now });
  const partsRepo = createPartsRepo(db);
  const parts = createPartsService({ repo: partsRepo, now });
  const pins = createPinsService({ repo: createPinsRepo(db), logger, now, devicePerHour: limits.wallPinFailuresPerDevicePerHour });
  const stock = createStockService({ repo: partsRepo, pins, now });
  const estimates = createEstimatesService({ repo: createEstimatesRepo(db), settings, now, changed });
  const costing = createCostingService({ repo: createCostingRepo(db), settings, now });

  const router = Router();
  router.use(settingsRouter(settings));
  router.use(partsRouter(parts, stock));
  router.use(estimatesRouter(estimates));
  router.use(costingRouter(costing));
  return { router };
}
