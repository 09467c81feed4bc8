import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import express, { Router } from 'express';
import { pinoHttp } from 'pino-http';
import type { Sql } from 'postgres';
import type { Database } from '@keybed/db/client';
import type { Config } from './config/env';
import { createAssessments } from './assessments';
import { createBench } from './bench';
import { apiNotFound, errorHandler } from './http/errors';
import { sameOriginOnly, securityHeaders } from './http/security';
import { sessionMiddleware } from './http/session';
import { createLiveEvents } from './lib/live-events';
import { scrubUrl, type Logger } from './lib/logger';
import type { Mailer } from './lib/mail';
import { createSessionStore } from './lib/sessions';
import { createAuthRepo } from './modules/auth/auth.repo';
import { authRouter } from './modules/auth/auth.router';
import { createAuthService } from './modules/auth/auth.service';
import { createBoardCache } from './modules/board/board-cache';
import { createBoardRepo } from './modules/board/board.repo';
import { boardRouter } from './modules/board/board.router';
import { createBoardService } from './modules/board/board.service';
import { createClientsRepo } from './modules/clients/clients.repo';
import { clientsRouter } from './modules/clients/clients.router';
import { createClientsService } from './modules/clients/clients.service';
import { createEventsRepo } from './modules/events/events.repo';
import { eventsRouter } from './modules/events/events.router';
import { healthRouter } from './modules/health/health.router';
import { createJobsRepo } from './modules/jobs/jobs.repo';
import { jobsRouter } from './modules/jobs/jobs.router';
import { createJobsService } from './modules/jobs/jobs.service';
import { createTechnicianLookup } from './modules/jobs/technicians';
import { createPianosRepo } from './modules/pianos/pianos.repo';
import { pianosRouter } from './modules/pianos/pianos.router';
import { createPianosService } from './modules/pianos/pianos.service';
import { createStagesRepo } from './modules/stages/stages.repo';
import { stagesRouter } from './modules/stages/stages.router';
import { createStagesService } from './modules/stages/stages.service';
import { createTeamRepo } from './modules/team/team.repo';
import { teamRouter } from './modules/team/team.router';
import { createTeamService } from './modules/team/team.service';
import { createMoney } from './money';

export interface AppDeps {
  config: Config;
  db: Database;
  sql: Sql;
  mailer: Mailer;
  logger: Logger;
  now?: () => Date;
  /** Keep each workshop's unfiltered board between changes (default on; the benchmark compares both). */
  cacheBoards?: boolean;
}

/**
 * Builds the Express app; `server.ts` listens. Tests build it on port 0 against a real database.
 * The app holds this process's LISTEN connection for live events: `close()` ends the open event
 * streams and stops listening (call it before closing the server and the pool); `liveStreamCount()`
 * says how many event streams this process is serving.
 */
export function createApp({ config, db, sql, mailer, logger, now = () => new Date(), cacheBoards = true }: AppDeps) {
  const boardCache = createBoardCache();
  const live = createLiveEvents({ sql, logger, onChange: boardCache.invalidate, onListen: cacheBoards ? boardCache.reset : undefined });
  const changed = boardCache.invalidate;
  const app = Object.assign(express(), { close: () => live.close(), liveStreamCount: () => live.subscriberCount() });
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy);

  const sessions = createSessionStore(db, config.session);
  const authRepo = createAuthRepo(db);
  const auth = createAuthService({ repo: authRepo, sessions, mailer, appOrigin: config.appOrigin, now });
  const team = createTeamService({ repo: createTeamRepo(db), sessions, mailer, appOrigin: config.appOrigin, now });
  const pianos = createPianosService({ repo: createPianosRepo(db), now, changed });
  const clients = createClientsService({ repo: createClientsRepo(db), pianos, now, changed });
  const stages = createStagesService({ repo: createStagesRepo(db), now, changed });
  const technicians = createTechnicianLookup(db);
  const jobs = createJobsService({ repo: createJobsRepo(db), technicians, now, changed });
  const board = createBoardService({ repo: createBoardRepo(db, technicians), technicians, cache: boardCache, now });
  const bench = createBench({ db, live, sessions, logger, limits: config.limits, now, changed });
  const money = createMoney({ db, logger, limits: config.limits, now, changed });
  const assessments = createAssessments({ config, db, mailer, logger, now, changed });

  app.use(
    pinoHttp({
      logger,
      genReqId: (req, res) => {
        const id = crypto.randomUUID();
        res.setHeader('X-Request-Id', id);
        return id;
      },
      serializers: {
        req: (req: { id: string; method: string; url: string }) => ({ id: req.id, method: req.method, url: scrubUrl(req.url) }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
      autoLogging: { ignore: (req) => req.url === '/api/health' },
    }),
  );
  app.use(securityHeaders());

  const api = Router();
  api.use(assessments.webhookRouter);
  api.use(express.json({ limit: '1mb' }));
  api.use(sameOriginOnly(config.appOrigin));
  api.use(healthRouter(sql));
  api.use(sessionMiddleware(sessions));
  api.use(bench.wallDevice);
  api.use(authRouter(auth, sessions, config.limits));
  api.use(teamRouter(team, auth, sessions));
  api.use(clientsRouter(clients));
  api.use(pianosRouter(pianos));
  api.use(stagesRouter(stages));
  api.use(jobsRouter(jobs));
  api.use(boardRouter(board));
  api.use(eventsRouter(live, createEventsRepo(db), now));
  api.use(bench.router);
  api.use(money.router);
  api.use(assessments.router);
  api.use(apiNotFound);
  app.use('/api', api);

  if (config.webDist && fs.existsSync(path.join(config.webDist, 'index.html'))) serveWeb(app, config.webDist);
  app.use(errorHandler);
  return app;
}

/** The built web app: hashed assets cached for a year, every other path gets index.html. */
function serveWeb(app: express.Express, dist: string) {
  app.use('/assets', express.static(path.join(dist, 'assets'), { immutable: true, maxAge: '365d', fallthrough: false }));
  app.use(express.static(dist, { index: false }));
  const indexHtml = path.join(dist, 'index.html');
  app.get('/{*splat}', (_req, res) => {
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexHtml);
  });
}
