// `npm run dev`: Vite's dev server with hot reload on :3000, proxying /api to the API in watch mode.
import path from 'node:path';
import { ensureDeps } from './lib/deps.mjs';
import { ROOT } from './lib/stack.mjs';

await ensureDeps(ROOT);
const { startCluster, clusterBase } = await import('./lib/postgres.mjs');
const { startMailbox } = await import('./lib/mail.mjs');
const { startDetached } = await import('./lib/proc.mjs');
const { onShutdown, prepareDatabase, startPayments } = await import('./lib/stack.mjs');

const cluster = await startCluster({ root: ROOT, name: 'pg', preferredPort: 54320 });
await cluster.createDatabase('keybed');
const databaseUrl = cluster.url('keybed');
await prepareDatabase(databaseUrl);
const mail = await startMailbox({ root: ROOT, smtpPort: 1025, webPort: 1080, logFile: path.join(clusterBase(ROOT), 'mail.log') });
const apiPort = Number(process.env.API_PORT ?? 3001);
const webPort = Number(process.env.PORT ?? 3000);
const payments = await startPayments({ appPort: apiPort });
const env = {
  ...process.env,
  ...payments.env,
  DATABASE_URL: databaseUrl,
  SMTP_PORT: String(mail.smtpPort),
  PORT: String(apiPort),
  API_PORT: String(apiPort),
  APP_ORIGIN: `http://localhost:${webPort}`,
};
const api = startDetached(path.join(ROOT, 'node_modules/.bin/tsx'), ['watch', '--clear-screen=false', 'apps/api/src/server.ts'], { cwd: ROOT, env });
const web = startDetached(path.join(ROOT, 'node_modules/.bin/vite'), ['--port', String(webPort), '--strictPort'], { cwd: ROOT, env });
console.log(`\n  Keybed (dev): http://localhost:${webPort}   mail inbox: ${mail.inboxUrl}\n`);
onShutdown(async () => {
  await Promise.all([api.stop(), web.stop(), mail.stop(), payments.stop()]);
  await cluster.stop();
});
