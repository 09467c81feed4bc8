// `npm run bench:clock`: 20 technicians clocking on and off across tasks as fast as the API
// allows, for a fixed time, from parallel connections spread over two API processes, next to the
// floor endpoint (GET /api/health: one `SELECT 1`) measured in the same run. Afterwards the
// database is checked: no technician with two running entries, no overlapping entries, every
// request applied or refused with a 4xx (never a 5xx), and one entry per applied clock-on.
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import postgres from 'postgres';
import { createDatabase } from '@keybed/db/client';
import { runMigrations } from '@keybed/db/migrate';
import { createApp } from '../apps/api/src/app';
import { loadConfig } from '../apps/api/src/config/env';
import { createLogger } from '../apps/api/src/lib/logger';
import { createSmtpMailer } from '../apps/api/src/lib/mail';
import { hashPassword } from '../apps/api/src/lib/password';
import { clusterBase, startCluster } from './lib/postgres.mjs';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const DATABASE = 'keybed_bench_clock';
const SHAPE = { technicians: 20, loopsPerTechnician: 2, jobs: 5, tasksPerJob: 6, processes: 2 };
const LOAD = { warmUpSeconds: 2, seconds: 10 };
const PASSWORD = 'keybed-bench';

const say = (line: string) => console.log(`[bench] ${line}`);

// A cluster of this benchmark's own, so that stopping it at the end never stops another benchmark's.
const CLUSTER = 'pg-bench-clock';
const wasRunning = fs.existsSync(path.join(clusterBase(ROOT), CLUSTER, 'data', 'postmaster.pid'));
const cluster = await startCluster({ root: ROOT, name: CLUSTER, preferredPort: 55600, fast: true });
await cluster.createDatabase(DATABASE, { recreate: true });
const url = cluster.url(DATABASE);
await runMigrations(url);
const config = loadConfig({ NODE_ENV: 'production', DATABASE_URL: url, APP_ORIGIN: 'http://127.0.0.1', LOG_LEVEL: 'silent' });
const mailer = createSmtpMailer(config.smtp);
const processes = await Promise.all(Array.from({ length: SHAPE.processes }, () => startApp()));
const sql = postgres(url, { max: 2, onnotice: () => {} });

try {
  const owner = await signUp();
  const technicians = await addTechnicians(owner.workshopId);
  const taskIds = await addTasks(owner.cookie);
  say(`${SHAPE.technicians} technicians × ${SHAPE.loopsPerTechnician} connections over ${SHAPE.processes} API processes, ${taskIds.length} tasks on ${SHAPE.jobs} jobs, ${LOAD.seconds} s per phase`);

  const connections = SHAPE.technicians * SHAPE.loopsPerTechnician;
  await drive(LOAD.warmUpSeconds, connections, (i) => health(i, technicians));
  const floor = await drive(LOAD.seconds, connections, (i) => health(i, technicians));
  await sql`delete from time_entries`;
  const clock = await drive(LOAD.seconds, connections, (i) => clockAction(i, technicians, taskIds));

  const checks = await integrity();
  const line = (name: string, r: Phase) =>
    `${name}: ${r.opsPerSecond.toFixed(0).padStart(5)} ops/s, p50 ${r.p50.toFixed(1).padStart(5)} ms, p99 ${r.p99.toFixed(1).padStart(5)} ms`;
  say(line('floor  GET /api/health (SELECT 1)            ', floor));
  say(line('clock  POST /api/time/clock-on | clock-off    ', clock));
  say(`ratio clock/floor: ${(clock.opsPerSecond / floor.opsPerSecond).toFixed(2)} ops/s, p99 ${(clock.p99 / floor.p99).toFixed(2)}×`);
  say(`clock requests: ${clock.count} — applied ${clock.byKind.applied}, refused 409 ${clock.byKind.refused409}, refused other 4xx ${clock.byKind.refused4xx}, failed (5xx or network) ${clock.byKind.failed}`);
  say(`clock-ons applied ${clock.clockOnsApplied}, entries in the database ${checks.entries}`);
  const violations = checks.doubleRunning + checks.overlaps + clock.byKind.failed + Math.abs(checks.entries - clock.clockOnsApplied);
  say(`violations: ${violations} (technicians with two running entries ${checks.doubleRunning}, overlapping pairs ${checks.overlaps}, failed requests ${clock.byKind.failed}, entries not matching applied clock-ons ${Math.abs(checks.entries - clock.clockOnsApplied)})`);
  if (violations > 0) process.exitCode = 1;
} finally {
  for (const p of processes) await p.close();
  await sql.end({ timeout: 5 });
  mailer.close();
  const admin = postgres(cluster.url('postgres'), { max: 1, onnotice: () => {} });
  await admin.unsafe(`DROP DATABASE IF EXISTS ${DATABASE} WITH (FORCE)`);
  await admin.end();
  if (!wasRunning) await cluster.stop();
}

interface Technician {
  cookie: string;
  base: string;
}

interface Outcome {
  status: number;
  isClockOn: boolean;
}

interface Phase {
  count: number;
  opsPerSecond: number;
  p50: number;
  p99: number;
  byKind: { applied: number; refused409: number; refused4xx: number; failed: number };
  clockOnsApplied: number;
}

/** One API process on its own pool, listening on a free port of 127.0.0.1. */
async function startApp() {
  const { db, sql: pool } = createDatabase(url, { max: 10 });
  const app = createApp({ config, db, sql: pool, mailer, logger: createLogger('silent') });
  const server = http.createServer({ keepAlive: true }, app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  return {
    base: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    async close() {
      await app.close();
      server.closeAllConnections();
      await new Promise((resolve) => server.close(resolve));
      await pool.end({ timeout: 5 });
    },
  };
}

function sessionCookie(res: Response) {
  return res.headers.getSetCookie().map((c) => c.split(';')[0]!).find((c) => c.startsWith('keybed_session='))!;
}

async function signUp() {
  const res = await fetch(`${processes[0]!.base}/api/auth/sign-up`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ workshopName: 'Fennick Cross Piano Works (bench)', name: 'Margaret Oyelaran', email: 'margaret.bench@fennick.example', password: PASSWORD }),
  });
  if (res.status !== 201) throw new Error(`sign-up answered ${res.status}`);
  return { cookie: sessionCookie(res), workshopId: ((await res.json()) as { workshop: { id: string } }).workshop.id };
}

/** Technician accounts straight in the database (one password hash for all), then a session each. */
async function addTechnicians(workshopId: string): Promise<Technician[]> {
  const passwordHash = await hashPassword(PASSWORD);
  const emails = Array.from({ length: SHAPE.technicians }, (_, i) => `technician${i + 1}.bench@fennick.example`);
  await sql.begin(async (tx) => {
    for (const [i, email] of emails.entries()) {
      const [user] = await tx<{ id: string }[]>`insert into users (email, name, password_hash) values (${email}, ${`Bench technician ${i + 1}`}, ${passwordHash}) returning id`;
      await tx`insert into memberships (workshop_id, user_id, role) values (${workshopId}, ${user!.id}, 'technician')`;
    }
  });
  return Promise.all(
    emails.map(async (email, i) => {
      const base = processes[i % processes.length]!.base;
      const res = await fetch(`${base}/api/auth/sign-in`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ email, password: PASSWORD }) });
      if (res.status !== 200) throw new Error(`sign-in answered ${res.status}`);
      return { cookie: sessionCookie(res), base };
    }),
  );
}

/** Jobs and tasks made through the API by the owner. */
async function addTasks(cookie: string) {
  const base = processes[0]!.base;
  const post = async (route: string, body: unknown) => {
    const res = await fetch(`${base}${route}`, { method: 'POST', headers: { cookie, 'content-type': 'application/json' }, body: JSON.stringify(body) });
    if (res.status !== 201) throw new Error(`POST ${route} answered ${res.status}`);
    return (await res.json()) as { id: string };
  };
  const client = await post('/api/clients', { name: 'Oscar Feld' });
  const piano = await post('/api/pianos', { clientId: client.id, maker: 'Brandauer & Sons', model: 'Parlour', type: 'grand', sizeMm: 1575 });
  const ids: string[] = [];
  for (let j = 0; j < SHAPE.jobs; j++) {
    const job = await post('/api/jobs', { pianoId: piano.id, title: `Full restring ${j + 1}` });
    for (let k = 0; k < SHAPE.tasksPerJob; k++) ids.push((await post(`/api/jobs/${job.id}/tasks`, { title: `Restring section ${k + 1}`, estimatedMinutes: 120 })).id);
  }
  return ids;
}

/** Connection `i` belongs to technician `i mod 20`; two connections per technician contend for the same person. */
function technicianOf(i: number, technicians: Technician[]) {
  return technicians[i % technicians.length]!;
}

async function health(i: number, technicians: Technician[]): Promise<Outcome> {
  const res = await fetch(`${technicianOf(i, technicians).base}/api/health`);
  await res.arrayBuffer();
  return { status: res.status, isClockOn: false };
}

/** Two clock-ons (to a random task) for every clock-off. */
async function clockAction(i: number, technicians: Technician[], taskIds: string[]): Promise<Outcome> {
  const tech = technicianOf(i, technicians);
  const isClockOn = Math.random() < 2 / 3;
  const body = isClockOn ? { taskId: taskIds[Math.floor(Math.random() * taskIds.length)] } : {};
  const res = await fetch(`${tech.base}/api/time/${isClockOn ? 'clock-on' : 'clock-off'}`, {
    method: 'POST',
    headers: { cookie: tech.cookie, 'content-type': 'application/json' },
    body: JSON.stringify(body),
  });
  await res.arrayBuffer();
  return { status: res.status, isClockOn };
}

/** Runs `connections` loops of `action` for `seconds`; each loop waits for its answer before the next request. */
async function drive(seconds: number, connections: number, action: (i: number) => Promise<Outcome>): Promise<Phase> {
  const latencies: number[] = [];
  const byKind = { applied: 0, refused409: 0, refused4xx: 0, failed: 0 };
  let clockOnsApplied = 0;
  const started = performance.now();
  const until = started + seconds * 1000;
  await Promise.all(
    Array.from({ length: connections }, async (_, i) => {
      while (performance.now() < until) {
        const t0 = performance.now();
        const outcome = await action(i).catch(() => ({ status: 0, isClockOn: false }));
        latencies.push(performance.now() - t0);
        if (outcome.status === 200 || outcome.status === 201) byKind.applied++;
        else if (outcome.status === 409) byKind.refused409++;
        else if (outcome.status >= 400 && outcome.status < 500) byKind.refused4xx++;
        else byKind.failed++;
        if (outcome.isClockOn && outcome.status === 201) clockOnsApplied++;
      }
    }),
  );
  const elapsed = (performance.now() - started) / 1000;
  latencies.sort((a, b) => a - b);
  const at = (q: number) => latencies[Math.min(latencies.length - 1, Math.floor(q * latencies.length))] ?? 0;
  return { count: latencies.length, opsPerSecond: latencies.length / elapsed, p50: at(0.5), p99: at(0.99), byKind, clockOnsApplied };
}

/** What the database holds after the run, checked with plain SQL (not through the API). */
async function integrity() {
  const [row] = await sql<{ double_running: number; overlaps: number; entries: number }[]>`
    select
      (select count(*)::int from (select 1 from time_entries where ended_at is null group by workshop_id, technician_id having count(*) > 1) d) as double_running,
      (select count(*)::int from time_entries a join time_entries b
         on a.workshop_id = b.workshop_id and a.technician_id = b.technician_id and a.id < b.id
        and tstzrange(a.started_at, coalesce(a.ended_at, 'infinity')) && tstzrange(b.started_at, coalesce(b.ended_at, 'infinity'))) as overlaps,
      (select count(*)::int from time_entries) as entries`;
  return { doubleRunning: row!.double_running, overlaps: row!.overlaps, entries: row!.entries };
}
