// A MariaDB of its own (npm test, db:verify, check-serve, the benchmarks, and tests that stop, dump or restore theirs):
// its own data directory on tmpfs when there is one, its own port (free unless given) and its own TMPDIR, deleted
// again by `destroy()`.
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ensureDatabase, initDataDir, rootSql, startServer, stopServer } from './mariadb.mjs';
import { freePort, scratchBase } from './scratch.mjs';

/**
 * Runs `work` with TMPDIR pointing into the instance's own directory: mariadbd (and the bootstrap of
 * mariadb-install-db) keep temporary tables in $TMPDIR, and a server starting up deletes every `#sql*` file it finds
 * there, so instances started at the same moment over a shared /tmp break each other
 * ("Error on delete of '/tmp/#sql-temptable-…'").
 */
async function withOwnTmpdir(dir, work) {
  const tmp = join(dir, 'tmp');
  mkdirSync(tmp, { recursive: true });
  const saved = process.env.TMPDIR;
  process.env.TMPDIR = tmp;
  try {
    return await work();
  } finally {
    if (saved === undefined) delete process.env.TMPDIR;
    else process.env.TMPDIR = saved;
  }
}

/**
 * Init, start and (when `database` is given) create a database and a password user for 127.0.0.1. `fast` (the
 * default) flushes the log once a second and skips the doublewrite buffer: a crash of the machine may lose the last
 * second, which a throwaway server does not mind; a benchmark of writes passes `fast: false`. `label` names the folder.
 */
export async function startThrowawayMariaDb({
  port,
  database,
  user = 'scanwright',
  password = 'throwaway-password',
  fast = true,
  label = 'throwaway',
} = {}) {
  const dir = mkdtempSync(join(scratchBase(), `scanwright-${label}-`));
  const p = port ?? (await freePort());
  let child = null;
  const handle = {
    dir,
    port: p,
    socket: join(dir, 'mysqld.sock'),
    tmp: join(dir, 'tmp'),
    db: { host: '127.0.0.1', port: p, name: database, user, password },
    async start() {
      if (handle.running()) return;
      child = await withOwnTmpdir(dir, () => startServer(dir, p, { fast }));
    },
    stop: () => stopServer(child),
    running: () => child !== null && child.exitCode === null && child.signalCode === null,
    sql: (statement) => rootSql(dir, statement),
    async destroy() {
      await stopServer(child);
      rmSync(dir, { recursive: true, force: true });
    },
  };
  try {
    await withOwnTmpdir(dir, () => initDataDir(dir));
    await handle.start();
    if (database) ensureDatabase(dir, { database, user, password });
    return handle;
  } catch (err) {
    await handle.destroy();
    throw err;
  }
}
