import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import express, { Router } from 'express';
import { pinoHttp } from 'pino-http';
import type { Sql } from 'postgres';
import type { Database } from '@keybed/db/client';
import type { Config } from './config/env';
import { apiNotFound, errorHandler } from './http/errors';
import { sameOriginOnly, securityHeaders } from './http/security';
import { sessionMiddleware } from './http/session';
import { scrubUrl, type Logger } from './lib/logger';
import type { Mailer } from './lib/mail';
import { createSessionStore } from './lib/sessions';
import { createAuthRepo } from './modules/auth/auth.repo';
import { authRouter } from './modules/auth/auth.router';
import { createAuthService } from './modules/auth/auth.service';
import { healthRouter } from './modules/health/health.router';
import { createTeamRepo } from './modules/team/team.repo';
import { teamRouter } from './modules/team/team.router';
import { createTeamService } from './modules/team/team.service';

export interface AppDeps {
  config: Config;
  db: Database;
  sql: Sql;
  mailer: Mailer;
  logger: Logger;
  now?: () => Date;
}

/** Builds the Express app; `server.ts` listens. Tests build it on port 0 against a real database. */
export function createApp({ config, db, sql, mailer, logger, now = () => new Date() }: AppDeps) {
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', config.trustProxy);

  const sessions = createSessionStore(db, config.session);
  const authRepo = createAuthRepo(db);
  const auth = createAuthService({ repo: authRepo, sessions, mailer, appOrigin: config.appOrigin, now });
  const team = createTeamService({ repo: createTeamRepo(db), sessions, mailer, appOrigin: config.appOrigin, now });

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
  api.use(express.json({ limit: '1mb' }));
  api.use(sameOriginOnly(config.appOrigin));
  api.use(healthRouter(sql));
  api.use(sessionMiddleware(sessions, authRepo.findMembership));
  api.use(authRouter(auth, sessions, config.limits));
  api.use(teamRouter(team, auth, sessions));
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
