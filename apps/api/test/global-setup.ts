import path from 'node:path';
import { fileURLToPath } from 'node:url';
import postgres from 'postgres';
import type { TestProject } from 'vitest/node';
import { runMigrations } from '@keybed/db/migrate';
// Plain JS set-up helpers shared with scripts/test.mjs.
import { startCluster } from '../../../scripts/lib/postgres.mjs';
import { startMailbox } from '../../../scripts/lib/mail.mjs';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../../..');
export const TEMPLATE_DB = 'keybed_api_template';

declare module 'vitest' {
  export interface ProvidedContext {
    pgBaseUrl: string;
    smtpPort: number;
    inboxUrl: string;
  }
}

/**
 * Uses the cluster and fake mail server that `npm test` started (KEYBED_TEST_PG_URL,
 * KEYBED_TEST_SMTP_PORT, KEYBED_TEST_INBOX_URL), or starts its own when run alone.
 * Migrates one template database that every test file clones.
 */
export default async function setup(project: TestProject) {
  const stops: Array<() => Promise<unknown>> = [];
  let pgBaseUrl = process.env.KEYBED_TEST_PG_URL;
  if (!pgBaseUrl) {
    const cluster = await startCluster({ root, name: 'pg-test', preferredPort: 55432, fast: true });
    pgBaseUrl = cluster.url('postgres');
  }
  let smtpPort = Number(process.env.KEYBED_TEST_SMTP_PORT);
  let inboxUrl = process.env.KEYBED_TEST_INBOX_URL;
  if (!smtpPort || !inboxUrl) {
    const mailbox = await startMailbox({ root, smtpPort: 41025, webPort: 41080 });
    stops.push(mailbox.stop);
    smtpPort = mailbox.smtpPort;
    inboxUrl = mailbox.inboxUrl;
  }

  const admin = postgres(pgBaseUrl, { max: 1, onnotice: () => {} });
  await admin.unsafe(`DROP DATABASE IF EXISTS ${TEMPLATE_DB} WITH (FORCE)`);
  await admin.unsafe(`CREATE DATABASE ${TEMPLATE_DB}`);
  await runMigrations(pgBaseUrl.replace(/\/[^/]*$/, `/${TEMPLATE_DB}`));
  await admin.end();

  project.provide('pgBaseUrl', pgBaseUrl);
  project.provide('smtpPort', smtpPort);
  project.provide('inboxUrl', inboxUrl);
  return async () => {
    for (const stop of stops) await stop();
  };
}
