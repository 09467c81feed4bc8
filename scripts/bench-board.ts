// `npm run bench:board`: how fast GET /api/board answers for a large workshop, against a floor
// endpoint (GET /api/health: one `SELECT 1`) through the same stack, measured in the same run,
// and how many SQL statements one board request takes (it must not grow with the jobs).
// The board is measured twice: as served (kept between changes) and built afresh on every request.
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
import { startCluster } from './lib/postgres.mjs';

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
const DATABASE = 'keybed_bench';
const SIZE = { clients: 300, activeJobs: 150, finishedJobs: 1500, stageEvents: 20_000 };
const LOAD = { connections: 10, warmUpSeconds: 3, seconds: 5, rounds: 3 };
const TARGET_RATIO = 0.5;

const say = (line: string) => console.log(`[bench] ${line}`);

const cluster = await startCluster({ root: ROOT, name: 'pg-bench', preferredPort: 55632, fast: true });
await cluster.createDatabase(DATABASE, { recreate: true });
const url = cluster.url(DATABASE);
await runMigrations(url);
const config = loadConfig({ NODE_ENV: 'production', DATABASE_URL: url, APP_ORIGIN: 'http://127.0.0.1', LOG_LEVEL: 'silent' });
const mailer = createSmtpMailer(config.smtp);
const served = await startApp(true);
const builtEachTime = await startApp(false);
const { sql } = served;

try {
  const large = await signUp('large');
  await seedLargeWorkshop(large.workshopId);
  const small = await signUp('small');
  await seedSmallWorkshop(small.cookie);

  const largeCold = await boardStatements(builtEachTime, large.cookie);
  const smallCold = await boardStatements(builtEachTime, small.cookie);
  await boardStatements(served, large.cookie);
  const largeWarm = await boardStatements(served, large.cookie);
  const isConstant = largeCold.statements === smallCold.statements;
  say(`workshop: ${largeCold.jobs} jobs on the board, ${SIZE.finishedJobs} finished jobs, ${SIZE.stageEvents} stage events, ${Math.round(largeCold.bytes / 1024)} KiB of board JSON`);
  say(`SQL statements per board request (session check included): built ${largeCold.statements} with ${largeCold.jobs} jobs and ${smallCold.statements} with ${smallCold.jobs} jobs (${isConstant ? 'constant' : 'NOT constant'}); kept ${largeWarm.statements}`);

  // Floor and board take turns, so drift on the machine (other work, CPU boost) hits both alike.
  const runs = { floor: [] as autocannon.Result[], board: [] as autocannon.Result[], built: [] as autocannon.Result[] };
  for (const [app, route] of [[served, '/api/health'], [served, '/api/board'], [builtEachTime, '/api/board']] as const) {
    await autocannon({ url: `${app.base}${route}`, connections: LOAD.connections, workers: 1, headers: { cookie: large.cookie }, duration: LOAD.warmUpSeconds });
  }
  for (let round = 0; round < LOAD.rounds; round++) {
    runs.floor.push(await load(served, '/api/health', large.cookie));
    runs.board.push(await load(served, '/api/board', large.cookie));
    runs.built.push(await load(builtEachTime, '/api/board', large.cookie));
  }
  const floor = medians(runs.floor);
  const board = medians(runs.board);
  const built = medians(runs.built);
  const line = (name: string, r: Figures) => `${name}: ${r.rps.toFixed(0).padStart(5)} req/s, p99 ${String(r.p99).padStart(3)} ms`;
  say(`medians of ${LOAD.rounds} rounds of ${LOAD.seconds} s each, ${LOAD.connections} connections`);
  say(line('floor  GET /api/health (SELECT 1)      ', floor));
  say(line('board  GET /api/board                  ', board));
  say(line('board  GET /api/board, built every time', built));
  const ratio = board.rps / floor.rps;
  say(`ratio board/floor: ${ratio.toFixed(2)} (target ≥ ${TARGET_RATIO}: ${ratio >= TARGET_RATIO ? 'met' : 'NOT met'}); built every time: ${(built.rps / floor.rps).toFixed(2)}`);
  if (!isConstant) process.exitCode = 1;
} finally {
  await served.close();
  await builtEachTime.close();
  mailer.close();
  const admin = postgres(cluster.url('postgres'), { max: 1, onnotice: () => {} });
  await admin.unsafe(`DROP DATABASE IF EXISTS ${DATABASE} WITH (FORCE)`);
  await admin.end();
  await cluster.stop();
}

type RunningApp = Awaited<ReturnType<typeof startApp>>;

/** One API process on its own pool, listening on a free port of 127.0.0.1, counting its statements. */
async function startApp(cacheBoards: boolean) {
  let statements = 0;
  const { db, sql } = createDatabase(url, { max: 10, onQuery: () => statements++ });
  const app = createApp({ config, db, sql, mailer, logger: createLogger('silent'), cacheBoards });
  const server = http.createServer(app);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  return {
    sql,
    base: `http://127.0.0.1:${(server.address() as AddressInfo).port}`,
    statements: () => statements,
    async close() {
      await app.close();
      server.closeAllConnections();
      await new Promise((resolve) => server.close(resolve));
      await sql.end({ timeout: 5 });
    },
  };
}

async function signUp(label: string) {
  const res = await fetch(`${served.base}/api/auth/sign-up`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ workshopName: `Fennick Cross Piano Works (${label})`, name: 'Margaret Oyelaran', email: `margaret.${label}@fennick.example`, password: 'keybed-bench' }),
  });
  if (res.status !== 201) throw new Error(`sign-up answered ${res.status}`);
  const cookie = res.headers.getSetCookie().map((c) => c.split(';')[0]!).find((c) => c.startsWith('keybed_session='))!;
  const me = (await res.json()) as { workshop: { id: string } };
  return { cookie, workshopId: me.workshop.id };
}

/** 150 jobs on the board (25 per stage), 1,500 finished ones behind them, 20,000 stage events. */
async function seedLargeWorkshop(workshopId: string) {
  await sql.begin(async (tx) => {
    await tx`insert into clients (workshop_id, name, email)
      select ${workshopId}, 'Bench client ' || i, 'client' || i || '@bench.example' from generate_series(1, ${SIZE.clients}) i`;
    await tx`insert into pianos (workshop_id, client_id, maker, model, serial_number, type, size_mm, keytop_material)
      select ${workshopId}, c.id, case when c.rn % 2 = 0 then 'Carrow & Finch' else 'Osterholt' end, 'Model ' || c.rn, 'SN-' || c.rn,
             (case when c.rn % 2 = 0 then 'grand' else 'upright' end)::piano_type, 1200 + c.rn % 600, 'plastic'
      from (select id, row_number() over (order by id) rn from clients where workshop_id = ${workshopId}) c`;
    await tx`insert into jobs (workshop_id, client_id, piano_id, stage_id, position, title, status, promised_on, is_blocked, blocked_reason)
      select ${workshopId}, p.client_id, p.id, s.id, (p.rn - 1) / 6, 'Bench job ' || p.rn,
             (case when p.rn % 10 = 0 then 'on_hold' else 'active' end)::job_status, date '2027-01-01' + (p.rn % 90)::int,
             p.rn % 7 = 0, case when p.rn % 7 = 0 then 'Waiting for parts' end
      from (select id, client_id, row_number() over (order by id) rn from pianos where workshop_id = ${workshopId}) p
      join stages s on s.workshop_id = ${workshopId} and s.position = (p.rn - 1) % 6
      where p.rn <= ${SIZE.activeJobs}`;
    await tx`insert into jobs (workshop_id, client_id, piano_id, stage_id, position, title, status, notes)
      select ${workshopId}, p.client_id, p.id, s.id, null, 'Finished bench job ' || i,
             (case when i % 5 = 0 then 'cancelled' else 'done' end)::job_status, 'Handed back after final tuning.'
      from generate_series(1, ${SIZE.finishedJobs}) i
      join (select id, client_id, row_number() over (order by id) rn from pianos where workshop_id = ${workshopId}) p on p.rn = 1 + i % ${SIZE.clients}
      join stages s on s.workshop_id = ${workshopId} and s.position = i % 6`;
    await tx`insert into job_stage_events (workshop_id, job_id, from_stage_id, to_stage_id, at)
      select ${workshopId}, j.id, st.ids[1 + i % 6], st.ids[1 + (i + 1) % 6], now() - (i || ' minutes')::interval
      from generate_series(1, ${SIZE.stageEvents}) i
      join (select id, row_number() over (order by id) rn from jobs where workshop_id = ${workshopId}) j
        on j.rn = 1 + i % ${SIZE.activeJobs + SIZE.finishedJobs}
      cross join (select array_agg(id order by position) ids from stages where workshop_id = ${workshopId}) st`;
  });
  await sql`analyze`;
}

/** Three jobs made through the API, to compare the statement count with. */
async function seedSmallWorkshop(cookie: string) {
  const post = async (route: string, body: unknown) => {
    const res = await fetch(`${served.base}${route}`, { method: 'POST', headers: { cookie, 'content-type': 'application/json' }, body: JSON.stringify(body) });
    if (res.status !== 201) throw new Error(`POST ${route} answered ${res.status}`);
    return (await res.json()) as { id: string };
  };
  const client = await post('/api/clients', { name: 'Oscar Feld' });
  const piano = await post('/api/pianos', { clientId: client.id, maker: 'Brandauer & Sons', model: 'Parlour', type: 'grand', sizeMm: 1575 });
  for (const title of ['Full restring', 'New tuning pins', 'Soundboard crack repair']) await post('/api/jobs', { pianoId: piano.id, title });
}

/** Statements one board request sent (after one request to settle the session), and what it showed. */
async function boardStatements(app: RunningApp, cookie: string) {
  const get = () => fetch(`${app.base}/api/board`, { headers: { cookie } });
  await (await get()).arrayBuffer();
  const before = app.statements();
  const res = await get();
  const text = await res.text();
  if (res.status !== 200) throw new Error(`GET /api/board answered ${res.status}`);
  const body = JSON.parse(text) as { stages: Array<{ jobs: unknown[] }> };
  return { statements: app.statements() - before, jobs: body.stages.reduce((n, s) => n + s.jobs.length, 0), bytes: text.length };
}

/** One load run; autocannon fires from a worker thread so it does not share the server's thread. */
async function load(app: RunningApp, route: string, cookie: string) {
  const result = await autocannon({ url: `${app.base}${route}`, connections: LOAD.connections, workers: 1, headers: { cookie }, duration: LOAD.seconds });
  if (result.non2xx > 0 || result.errors > 0) throw new Error(`${route}: ${result.non2xx} non-2xx answers, ${result.errors} errors`);
  return result;
}

interface Figures {
  rps: number;
  p99: number;
}

function medians(results: autocannon.Result[]): Figures {
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
  return { rps: median(results.map((r) => r.requests.average)), p99: median(results.map((r) => r.latency.p99)) };
}
