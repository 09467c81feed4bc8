import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import postgres from 'postgres';
import supertest from 'supertest';
import { inject } from 'vitest';
import { createDatabase } from '@keybed/db/client';
import { createApp } from '../src/app';
import { loadConfig, type Config } from '../src/config/env';
import { createLogger } from '../src/lib/logger';
import { createSmtpMailer } from '../src/lib/mail';

const TEMPLATE_DB = 'keybed_api_template';
export const APP_ORIGIN = 'http://keybed.test';

function dbUrl(base: string, name: string) {
  return base.replace(/\/[^/]*$/, `/${name}`);
}

/** A database of this test file's own, cloned from the migrated template. */
export async function createTestDatabase(options: { onQuery?: (query: string) => void } = {}) {
  const base = inject('pgBaseUrl');
  const name = `keybed_t_${crypto.randomBytes(6).toString('hex')}`;
  const admin = postgres(base, { max: 1, onnotice: () => {} });
  await admin.unsafe(`CREATE DATABASE ${name} TEMPLATE ${TEMPLATE_DB}`);
  await admin.end();
  const url = dbUrl(base, name);
  const { db, sql } = createDatabase(url, { max: 5, onQuery: options.onQuery });
  return {
    url,
    db,
    sql,
    async drop() {
      await sql.end({ timeout: 5 });
      const a = postgres(base, { max: 1, onnotice: () => {} });
      await a.unsafe(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
      await a.end();
    },
  };
}

export interface TestAppOptions {
  limits?: Partial<Config['limits']>;
  now?: () => Date;
  /** Sees every SQL statement the app sends. */
  onQuery?: (query: string) => void;
  /** More environment for the app (S3, payments…); photos go to a fresh temporary folder unless UPLOAD_DIR is given. */
  env?: Record<string, string>;
}

/** The real app on a real database and the real SMTP client pointed at the fake mail server. */
export async function createTestApp(options: TestAppOptions = {}) {
  const database = await createTestDatabase({ onQuery: options.onQuery });
  const uploadDir = fs.mkdtempSync(path.join(os.tmpdir(), 'keybed-uploads-'));
  const base = loadConfig({
    UPLOAD_DIR: uploadDir,
    NODE_ENV: 'test',
    DATABASE_URL: database.url,
    APP_ORIGIN,
    SMTP_PORT: String(inject('smtpPort')),
    LOG_LEVEL: 'silent',
    ...options.env,
  });
  const config: Config = { ...base, limits: { ...base.limits, ...options.limits } };
  const mailer = createSmtpMailer(config.smtp);
  const app = createApp({ config, db: database.db, sql: database.sql, mailer, logger: createLogger('silent'), now: options.now });
  return {
    app,
    config,
    databaseUrl: database.url,
    uploadDir: base.uploads.dir,
    db: database.db,
    sql: database.sql,
    agent: () => supertest.agent(app),
    request: () => supertest(app),
    async close() {
      await app.close();
      mailer.close();
      await database.drop();
      fs.rmSync(uploadDir, { recursive: true, force: true });
    },
  };
}

export type TestApp = Awaited<ReturnType<typeof createTestApp>>;

export const unique = (label: string) => `${label}-${crypto.randomBytes(4).toString('hex')}`;
export const uniqueEmail = (label: string) => `${unique(label)}@fennick-test.example`;

/** Signs up a fresh workshop and returns its owner's agent (cookie kept) and details. */
export async function signUpWorkshop(t: TestApp, label = 'owner') {
  const agent = t.agent();
  const input = { workshopName: `Workshop ${unique(label)}`, name: 'Margaret Oyelaran', email: uniqueEmail(label), password: 'correct horse battery' };
  const res = await agent.post('/api/auth/sign-up').send(input).expect(201);
  const cookie = sessionCookieOf(res.headers['set-cookie']);
  return { agent, input, cookie, me: res.body as { user: { id: string }; workshop: { id: string; name: string }; role: string } };
}

interface InboxMessage {
  id: string;
  subject: string;
  text: string;
  to: Array<{ address: string }>;
}

/** Waits for a message to `address` in the fake mail server's inbox (read over its HTTP API). */
export async function waitForMail(address: string, timeoutMs = 5000): Promise<InboxMessage> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const res = await fetch(`${inject('inboxUrl')}/api/email`);
    const messages = (await res.json()) as InboxMessage[];
    const found = messages.filter((m) => m.to.some((t) => t.address.toLowerCase() === address.toLowerCase())).at(-1);
    if (found) return found;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`No e-mail to ${address} within ${timeoutMs} ms`);
}

/** The token of the first Keybed link of the given kind in a message. */
export function linkToken(message: InboxMessage, kind: 'invitations' | 'reset-password'): string {
  const match = new RegExp(`/${kind}/([A-Za-z0-9_-]{32,})`).exec(message.text);
  if (!match?.[1]) throw new Error(`No ${kind} link in the e-mail`);
  return match[1];
}

/** Invites a member by e-mail, accepts from the mailed link, and returns the new member's agent. */
export async function addMember(t: TestApp, owner: supertest.Agent, role: 'owner' | 'foreman' | 'technician') {
  const email = uniqueEmail(role);
  await owner.post('/api/team/invitations').send({ email, role }).expect(201);
  const token = linkToken(await waitForMail(email), 'invitations');
  const agent = t.agent();
  const res = await agent.post('/api/invitations/accept').send({ token, name: `Test ${role}`, password: 'member password 1' }).expect(200);
  return { agent, email, userId: res.body.user.id as string };
}

/** `keybed_session=…` from a response's Set-Cookie headers. */
export function sessionCookieOf(setCookie: string | string[] | undefined): string {
  const all = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  const found = all.map((c) => c.split(';')[0]!).find((c) => c.startsWith('keybed_session=') && c.length > 'keybed_session='.length);
  if (!found) throw new Error('No session cookie was set');
  return found;
}
