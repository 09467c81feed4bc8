// Process helpers for the set-up scripts. Node built-ins only: these run before `npm ci`.
import { spawn, spawnSync } from 'node:child_process';
import net from 'node:net';

export const isRoot = () => typeof process.getuid === 'function' && process.getuid() === 0;

export function say(message) {
  process.stdout.write(`[keybed] ${message}\n`);
}

/** Runs a command to completion; rejects with its output when it fails. */
export function run(cmd, args, opts = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: opts.quiet ? 'pipe' : 'inherit', ...opts });
    let out = '';
    child.stdout?.on('data', (d) => (out += d));
    child.stderr?.on('data', (d) => (out += d));
    child.on('error', reject);
    child.on('exit', (code, signal) => {
      if (code === 0) resolve(out);
      else reject(new Error(`${cmd} ${args.join(' ')} failed (${signal ?? code})\n${out}`));
    });
  });
}

export function capture(cmd, args, opts = {}) {
  const r = spawnSync(cmd, args, { encoding: 'utf8', ...opts });
  return r.status === 0 ? r.stdout.trim() : null;
}

/** Starts a long-running process in its own process group so that it can be stopped as a whole. */
export function startDetached(cmd, args, opts = {}) {
  const child = spawn(cmd, args, { detached: true, stdio: opts.stdio ?? 'inherit', ...opts });
  return {
    child,
    stop(signal = 'SIGTERM') {
      if (child.exitCode !== null || child.signalCode !== null) return Promise.resolve();
      return new Promise((resolve) => {
        const timer = setTimeout(() => killGroup(child.pid, 'SIGKILL'), 5000);
        child.once('exit', () => {
          clearTimeout(timer);
          resolve();
        });
        killGroup(child.pid, signal);
      });
    },
  };
}

function killGroup(pid, signal) {
  try {
    process.kill(-pid, signal);
  } catch {
    /* already gone */
  }
}

export function isPortFree(port, host = '127.0.0.1') {
  return new Promise((resolve) => {
    const server = net.createServer();
    server.once('error', () => resolve(false));
    server.listen(port, host, () => server.close(() => resolve(true)));
  });
}

/** The first free port at or after `start` (never 5432, which belongs to the machine). */
export async function findFreePort(start) {
  for (let port = start; port < start + 200; port += 1) {
    if (port !== 5432 && (await isPortFree(port))) return port;
  }
  throw new Error(`No free port near ${start}`);
}

export async function waitFor(check, { timeoutMs = 20000, what = 'service' } = {}) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (await check().catch(() => false)) return;
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`Timed out waiting for ${what}`);
}
