// `npm start`: dependencies, PostgreSQL, migrations, demo data, fake mail, build, serve.
import path from 'node:path';
import { ensureDeps } from './lib/deps.mjs';
import { say } from './lib/proc.mjs';
import { ROOT } from './lib/stack.mjs';

await ensureDeps(ROOT);
const { startCluster, clusterBase } = await import('./lib/postgres.mjs');
const { startMailbox } = await import('./lib/mail.mjs');
const { buildAll, onShutdown, prepareDatabase, startPayments, startServer } = await import('./lib/stack.mjs');
const { DEMO_MEMBERS, DEMO_PASSWORD } = await import('./lib/demo-sign-ins.mjs');

const port = Number(process.env.PORT ?? 3000);
const cluster = await startCluster({ root: ROOT, name: 'pg', preferredPort: 54320 });
const stops = [() => cluster.stop()];
onShutdown(async () => {
  for (const stop of stops.reverse()) await stop().catch(() => {});
});

try {
  await cluster.createDatabase('keybed');
  const databaseUrl = cluster.url('keybed');
  await prepareDatabase(databaseUrl);
  const mail = await startMailbox({ root: ROOT, smtpPort: 1025, webPort: 1080, logFile: path.join(clusterBase(ROOT), 'mail.log') });
  stops.push(() => mail.stop());
  const payments = await startPayments({ appPort: port });
  stops.push(() => payments.stop());
  await buildAll();
  const server = await startServer({ port, env: { DATABASE_URL: databaseUrl, SMTP_PORT: String(mail.smtpPort), ...payments.env } });
  stops.push(() => server.stop());
  server.child.once('exit', (code) => {
    say(`The server stopped (${code}); stopping the rest.`);
    process.kill(process.pid, 'SIGTERM');
  });

  const width = Math.max(...DEMO_MEMBERS.map((m) => m.email.length));
  console.log(`
  Keybed is running:   http://localhost:${port}
  Mail inbox (fake):   ${mail.inboxUrl}
  Card payments (fake): ${payments.url}
  Database:            ${databaseUrl}

  Demo sign-ins (password: ${DEMO_PASSWORD}):
${DEMO_MEMBERS.map((m) => `    ${m.email.padEnd(width)}  ${m.role}`).join('\n')}

  Ctrl-C stops the server, the mail server and the database.
`);
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  for (const stop of stops.reverse()) await stop().catch(() => {});
  process.exit(1);
}
