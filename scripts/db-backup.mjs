// `npm run db:backup`: one archive of the app's database (a consistent dump) and its uploads, with a
// manifest of row counts and checksums (scripts/lib/backup-archive.mjs), from the private MariaDB that
// `npm start` runs (its socket in .data/mariadb), to .data/backups/<database>-<UTC time>.tar.gz.
// Safe while the app runs: one snapshot transaction (InnoDB), no table locks. Old scheduled archives are
// pruned afterwards (7 daily, 4 weekly), and copied to an S3-compatible bucket when BACKUP_S3_BUCKET is
// set (scripts/lib/backup-s3.mjs). MARIADB_SOCKET, DB_NAME, UPLOADS_DIR and BACKUP_DIR override the defaults.
import { spawnSync } from 'node:child_process';
import { existsSync, statSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { DATA_DIR } from './lib/paths.mjs';
import { createBackup, rootArgs } from './lib/backup-archive.mjs';
import { archivesToKeep, backupDir, pruneArchives } from './lib/backup-schedule.mjs';
import { copyToBucket } from './lib/backup-s3.mjs';

/** Where to work: MARIADB_SOCKET / DB_NAME / UPLOADS_DIR / BACKUP_DIR override what `npm start` uses. */
export function dbTarget() {
  return {
    socket: resolve(process.env.MARIADB_SOCKET ?? join(DATA_DIR, 'mariadb', 'mysqld.sock')),
    database: process.env.DB_NAME ?? 'scanwright',
    backupDir: backupDir(),
    uploadsDir: resolve(process.env.UPLOADS_DIR ?? 'uploads'),
  };
}

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

async function main() {
  const target = dbTarget();
  if (!requireRunningServer(target)) fail(`MariaDB is running, but it has no database \`${target.database}\` to back up.`);
  try {
    const { file, manifest } = await createBackup(target);
    const kb = (statSync(file).size / 1024).toFixed(1);
    const rows = Object.values(manifest.tables).reduce((a, b) => a + b, 0);
    process.stdout.write(
      `Backed up database \`${target.database}\` (${Object.keys(manifest.tables).length} tables, ${rows} rows) and ` +
        `${Object.keys(manifest.uploads).length} upload files to ${file} (${kb} KiB).\n` +
        `Check it with: npm run db:verify ${file}\nRestore it with: npm run db:restore ${file}\n`,
    );
    const removed = pruneArchives(target.backupDir, target.database);
    if (removed.length) process.stdout.write(`Removed old backups (7 daily and 4 weekly are kept): ${removed.join(', ')}\n`);
    // With BACKUP_S3_BUCKET set: a copy in the bucket, pruned the same way. A failure there is reported
    // but the local archive stands, so the exit code stays 0.
    await copyToBucket({ file, database: target.database, keep: archivesToKeep, log: (line) => process.stdout.write(`${line}\n`) });
  } catch (err) {
    fail(`${err instanceof Error ? err.message : String(err)}\nNo backup was written.`);
  }
}

if (process.argv[1] && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) await main();
