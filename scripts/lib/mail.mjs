// The local fake mail server (maildev from the registry) on loopback: SMTP in, an inbox to read.
import fs from 'node:fs';
import path from 'node:path';
import { findFreePort, say, startDetached, waitFor } from './proc.mjs';

export async function startMailbox({ root, smtpPort = 1025, webPort = 1080, logFile }) {
  const smtp = await findFreePort(smtpPort);
  const web = await findFreePort(webPort);
  const bin = path.join(root, 'node_modules', 'maildev', 'dist', 'bin', 'maildev.js');
  const out = logFile ? fs.openSync(logFile, 'a') : 'ignore';
  const proc = startDetached(
    process.execPath,
    [bin, '--ip', '127.0.0.1', '--web-ip', '127.0.0.1', '--smtp', String(smtp), '--web', String(web), '--silent'],
    { stdio: ['ignore', out, out] },
  );
  const inboxUrl = `http://127.0.0.1:${web}`;
  await waitFor(async () => (await fetch(`${inboxUrl}/api/healthz`)).ok, { what: 'the fake mail server' });
  say(`Fake mail server: SMTP 127.0.0.1:${smtp}, inbox ${inboxUrl}`);
  return { smtpPort: smtp, inboxUrl, stop: () => proc.stop() };
}
