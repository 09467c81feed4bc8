// Installs dependencies when node_modules is missing or older than the lock file.
import fs from 'node:fs';
import path from 'node:path';
import { run, say } from './proc.mjs';

export async function ensureDeps(root) {
  const lock = path.join(root, 'package-lock.json');
  const marker = path.join(root, 'node_modules', '.package-lock.json');
  const stale = !fs.existsSync(marker) || fs.statSync(marker).mtimeMs < fs.statSync(lock).mtimeMs;
  if (!stale) return;
  say('Installing dependencies (npm ci)…');
  await run('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, env: { ...process.env, PLAYWRIGHT_SKIP_BROWSER_DOWNLOAD: '1' } });
}
