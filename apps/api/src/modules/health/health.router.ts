import { Router } from 'express';
import type { Sql } from 'postgres';
import { routesOn } from '../../http/context';

const DB_CHECK_TIMEOUT_MS = 2000;

/** 200 when the database answers `SELECT 1` in time, else 503; recovers by itself when it returns. */
export function healthRouter(sql: Sql) {
  const router = Router();
  routesOn(router).get('/health', 'public', async (_req, res) => {
    const isDbOk = await Promise.race([
      sql`select 1`.then(() => true, () => false),
      new Promise<boolean>((resolve) => setTimeout(() => resolve(false), DB_CHECK_TIMEOUT_MS).unref()),
    ]);
    res.status(isDbOk ? 200 : 503).json({ status: isDbOk ? 'ok' : 'degraded', db: isDbOk ? 'ok' : 'unreachable' });
  });
  return router;
}
