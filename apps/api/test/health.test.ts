import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import crypto from 'node:crypto';
import supertest from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { createDatabase } from '@keybed/db/client';
import { clusterBase, startCluster } from '../../../scripts/lib/postgres.mjs';
import { createApp } from '../src/app';
import { loadConfig } from '../src/config/env';
import { createLogger } from '../src/lib/logger';
import { createSmtpMailer } from '../src/lib/mail';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');
const name = `pg-health-${crypto.randomBytes(3).toString('hex')}`;
let stopCluster: (() => Promise<unknown>) | undefined;

afterAll(async () => {
  await stopCluster?.().catch(() => {});
  fs.rmSync(path.join(clusterBase(root), name), { recursive: true, force: true });
});

describe('GET /api/health', () => {
  it('when the database stops, then 503 with db not ok; when it returns, then 200 again by itself', async () => {
    // A cluster of this test's own, so stopping it disturbs no other test.
    const first = await startCluster({ root, name, preferredPort: 56500, fresh: true, fast: true });
    stopCluster = first.stop;
    const url = first.url('postgres');
    const config = loadConfig({ NODE_ENV: 'test', DATABASE_URL: url, LOG_LEVEL: 'silent' });
    const { db, sql } = createDatabase(url, { max: 2 });
    const app = createApp({ config, db, sql, mailer: createSmtpMailer(config.smtp), logger: createLogger('silent') });

    expect((await supertest(app).get('/api/health').expect(200)).body).toEqual({ status: 'ok', db: 'ok' });

    await first.stop();
    const down = await supertest(app).get('/api/health').expect(503);
    expect(down.body.db).not.toBe('ok');

    const again = await startCluster({ root, name, preferredPort: first.port });
    stopCluster = again.stop;
    expect(again.port).toBe(first.port);
    expect((await supertest(app).get('/api/health').expect(200)).body.db).toBe('ok');
    await sql.end({ timeout: 2 });
  });
});
