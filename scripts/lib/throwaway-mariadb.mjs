// A MariaDB of its own for a script (db:verify, check-serve): its own data directory on tmpfs when
// there is one, its own port (free unless given) and its own TMPDIR, deleted again by `destroy()`.
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { ensureDatabase, initDataDir, rootSql, startServer, stopServer } from './mariadb.mjs';
import { freePort, scratchBase } from './scratch.mjs';

/** Init, start and (when `database` is given) create a database and a password user for 127.0.0.1. */
export async function startThrowawayMariaDb({ port, database, user = 'scanwright', password = 'throwaway-password' } = {}) {
  const dir = mkdtempSync(join(scratchBase(), 'scanwright-throwaway-'));
  const tmp = join(dir, 'tmp');
  mkdirSync(tmp);
  const saved = process.env.TMPDIR;
  // mariadbd keeps temporary tables in $TMPDIR and deletes stray #sql files there when it starts.
  process.env.TMPDIR = tmp;
  let child = null;
  try {
    initDataDir(dir);
    const p = port ?? (await freePort());
    child = await startServer(dir, p, { fast: true });
    if (database) ensureDatabase(dir, { database, user, password });
    return {
      dir,
      port: p,
      socket: join(dir, 'mysqld.sock'),
      db: { host: '127.0.0.1', port: p, name: database, user, password },
      sql: (statement) => rootSql(dir, statement),
      async destroy() {
        await stopServer(child);
        rmSync(dir, { recursive: true, force: true });
      },
    };
  } catch (err) {
    await stopServer(child);
    rmSync(dir, { recursive: true, force: true });
    throw err;
  } finally {
    if (saved === undefined) delete process.env.TMPDIR;
    else process.env.TMPDIR = saved;
  }
}
