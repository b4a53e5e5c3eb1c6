// A private MariaDB server (Debian's mariadb-server) run by the project itself: no systemd,
// loopback only, its own port and socket, every tool started with --no-defaults so /etc/mysql
// is never read.
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';

const which = (cmd) => spawnSync('sh', ['-c', `command -v ${cmd}`], { encoding: 'utf8' }).stdout.trim();

/** Paths of the MariaDB programs, or null when the server package is missing. */
export function mariadbTools() {
  const mariadbd = which('mariadbd') || (existsSync('/usr/sbin/mariadbd') ? '/usr/sbin/mariadbd' : '');
  const installDb = which('mariadb-install-db');
  const client = which('mariadb');
  const admin = which('mariadb-admin');
  if (!mariadbd || !installDb || !client || !admin) return null;
  return { mariadbd, installDb, client, admin };
}

/**
 * Initialise a data directory once (socket auth for root, no test database), owned by `user` (root for the embedded
 * server; the cluster's Galera nodes run as mysql and chown their folder first). True when it was new.
 */
export function initDataDir(dir, { user = 'root' } = {}) {
  const data = join(dir, 'data');
  if (existsSync(join(data, 'mysql'))) return false;
  mkdirSync(data, { recursive: true });
  const r = spawnSync(
    'mariadb-install-db',
    [
      '--no-defaults',
      `--user=${user}`,
      `--datadir=${data}`,
      '--auth-root-authentication-method=socket',
      '--skip-test-db',
      '--skip-name-resolve',
    ],
    { encoding: 'utf8' },
  );
  if (r.status !== 0) throw new Error(`mariadb-install-db failed:\n${r.stdout}\n${r.stderr}`);
  return true;
}

function pidAlive(pid) {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
}

/** The options every mariadbd of the project starts with: loopback only, its own socket, pid and log in `dir`, utf8mb4. */
export function serverArgs({ dir, port, user }) {
  return [
    '--no-defaults',
    `--user=${user}`,
    `--datadir=${join(dir, 'data')}`,
    '--skip-networking=0',
    '--bind-address=127.0.0.1',
    `--port=${port}`,
    `--socket=${join(dir, 'mysqld.sock')}`,
    `--pid-file=${join(dir, 'mysqld.pid')}`,
    `--log-error=${join(dir, 'error.log')}`,
    '--skip-name-resolve',
    '--character-set-server=utf8mb4',
    '--collation-server=utf8mb4_unicode_ci',
    '--max-connections=300',
    // A run may carry 200 000 samples (about 12 MB of JSON) in one INSERT.
    '--max-allowed-packet=64M',
  ];
}

/**
 * Start mariadbd on 127.0.0.1:port; resolves once it answers a ping. `onSpawn(child)` gets the process
 * at once (a supervisor can stop it while it is still starting); `shouldStop()` true gives up waiting.
 */
export async function startServer(dir, port, { fast = false, onSpawn, shouldStop } = {}) {
  const pidFile = join(dir, 'mysqld.pid');
  if (existsSync(pidFile)) {
    const old = Number(readFileSync(pidFile, 'utf8').trim());
    if (old && pidAlive(old)) throw new Error(`MariaDB already running from ${dir} (pid ${old}); stop it first`);
  }
  const args = serverArgs({ dir, port, user: 'root' });
  if (fast) args.push('--innodb-flush-log-at-trx-commit=2', '--innodb-doublewrite=0', '--innodb-buffer-pool-size=64M');
  const child = spawn('mariadbd', args, { stdio: 'ignore', detached: false });
  onSpawn?.(child);
  let exited = null;
  child.on('exit', (code) => {
    exited = code ?? -1;
  });
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (shouldStop?.()) return child;
    if (exited !== null) {
      let log = '';
      try {
        log = readFileSync(join(dir, 'error.log'), 'utf8').split('\n').slice(-15).join('\n');
      } catch {
        /* none */
      }
      throw new Error(`mariadbd exited with ${exited}:\n${log}`);
    }
    const ping = spawnSync('mariadb-admin', ['--no-defaults', `--socket=${join(dir, 'mysqld.sock')}`, '-uroot', 'ping'], {
      stdio: 'ignore',
    });
    if (ping.status === 0) return child;
    await sleep(100);
  }
  child.kill('SIGTERM');
  throw new Error('mariadbd did not answer within 60 s');
}

/** Run SQL as root over the socket. */
export function rootSql(dir, sql) {
  const r = spawnSync('mariadb', ['--no-defaults', `--socket=${join(dir, 'mysqld.sock')}`, '-uroot', '-e', sql], { encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`SQL failed: ${r.stderr}`);
  return r.stdout;
}

/** Create the database and a password user for 127.0.0.1 (idempotent). */
export function ensureDatabase(dir, { database, user, password }) {
  rootSql(
    dir,
    `CREATE DATABASE IF NOT EXISTS \`${database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci;
     CREATE USER IF NOT EXISTS '${user}'@'127.0.0.1' IDENTIFIED BY '${password}';
     ALTER USER '${user}'@'127.0.0.1' IDENTIFIED BY '${password}';
     GRANT ALL PRIVILEGES ON \`${database}\`.* TO '${user}'@'127.0.0.1';
     FLUSH PRIVILEGES;`,
  );
}

/**
 * Copy a (migrated) database into `to`, which must exist: schema, foreign keys and rows, through
 * mariadb-dump piped into mariadb on the server's socket. Much faster than migrating again.
 */
export function copyDatabase(dir, from, to) {
  const socket = `--socket=${join(dir, 'mysqld.sock')}`;
  const dump = spawnSync('mariadb-dump', ['--no-defaults', socket, '-uroot', '--single-transaction', '--routines', from], {
    maxBuffer: 256 * 1024 * 1024,
  });
  if (dump.status !== 0) throw new Error(`dump of ${from} failed: ${dump.stderr}`);
  const load = spawnSync('mariadb', ['--no-defaults', socket, '-uroot', to], { input: dump.stdout });
  if (load.status !== 0) throw new Error(`copy into ${to} failed: ${load.stderr}`);
}

/** SIGTERM mariadbd and wait for a clean shutdown. */
export async function stopServer(child, timeoutMs = 30_000) {
  // Killed by a signal: exitCode stays null but signalCode is set, and its `exit` has already fired.
  if (!child || child.exitCode !== null || child.signalCode !== null) return;
  const done = new Promise((resolve) => child.once('exit', resolve));
  child.kill('SIGTERM');
  let timer;
  const fallback = new Promise((resolve) => {
    timer = setTimeout(() => {
      child.kill('SIGKILL');
      resolve();
    }, timeoutMs);
  });
  await Promise.race([done, fallback]);
  clearTimeout(timer);
}
