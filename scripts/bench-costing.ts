// `npm run bench:costing`: how fast the owner's margins report answers for a workshop with 1,000
// jobs (40 time entries and 5 parts movements each) over a whole year, against a floor endpoint
// (GET /api/health: one `SELECT 1`) through the same stack, measured in the same run; and how many
// SQL statements one report takes (it must not grow with the number of jobs).
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import autocannon from 'autocannon';
import postgres from 'postgres';
import { createDatabase } from '@keybed/db/client';
import { runMigrations } from '@keybed/db/migrate';
import { createApp } from '../apps/api/src/app';
import { loadConfig } from '../apps/api/src/config/env';
import { createLogger } from '../apps/api/src/lib/logger';
import { createSmtpMailer } from '../apps/api/src/lib/mail';
import { clusterBase, startCluster } from './lib/postgres.mjs';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const DATABASE = 'keybed_bench_costing';
const LARGE = { jobs: 1000, entriesPerJob: 40, movementsPerJob: 5, technicians: 20 };
const SMALL = { jobs: 3, entriesPerJob: 40, movementsPerJob: 5, technicians: 20 };
const LOAD = { connections: 10, warmUpSeconds: 3, seconds: 10 };
const REPORT = '/api/reports/margins?from=2026-01-01&to=2026-12-31';

const say = (line: string) => console.log(`[bench] ${line}`);

const CLUSTER = 'pg-bench';
const wasRunning = fs.existsSync(path.join(clusterBase(ROOT), CLUSTER, 'data', 'postmaster.pid'));
const cluster = await startCluster({ root: ROOT, name: CLUSTER, preferredPort: 55600, fast: true });
await cluster.createDatabase(DATABASE, { recreate: true });
const url = cluster.url(DATABASE);
await runMigrations(url);

let statements = 0;
const { db, sql } = createDatabase(url, { max: 10, onQuery: () => statements++ });
const config = loadConfig({ NODE_ENV: 'production', DATABASE_URL: url, APP_ORIGIN: 'http://127.0.0.1', LOG_LEVEL: 'silent' });
const mailer = createSmtpMailer(config.smtp);
const app = createApp({ config, db, sql, mailer, logger: createLogger('silent') });
const server = http.createServer(app);
await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

try {
  const large = await signUp('large');
  await seedWorkshop(large.workshopId, 'large', LARGE);
  const small = await signUp('small');
  await seedWorkshop(small.workshopId, 'small', SMALL);
  await sql`analyze`;

  const largeReport = await reportStatements(large.cookie);
  const smallReport = await reportStatements(small.cookie);
  const [facts] = await sql<{ entries: number; movements: number; lines: number }[]>`
    select (select count(*)::int from time_entries where workshop_id = ${large.workshopId}) as entries,
           (select count(*)::int from stock_movements where workshop_id = ${large.workshopId} and job_id is not null) as movements,
           (select count(*)::int from estimate_lines where workshop_id = ${large.workshopId}) as lines`;
  say(`workshop: ${largeReport.rows} jobs in the report, ${facts!.entries} time entries, ${facts!.movements} parts movements on jobs, ${facts!.lines} estimate lines`);
  say(
    `SQL statements per report: ${largeReport.statements} with ${largeReport.rows} jobs, ${smallReport.statements} with ${smallReport.rows} jobs (${largeReport.statements === smallReport.statements ? 'constant' : 'NOT constant'})`,
  );

  const floor = await load('/api/health', large.cookie);
  const report = await load(REPORT, large.cookie);
  const ratio = report.requests.average / floor.requests.average;
  say(`floor   GET /api/health (SELECT 1)        : ${floor.requests.average.toFixed(0)} req/s, mean ${floor.latency.average.toFixed(1)} ms, p99 ${floor.latency.p99} ms`);
  say(`margins GET /api/reports/margins (a year) : ${report.requests.average.toFixed(1)} req/s, mean ${report.latency.average.toFixed(0)} ms, p99 ${report.latency.p99} ms (${LOAD.connections} connections)`);
  say(`ratio margins/floor: ${ratio.toFixed(4)} (a report over ${facts!.entries} entries against one SELECT 1)`);
  if (largeReport.statements !== smallReport.statements) process.exitCode = 1;
} finally {
  await app.close();
  server.closeAllConnections();
  await new Promise((resolve) => server.close(resolve));
  mailer.close();
  await sql.end({ timeout: 5 });
  const admin = postgres(cluster.url('postgres'), { max: 1, onnotice: () => {} });
  await admin.unsafe(`DROP DATABASE IF EXISTS ${DATABASE} WITH (FORCE)`);
  await admin.end();
  if (!wasRunning) await cluster.stop();
}

async function signUp(label: string) {
  const res = await fetch(`${base}/api/auth/sign-up`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ workshopName: `Fennick Cross Piano Works (${label})`, name: 'Margaret Oyelaran', email: `margaret.${label}@fennick.example`, password: 'keybed-bench' }),
  });
  if (res.status !== 201) throw new Error(`sign-up answered ${res.status}`);
  const cookie = res.headers.getSetCookie().map((c) => c.split(';')[0]!).find((c) => c.startsWith('keybed_session='))!;
  const me = (await res.json()) as { workshop: { id: string } };
  return { cookie, workshopId: me.workshop.id };
}

/**
 * Jobs with four tasks each and an accepted estimate (four labour lines on the tasks, a part
 * line), technicians with a cost rate and a rise mid-year, ten parts in stock, `entriesPerJob`
 * time entries per job spread over 2026 without overlaps, and `movementsPerJob` parts used per job.
 */
async function seedWorkshop(workshopId: string, label: string, size: typeof LARGE) {
  await sql.begin(async (tx) => {
    await tx`update workshops set tax_rate_basis_points = 2000, labour_rate_minor_per_hour = 5500, target_margin_basis_points = 2500 where id = ${workshopId}`;
    await tx`insert into users (email, name, password_hash)
      select 'tech' || i || '.' || ${label}::text || '@fennick.example', 'Bench technician ' || i, 'not-a-password' from generate_series(1, ${size.technicians}) i`;
    await tx`insert into memberships (workshop_id, user_id, role)
      select ${workshopId}, id, 'technician' from users where email like ${`tech%.${label}@fennick.example`}`;
    await tx`insert into technician_cost_rates (workshop_id, user_id, effective_from, rate_minor_per_hour)
      select ${workshopId}, m.user_id, d.day, d.rate + (row_number() over (order by m.user_id))::int * 10
      from memberships m cross join (values (date '2025-01-06', 2200), (date '2026-07-01', 2400)) d(day, rate)
      where m.workshop_id = ${workshopId} and m.role = 'technician'`;
    await tx`insert into clients (workshop_id, name) select ${workshopId}, 'Bench client ' || i from generate_series(1, 100) i`;
    await tx`insert into pianos (workshop_id, client_id, maker, model, type, keytop_material)
      select ${workshopId}, id, 'Carrow & Finch', 'Salon', 'grand', 'ivory' from clients where workshop_id = ${workshopId}`;
    await tx`insert into jobs (workshop_id, client_id, piano_id, stage_id, position, title, status, created_at)
      select ${workshopId}, p.client_id, p.id, s.id, case when i % 3 = 0 then i / 3 - 1 end, 'Bench job ' || i, (case when i % 3 = 0 then 'active' else 'done' end)::job_status,
             timestamptz '2026-01-01 00:00Z'
      from generate_series(1, ${size.jobs}) i
      join (select id, client_id, row_number() over (order by id) rn from pianos where workshop_id = ${workshopId}) p on p.rn = 1 + i % 100
      join stages s on s.workshop_id = ${workshopId} and s.position = 0`;
    await tx`insert into tasks (workshop_id, job_id, title, status, position)
      select ${workshopId}, j.id, 'Task ' || t, (case when j.status = 'done' then 'done' else 'in_progress' end)::task_status, t - 1
      from jobs j cross join generate_series(1, 4) t where j.workshop_id = ${workshopId}`;
    await tx`insert into estimates (workshop_id, job_id, revision, kind, status)
      select ${workshopId}, id, 1, 'original', 'draft' from jobs where workshop_id = ${workshopId}`;
    await tx`insert into parts (workshop_id, sku, name, unit, unit_cost_minor, sell_price_minor)
      select ${workshopId}, 'BP-' || i, 'Bench part ' || i, 'set', 1000 + i * 100, 1500 + i * 150 from generate_series(1, 10) i`;
    await tx`insert into estimate_lines (workshop_id, estimate_id, job_id, position, kind, description, task_id, minutes, unit_price_minor, amount_minor)
      select ${workshopId}, e.id, e.job_id, t.position, 'labour', t.title, t.id, 540, 5500, 49500
      from estimates e join tasks t on t.job_id = e.job_id where e.workshop_id = ${workshopId}`;
    await tx`insert into estimate_lines (workshop_id, estimate_id, job_id, position, kind, description, part_id, quantity_milli, unit_price_minor, unit_cost_minor, amount_minor, cost_minor)
      select ${workshopId}, e.id, e.job_id, 4, 'part', p.name, p.id, 5000, p.sell_price_minor, p.unit_cost_minor, 5 * p.sell_price_minor, 5 * p.unit_cost_minor
      from estimates e join parts p on p.workshop_id = e.workshop_id and p.sku = 'BP-1' where e.workshop_id = ${workshopId}`;
    await tx`update estimates e set status = 'accepted', issued_at = timestamptz '2026-01-02 09:00Z', accepted_at = timestamptz '2026-01-03 09:00Z',
        accepted_net_minor = (select sum(amount_minor) from estimate_lines l where l.estimate_id = e.id)
      where e.workshop_id = ${workshopId}`;
    await tx`update tasks set estimated_minutes = 540 where workshop_id = ${workshopId}`;
    await tx`insert into stock_movements (workshop_id, part_id, kind, quantity_milli, unit_cost_minor, value_minor, at)
      select ${workshopId}, id, 'received', 1000000000, unit_cost_minor, 1000000 * unit_cost_minor, timestamptz '2026-01-01 08:00Z' from parts where workshop_id = ${workshopId}`;
    // Entry i belongs to job i / 40 and technician i % 20; each technician's k-th entry takes the
    // (k % 8)-th 45-minute slot of day k / 8 from 1 January, so no two of theirs overlap.
    await tx`insert into time_entries (workshop_id, technician_id, task_id, job_id, started_at, ended_at, source)
      select ${workshopId}, tech.user_id, t.id, t.job_id,
             timestamptz '2026-01-01 08:00Z' + ((i / ${size.technicians}) / 8) * interval '1 day' + ((i / ${size.technicians}) % 8) * interval '45 minutes',
             timestamptz '2026-01-01 08:00Z' + ((i / ${size.technicians}) / 8) * interval '1 day' + ((i / ${size.technicians}) % 8) * interval '45 minutes' + interval '40 minutes',
             'web'
      from generate_series(0, ${size.jobs * size.entriesPerJob - 1}) i
      join (select user_id, row_number() over (order by user_id) - 1 as n from memberships where workshop_id = ${workshopId} and role = 'technician') tech on tech.n = i % ${size.technicians}
      join (select j.id as job_id, row_number() over (order by j.id) - 1 as n from jobs j where j.workshop_id = ${workshopId}) jn on jn.n = i / ${size.entriesPerJob}
      join tasks t on t.job_id = jn.job_id and t.position = i % 4`;
    await tx`insert into stock_movements (workshop_id, part_id, kind, quantity_milli, unit_cost_minor, value_minor, task_id, job_id, at)
      select ${workshopId}, p.id, 'used', -1000, p.unit_cost_minor, -p.unit_cost_minor, t.id, t.job_id, timestamptz '2026-03-01 10:00Z'
      from tasks t cross join generate_series(1, ${size.movementsPerJob}) m
      join parts p on p.workshop_id = ${workshopId} and p.sku = 'BP-' || m
      where t.workshop_id = ${workshopId} and t.position = 0`;
  });
}

/**
 * Statements sent while answering one report (session check included), and the rows it showed.
 * Measured on a second request, so a first request's one-off work (a session renewal) is not counted.
 */
async function reportStatements(cookie: string) {
  await fetch(`${base}${REPORT}`, { headers: { cookie } });
  statements = 0;
  const res = await fetch(`${base}${REPORT}`, { headers: { cookie } });
  if (res.status !== 200) throw new Error(`GET ${REPORT} answered ${res.status}: ${await res.text()}`);
  const body = (await res.json()) as { rows: unknown[] };
  return { statements, rows: body.rows.length };
}

async function load(route: string, cookie: string) {
  const options = { url: `${base}${route}`, connections: LOAD.connections, workers: 1, headers: { cookie } };
  await autocannon({ ...options, duration: LOAD.warmUpSeconds });
  const result = await autocannon({ ...options, duration: LOAD.seconds });
  if (result.non2xx > 0 || result.errors > 0) throw new Error(`${route}: ${result.non2xx} non-2xx answers, ${result.errors} errors`);
  return result;
}
