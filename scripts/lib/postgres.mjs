// A private PostgreSQL cluster for Keybed: found or installed from Debian's packages, created under
// .data/ (or /var/tmp when the `postgres` user cannot reach the checkout), on loopback, own port.
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { aptInstall } from './apt.mjs';
import { capture, findFreePort, isPortFree, isRoot, run, say } from './proc.mjs';

export const DB_USER = 'keybed';

function findBinDir() {
  const fromConfig = capture('pg_config', ['--bindir']);
  if (fromConfig && fs.existsSync(path.join(fromConfig, 'initdb'))) return fromConfig;
  const base = '/usr/lib/postgresql';
  if (!fs.existsSync(base)) return null;
  const versions = fs
    .readdirSync(base)
    .filter((v) => fs.existsSync(path.join(base, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions[0] ? path.join(base, versions[0], 'bin') : null;
}

export async function ensurePostgresBinaries() {
  let bin = findBinDir();
  if (!bin) {
    await aptInstall(['postgresql', 'postgresql-contrib'], 'PostgreSQL server');
    bin = findBinDir();
  }
  if (!bin) throw new Error('PostgreSQL server binaries not found after install (looked for initdb).');
  return bin;
}

/** The uid/gid the server runs as: ourselves, or `postgres` when we are root (it refuses root). */
function serverUser() {
  if (!isRoot()) return null;
  const uid = Number(capture('id', ['-u', 'postgres']));
  const gid = Number(capture('id', ['-g', 'postgres']));
  if (!Number.isInteger(uid) || !Number.isInteger(gid) || uid === 0) {
    throw new Error('Running as root needs the `postgres` system user (installed with the postgresql package).');
  }
  return { uid, gid };
}

/** True when every parent of `dir` can be traversed by others (so the postgres user reaches it). */
function reachableByOthers(dir) {
  let current = path.resolve(dir);
  while (true) {
    if (fs.existsSync(current) && (fs.statSync(current).mode & 0o001) === 0) return false;
    const parent = path.dirname(current);
    if (parent === current) return true;
    current = parent;
  }
}

export function clusterBase(root) {
  const local = path.join(root, '.data');
  if (!isRoot() || reachableByOthers(root)) return local;
  const hash = crypto.createHash('sha256').update(root).digest('hex').slice(0, 12);
  return path.join('/var/tmp', `keybed-${hash}`);
}

function asServer(user) {
  return user ? { uid: user.uid, gid: user.gid } : {};
}

/**
 * Makes sure a cluster named `name` exists and runs; returns its connection facts.
 * `fresh` throws away an earlier cluster of that name first (the test run uses this).
 */
export async function startCluster({ root, name, preferredPort, fresh = false, fast = false }) {
  const bin = await ensurePostgresBinaries();
  const user = serverUser();
  const base = clusterBase(root);
  const dir = path.join(base, name);
  const data = path.join(dir, 'data');
  const socketDir = path.join(dir, 'run');
  const pg = (tool) => path.join(bin, tool);

  if (fresh && fs.existsSync(dir)) {
    await stopCluster({ bin, data, user }).catch(() => {});
    fs.rmSync(dir, { recursive: true, force: true });
  }
  fs.mkdirSync(socketDir, { recursive: true });
  if (user) {
    fs.chmodSync(base, 0o755);
    for (const d of [dir, socketDir]) fs.chownSync(d, user.uid, user.gid);
  }

  const portFile = path.join(dir, 'port');
  let port = fs.existsSync(portFile) ? Number(fs.readFileSync(portFile, 'utf8')) : null;

  if (!fs.existsSync(path.join(data, 'PG_VERSION'))) {
    say(`Creating PostgreSQL cluster in ${data}…`);
    await run(pg('initdb'), ['-D', data, '-U', DB_USER, '--auth=trust', '-E', 'UTF8', '--no-locale'], {
      quiet: true,
      ...asServer(user),
    });
    port = null;
  }

  const running = await isRunning(pg, data, user);
  if (!running) {

    if (!port || !(await isPortFree(port))) port = await findFreePort(preferredPort);
    const conf = [
      `listen_addresses = '127.0.0.1'`,
      `port = ${port}`,
      `unix_socket_directories = '${socketDir}'`,
      `max_connections = 300`,
      ...(fast ? ['fsync = off', 'synchronous_commit = off', 'full_page_writes = off'] : []),
    ].join('\n');
    fs.writeFileSync(path.join(data, 'postgresql.auto.conf'), `${conf}\n`);
    if (user) fs.chownSync(path.join(data, 'postgresql.auto.conf'), user.uid, user.gid);
    fs.writeFileSync(portFile, String(port));
    await run(pg('pg_ctl'), ['-D', data, '-l', path.join(dir, 'server.log'), '-w', '-t', '60', 'start'], {
      quiet: true,
      ...asServer(user),
    });
    say(`PostgreSQL running on 127.0.0.1:${port}`);
  } else {
    say(`PostgreSQL already running on 127.0.0.1:${port}`);
  }

  return {
    bin,
    data,
    port,
    user,
    url: (database) => `postgres://${DB_USER}@127.0.0.1:${port}/${database}`,
    stop: () => stopCluster({ bin, data, user }),
    createDatabase: (database, { recreate = false } = {}) =>
      createDatabase({ bin, port, database, recreate }),
  };
}

async function isRunning(pg, data, user) {
  if (!fs.existsSync(path.join(data, 'postmaster.pid'))) return false;
  // pg_ctl status exits 3 when the pid file is stale (the process is gone).
  return run(pg('pg_ctl'), ['-D', data, 'status'], { quiet: true, ...asServer(user) }).then(
    () => true,
    () => false,
  );
}

export async function stopCluster({ bin, data, user }) {
  await run(path.join(bin, 'pg_ctl'), ['-D', data, '-m', 'fast', '-w', 'stop'], { quiet: true, ...asServer(user) });
}

async function psql(bin, port, sql) {
  return run(path.join(bin, 'psql'), ['-h', '127.0.0.1', '-p', String(port), '-U', DB_USER, '-d', 'postgres', '-Atqc', sql], {
    quiet: true,
  });
}

async function createDatabase({ bin, port, database, recreate }) {
  if (!/^[a-z_][a-z0-9_]*$/.test(database)) throw new Error(`Bad database name ${database}`);
  if (recreate) await psql(bin, port, `DROP DATABASE IF EXISTS ${database} WITH (FORCE)`);
  const exists = (await psql(bin, port, `SELECT 1 FROM pg_database WHERE datname = '${database}'`)).trim();
  if (!exists) await psql(bin, port, `CREATE DATABASE ${database}`);
}
