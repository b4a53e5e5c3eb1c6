// A MariaDB of a test's own (not the shared test database), for tests that stop, restart, dump or
// restore it while other test files keep using theirs. Tmpfs when writable, a free port, migrated.
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import type { ChildProcess } from 'node:child_process';
import { freePort, scratchBase } from '../../scripts/lib/scratch.mjs';
// @ts-expect-error plain ESM helper without types
import { initDataDir, startServer, ensureDatabase, stopServer, rootSql } from '../../scripts/lib/mariadb.mjs';
import type { Config } from '../../server/config.ts';
import { createSequelize } from '../../server/db/sequelize.ts';
import { createMigrator } from '../../server/db/migrator.ts';

export interface PrivateMariaDb {
  /** Data directory root (data/, mysqld.sock, error.log). */
  dir: string;
  socket: string;
  port: number;
  /** The app's `config.db` for this server. */
  db: Config['db'];
  /** Start mariadbd again on the same data directory and port. */
  start(): Promise<void>;
  /** SIGTERM mariadbd and wait until it has exited. */
  stop(): Promise<void>;
  running(): boolean;
  /** SQL as root over the socket; returns mariadb's tab-separated output. */
  sql(statement: string): string;
  /** Stop the server and delete the data directory. */
  destroy(): Promise<void>;
}

/**
 * Run with TMPDIR pointing into the instance's own directory: mariadbd (and the bootstrap of
 * mariadb-install-db) keep temporary tables in $TMPDIR, and a server starting up deletes every
 * `#sql*` file it finds there, so instances started at the same moment over a shared /tmp break
 * each other ("Error on delete of '/tmp/#sql-temptable-…'").
 */
async function withOwnTmpdir<T>(dir: string, work: () => T | Promise<T>): Promise<T> {
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

/** Initialise, start, create the database and user, and (by default) apply every migration. */
export async function startPrivateMariaDb(opts: { database?: string; migrate?: boolean } = {}): Promise<PrivateMariaDb> {
  const dir = mkdtempSync(join(scratchBase(), 'scanwright-private-'));
  const port = await freePort();
  const db: Config['db'] = {
    host: '127.0.0.1',
    port,
    name: opts.database ?? 'scanwright_private',
    user: 'scanwright',
    password: 'private-test-password',
    poolMax: 10,
  };
  let child: ChildProcess | null = null;
  const handle: PrivateMariaDb = {
    dir,
    socket: join(dir, 'mysqld.sock'),
    port,
    db,
    async start() {
      if (handle.running()) return;
      child = await withOwnTmpdir(dir, () => startServer(dir, port, { fast: true }));
    },
    async stop() {
      await stopServer(child);
    },
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
    ensureDatabase(dir, { database: db.name, user: db.user, password: db.password });
    if (opts.migrate !== false) {
      const sequelize = createSequelize(db);
      try {
        await createMigrator(sequelize).up();
      } finally {
        await sequelize.close();
      }
    }
  } catch (err) {
    await handle.destroy();
    throw err;
  }
  return handle;
}
