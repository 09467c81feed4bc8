// The pieces `npm start`, `npm run dev` and `npm test` share: database, demo data, mail, server.
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { run, say, startDetached, waitFor } from './proc.mjs';

export const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

const tsx = path.join(ROOT, 'node_modules', '.bin', 'tsx');

/** Applies migrations and (unless told not to) the idempotent demo seed. */
export async function prepareDatabase(databaseUrl, { seed = true } = {}) {
  const env = { ...process.env, DATABASE_URL: databaseUrl };
  await run(tsx, ['db/migrate.ts'], { cwd: ROOT, env });
  if (seed) await run(tsx, ['db/seed/run.ts'], { cwd: ROOT, env });
}

export async function buildAll() {
  say('Building the web app and the API…');
  await run('npm', ['run', '--silent', 'build'], { cwd: ROOT });
}

/** Starts the built API (serving the built web app too) and waits until /api/health answers. */
export async function startServer({ port, env }) {
  const server = startDetached(process.execPath, ['--enable-source-maps', 'apps/api/dist/server.js'], {
    cwd: ROOT,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      HOST: '127.0.0.1',
      PORT: String(port),
      APP_ORIGIN: `http://localhost:${port}`,
      WEB_DIST: path.join(ROOT, 'dist', 'web'),
      ...env,
    },
  });
  let exited = false;
  server.child.once('exit', () => (exited = true));
  await waitFor(
    async () => {
      if (exited) throw new Error('The server stopped while starting; see its log above.');
      return (await fetch(`http://127.0.0.1:${port}/api/health`)).ok;
    },
    { what: 'the Keybed server' },
  );
  return server;
}

const PAYMENT_KEY = 'sk_test_keybed_local';
const WEBHOOK_SECRET = 'whsec_keybed_local';

/**
 * The local fake card-payment server (scripts/fakes/payments.mjs) for the app on `appPort`;
 * answers it with the environment that points the API's payment SDK at it.
 */
export async function startPayments({ appPort, port = 12111 }) {
  const { startFakePayments } = await import('../fakes/payments.mjs');
  const { findFreePort } = await import('./proc.mjs');
  const fake = await startFakePayments({
    port: await findFreePort(port),
    webhookUrl: `http://127.0.0.1:${appPort}/api/webhooks/payments`,
    webhookSecret: WEBHOOK_SECRET,
    apiKey: PAYMENT_KEY,
  });
  say(`Fake payment server: ${fake.url}`);
  return {
    url: fake.url,
    stop: () => fake.stop(),
    env: {
      STRIPE_SECRET_KEY: PAYMENT_KEY,
      STRIPE_WEBHOOK_SECRET: WEBHOOK_SECRET,
      STRIPE_API_HOST: fake.host,
      STRIPE_API_PORT: String(fake.port),
      STRIPE_API_PROTOCOL: 'http',
    },
  };
}

/** Runs `cleanup` once on Ctrl-C / SIGTERM, then exits. */
export function onShutdown(cleanup) {
  let isStopping = false;
  const handler = async (signal) => {
    if (isStopping) return;
    isStopping = true;
    say(`${signal}: stopping…`);
    await cleanup().catch((err) => console.error(err));
    process.exit(0);
  };
  process.on('SIGINT', handler);
  process.on('SIGTERM', handler);
}
