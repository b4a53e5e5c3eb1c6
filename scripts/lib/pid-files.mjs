// Pid files of `npm start` under <data dir>/run: the supervisor, the app and (mariadbd writes its own)
// MariaDB. A start finds what an earlier, killed start left running and stops it — after checking in
// /proc that the pid still runs our command (a pid can be reused), never by name.
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { cmdlineOf, cwdOf, killPid, pidAlive } from './processes.mjs';

export function pidFiles(dataDir) {
  const run = join(dataDir, 'run');
  return { run, supervisor: join(run, 'supervisor.pid'), app: join(run, 'app.pid'), mariadb: join(dataDir, 'mariadb', 'mysqld.pid') };
}

export function writePid(file, pid) {
  mkdirSync(join(file, '..'), { recursive: true });
  writeFileSync(file, `${pid}\n`);
}

export function removePid(file, pid) {
  if (pid !== undefined && readPid(file) !== pid) return;
  rmSync(file, { force: true });
}

function readPid(file) {
  if (!existsSync(file)) return null;
  const pid = Number(readFileSync(file, 'utf8').trim());
  return Number.isInteger(pid) && pid > 1 ? pid : null;
}

/** The pid from `file` when it is alive and its command line passes `isOurs(args, cwd)`. */
function ours(file, isOurs) {
  const pid = readPid(file);
  if (!pid || pid === process.pid || !pidAlive(pid)) return null;
  const args = cmdlineOf(pid);
  return args && isOurs(args, cwdOf(pid)) ? pid : null;
}

/**
 * Before starting: a live supervisor of this data directory means another `npm start` runs (returned, so
 * the caller refuses); left-over app and MariaDB processes of a dead one are stopped. Returns
 * `{ running: pid }` or `{ stopped: [what, …] }`.
 */
export async function cleanUpStale({ dataDir, root, dbDir, log }) {
  const f = pidFiles(dataDir);
  const supervisor = ours(f.supervisor, (args, cwd) => cwd === root && args.some((a) => a.endsWith('scripts/start.mjs')));
  if (supervisor) return { running: supervisor };
  const stopped = [];
  const app = ours(f.app, (args, cwd) => cwd === root && args.some((a) => a.endsWith('dist/server/index.mjs')));
  if (app) {
    log(`Stopping the app left running by an earlier npm start (pid ${app}) …`);
    await killPid(app, 12_000);
    stopped.push(`app ${app}`);
  }
  const db = ours(f.mariadb, (args) => args.some((a) => a.endsWith('mariadbd')) && args.includes(`--datadir=${join(dbDir, 'data')}`));
  if (db) {
    log(`Stopping the MariaDB left running by an earlier npm start (pid ${db}) …`);
    await killPid(db, 30_000);
    stopped.push(`mariadb ${db}`);
  }
  rmSync(f.app, { force: true });
  rmSync(f.supervisor, { force: true });
  return { stopped };
}
