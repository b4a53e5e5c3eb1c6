// A MariaDB of a test's own (not the shared test database), for tests that stop, restart, dump or
// restore it while other test files keep using theirs. Tmpfs when writable, a free port, migrated.
import { startThrowawayMariaDb, type ThrowawayMariaDb } from '../../scripts/lib/throwaway-mariadb.mjs';
import type { Config } from '../../server/config.ts';
import { createSequelize } from '../../server/db/sequelize.ts';
import { createMigrator } from '../../server/db/migrator.ts';

export interface PrivateMariaDb extends Omit<ThrowawayMariaDb, 'db'> {
  /** The app's `config.db` for this server. */
  db: Config['db'];
}

/** Initialise, start, create the database and user, and (by default) apply every migration. */
export async function startPrivateMariaDb(opts: { database?: string; migrate?: boolean } = {}): Promise<PrivateMariaDb> {
  const server = await startThrowawayMariaDb({
    database: opts.database ?? 'scanwright_private',
    password: 'private-test-password',
    label: 'private',
  });
  const handle: PrivateMariaDb = { ...server, db: { ...server.db, poolMax: 10 } };
  if (opts.migrate !== false) {
    const sequelize = createSequelize(handle.db);
    try {
      await createMigrator(sequelize).up();
    } catch (err) {
      await server.destroy();
      throw err;
    } finally {
      await sequelize.close();
    }
  }
  return handle;
}
