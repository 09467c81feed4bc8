import { Router } from 'express';
import type { Database } from '@keybed/db/client';
import type { Config } from './config/env';
import type { LiveEvents } from './lib/live-events';
import type { Logger } from './lib/logger';
import type { SessionStore } from './lib/sessions';
import { createPinsRepo } from './modules/pins/pins.repo';
import { pinsRouter } from './modules/pins/pins.router';
import { createPinsService } from './modules/pins/pins.service';
import { createTaskTemplatesRepo } from './modules/tasks/task-templates.repo';
import { createTaskTemplatesService } from './modules/tasks/task-templates.service';
import { createTasksRepo } from './modules/tasks/tasks.repo';
import { tasksRouter } from './modules/tasks/tasks.router';
import { createTasksService } from './modules/tasks/tasks.service';
import { createClockService } from './modules/time/clock.service';
import { createEntriesService } from './modules/time/entries.service';
import { createTimeRepo } from './modules/time/time.repo';
import { timeRouter } from './modules/time/time.router';
import { createTimesheetsService } from './modules/time/timesheets.service';
import { wallDeviceMiddleware } from './modules/wall/device-session';
import { createWallRepo } from './modules/wall/wall.repo';
import { wallRouter } from './modules/wall/wall.router';
import { createWallService } from './modules/wall/wall.service';

interface BenchDeps {
  db: Database;
  live: LiveEvents;
  sessions: SessionStore;
  logger: Logger;
  limits: Config['limits'];
  now: () => Date;
  /** Told after a committed change that may alter the board (task assignees, status, estimates and logged minutes). */
  changed?: (workshopId: string) => void;
}

/**
 * Bench work (tasks, templates, time, PINs, the wall screen) wired in one place: `wallDevice`
 * resolves wall-screen cookies and goes after the member-session middleware; `router` goes
 * with the other routers.
 */
export function createBench({ db, live, sessions, logger, limits, now, changed }: BenchDeps) {
  const timeRepo = createTimeRepo(db);
  const templates = createTaskTemplatesService({ repo: createTaskTemplatesRepo(db), now });
  const tasks = createTasksService({ repo: createTasksRepo(db), templates: createTaskTemplatesRepo(db), now, changed });
  const clock = createClockService({ repo: timeRepo, now, changed });
  const entries = createEntriesService({ repo: timeRepo, now, changed });
  const timesheets = createTimesheetsService({ repo: timeRepo, now });
  const pins = createPinsService({ repo: createPinsRepo(db), logger, now, devicePerHour: limits.wallPinFailuresPerDevicePerHour });
  const wall = createWallService({ repo: createWallRepo(db), pins, clock, logger, now });

  const router = Router();
  router.use(tasksRouter(tasks, templates));
  router.use(timeRouter(clock, entries, timesheets));
  router.use(pinsRouter(pins));
  router.use(wallRouter(wall, sessions, live));
  return { wallDevice: wallDeviceMiddleware(wall), router };
}
