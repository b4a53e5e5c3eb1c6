// `npm run db:backup`: a consistent dump of the app's database from the private MariaDB that
// `npm start` runs (its socket in .data/mariadb), to .data/backups/<database>-<UTC time>.sql.
// Safe while the app runs: one snapshot transaction (InnoDB), no table locks.
// MARIADB_SOCKET, DB_NAME and BACKUP_DIR override the defaults.
import { spawn, spawnSync } from 'node:child_process';
import { closeSync, existsSync, mkdirSync, openSync, renameSync, rmSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { DATA_DIR } from './lib/paths.mjs';

/** Where to work: MARIADB_SOCKET / DB_NAME / BACKUP_DIR override what `npm start` uses. */
export function dbTarget() {
  return {
    socket: resolve(process.env.MARIADB_SOCKET ?? join(DATA_DIR, 'mariadb', 'mysqld.sock')),
    database: process.env.DB_NAME ?? 'scanwright',
    backupDir: resolve(process.env.BACKUP_DIR ?? join(DATA_DIR, 'backups')),
  };
}

/** Root over the server's own socket, never reading /etc/mysql. */
export const rootArgs = (socket) => ['--no-defaults', `--socket=${socket}`, '--user=root', '--default-character-set=utf8mb4'];

export function fail(message, code = 1) {
  process.stderr.write(`${message}\n`);
  process.exit(code);
}

/** Exit with a message people can act on unless MariaDB answers on the socket; true when the database exists. */
export function requireRunningServer({ socket, database }) {
  const hint = 'Start it with `npm start` (these scripts talk to that server), or point MARIADB_SOCKET at another one.';
  if (!existsSync(socket)) fail(`MariaDB is not running: there is no socket at ${socket}.\n${hint}`);
  const ping = spawnSync('mariadb-admin', [...rootArgs(socket), 'ping'], { encoding: 'utf8' });
  if (ping.error) fail(`Cannot run mariadb-admin (${ping.error.message}); install the Debian package mariadb-client.`);
  if (ping.status !== 0 && /access denied/i.test(ping.stderr))
    fail(`MariaDB answers on ${socket} but refuses root over its socket: run this as the system user that runs npm start (root).`);
  if (ping.status !== 0) fail(`MariaDB is not running or does not answer on ${socket}:\n${(ping.stderr || ping.stdout).trim()}\n${hint}`);
  const has = spawnSync(
    'mariadb',
    [...rootArgs(socket), '--batch', '--skip-column-names', '-e', `SHOW DATABASES LIKE '${database.replace(/'/g, "''")}'`],
    { encoding: 'utf8' },
  );
  if (has.status !== 0) fail(`Could not query MariaDB on ${socket}:\n${has.stderr.trim()}`);
  return has.stdout.trim() === database;
}

/** 2026-12-01T23-30-05Z: sortable and safe in file names. */
const stamp = (d = new Date()) =>
  d
    .toISOString()
    .replace(/\.\d+Z$/, 'Z')
    .replace(/:/g, '-');

/**
 * Dump `database` to `<backupDir>/<prefix><database>-<time>.sql` (written to a .partial file and
 * renamed when complete, so a failed dump never looks like a backup). Resolves with the path.
 */
export async function backup({ socket, database, backupDir }, prefix = '') {
  mkdirSync(backupDir, { recursive: true, mode: 0o700 });
  const file = join(backupDir, `${prefix}${database}-${stamp()}.sql`);
  const partial = `${file}.partial`;
  const out = openSync(partial, 'w', 0o600);
  const args = [
    ...rootArgs(socket),
    '--single-transaction',
    '--routines',
    '--triggers',
    '--events',
    '--hex-blob',
    '--tz-utc',
    '--add-drop-table',
    '--quick',
    '--skip-dump-date',
    database,
  ];
  const code = await new Promise((done) => {
    const child = spawn('mariadb-dump', args, { stdio: ['ignore', out, 'pipe'] });
    let err = '';
    child.stderr.on('data', (c) => {
      err += c;
    });
    child.on('error', (e) => {
      err += e.message;
      done(-1);
    });
    child.on('exit', (c) => {
      if (c !== 0) process.stderr.write(err);
      done(c ?? 1);
    });
  });
  closeSync(out);
  if (code !== 0) {
    rmSync(partial, { force: true });
    throw new Error(`mariadb-dump failed (exit ${code}); no backup was written.`);
  }
  renameSync(partial, file);
  return file;
}

async function main() {
  const target = dbTarget();
  if (!requireRunningServer(target)) fail(`MariaDB is running, but it has no database \`${target.database}\` to back up.`);
  try {
    const file = await backup(target);
    const kb = (statSync(file).size / 1024).toFixed(1);
    process.stdout.write(
      `Backed up database \`${target.database}\` to ${file} (${kb} KiB).\nRestore it with: npm run db:restore ${file}\n`,
    );
  } catch (err) {
    fail(err instanceof Error ? err.message : String(err));
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) await main();
