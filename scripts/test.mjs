// `npm test`: the same set-up as `npm start` on a fresh cluster of its own, then type-check,
// unit and API tests (Vitest), and end-to-end tests (Playwright driving Debian's chromium).
import fs from 'node:fs';
import path from 'node:path';
import { ensureDeps } from './lib/deps.mjs';
import { say } from './lib/proc.mjs';
import { ROOT } from './lib/stack.mjs';

await ensureDeps(ROOT);
const { aptInstall } = await import('./lib/apt.mjs');
const { startCluster, clusterBase } = await import('./lib/postgres.mjs');
const { startMailbox } = await import('./lib/mail.mjs');
const { findFreePort, run } = await import('./lib/proc.mjs');
const { buildAll, onShutdown, prepareDatabase, startPayments, startServer } = await import('./lib/stack.mjs');

const CHROMIUM = '/usr/bin/chromium';
const reports = path.join(ROOT, '.data', 'reports');
fs.mkdirSync(reports, { recursive: true });

const stops = [];
const stopAll = async () => {
  for (const stop of stops.reverse()) await stop().catch(() => {});
};
onShutdown(stopAll);

const results = [];
async function step(name, fn) {
  const started = Date.now();
  say(`— ${name}`);
  try {
    await fn();
    results.push({ name, ok: true, seconds: (Date.now() - started) / 1000 });
  } catch (err) {
    console.error(err instanceof Error ? err.message.slice(0, 4000) : err);
    results.push({ name, ok: false, seconds: (Date.now() - started) / 1000 });
  }
}

function countsFromVitest(file) {
  const r = JSON.parse(fs.readFileSync(file, 'utf8'));
  return { passed: r.numPassedTests, failed: r.numFailedTests, skipped: r.numPendingTests + r.numTodoTests };
}

function countsFromPlaywright(file) {
  const s = JSON.parse(fs.readFileSync(file, 'utf8')).stats;
  return { passed: s.expected + s.flaky, failed: s.unexpected, skipped: s.skipped };
}

let exitCode = 1;
try {
  if (!fs.existsSync(CHROMIUM)) await aptInstall(['chromium'], 'Chromium for the end-to-end tests');
  const cluster = await startCluster({ root: ROOT, name: 'pg-test-run', preferredPort: 55440, fresh: true, fast: true });
  stops.push(() => cluster.stop());
  const mail = await startMailbox({ root: ROOT, smtpPort: 41125, webPort: 41180, logFile: path.join(clusterBase(ROOT), 'mail-test.log') });
  stops.push(() => mail.stop());
  const testEnv = {
    ...process.env,
    KEYBED_TEST_PG_URL: cluster.url('postgres'),
    KEYBED_TEST_SMTP_PORT: String(mail.smtpPort),
    KEYBED_TEST_INBOX_URL: mail.inboxUrl,
  };

  await step('type-check every workspace', () => run('npm', ['run', '--silent', 'typecheck'], { cwd: ROOT }));
  const vitestJson = path.join(reports, 'vitest.json');
  fs.rmSync(vitestJson, { force: true });
  await step('unit and API tests (Vitest)', () =>
    run(path.join(ROOT, 'node_modules/.bin/vitest'), ['run', '--reporter=default', '--reporter=json', `--outputFile.json=${vitestJson}`], { cwd: ROOT, env: testEnv }),
  );

  const playwrightJson = path.join(reports, 'playwright.json');
  fs.rmSync(playwrightJson, { force: true });
  await step('build and end-to-end tests (Playwright, chromium)', async () => {
    await buildAll();
    await cluster.createDatabase('keybed_e2e', { recreate: true });
    const databaseUrl = cluster.url('keybed_e2e');
    await prepareDatabase(databaseUrl);
    const port = await findFreePort(43100);
    const payments = await startPayments({ appPort: port, port: 43200 });
    stops.push(() => payments.stop());
    const server = await startServer({
      port,
      env: { DATABASE_URL: databaseUrl, SMTP_PORT: String(mail.smtpPort), LOG_LEVEL: 'error', SIGN_IN_FAILURES_PER_ADDRESS: '1000', UPLOAD_DIR: path.join(clusterBase(ROOT), 'e2e-uploads'), ...payments.env },
    });
    stops.push(() => server.stop());
    await run(path.join(ROOT, 'node_modules/.bin/playwright'), ['test', '-c', 'e2e/playwright.config.ts', '--reporter=list,json'], {
      cwd: ROOT,
      env: {
        ...testEnv,
        E2E_BASE_URL: `http://localhost:${port}`,
        E2E_INBOX_URL: mail.inboxUrl,
        E2E_DATABASE_URL: databaseUrl,
        PLAYWRIGHT_JSON_OUTPUT_NAME: playwrightJson,
        PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD: '1',
      },
    });
  });

  const counts = [vitestJson, playwrightJson]
    .filter((f) => fs.existsSync(f))
    .map((f) => (f.endsWith('vitest.json') ? countsFromVitest(f) : countsFromPlaywright(f)));
  const total = counts.reduce((a, c) => ({ passed: a.passed + c.passed, failed: a.failed + c.failed, skipped: a.skipped + c.skipped }), { passed: 0, failed: 0, skipped: 0 });
  const allOk = results.every((r) => r.ok) && total.failed === 0 && total.passed > 0;
  console.log('\nSummary:');
  for (const r of results) console.log(`  ${r.ok ? 'ok  ' : 'FAIL'}  ${r.name} (${r.seconds.toFixed(1)} s)`);
  const stepFailures = results.filter((r) => !r.ok).length;
  console.log(`keybed: ${total.passed} passed, ${total.failed + (total.failed === 0 ? stepFailures : 0)} failed, ${total.skipped} skipped`);
  exitCode = allOk ? 0 : 1;
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
} finally {
  await stopAll();
}
process.exit(exitCode);
