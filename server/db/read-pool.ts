// A small plain mariadb pool for the registry search, the hottest read in the product. Sequelize's
// query layer (replacement injection, a JavaScript type-cast callback per field, result shaping)
// cost about a fifth of each search request; this pool returns driver-native rows instead.
// Everything else goes through Sequelize. Connection failures surface as the driver's errors,
// which the error handler maps to 503 like Sequelize's (see isDbDown there).
import mariadb, { type Pool } from 'mariadb';
import type { Sequelize } from 'sequelize';

const pools = new WeakMap<Sequelize, Pool>();

/** The read pool beside this Sequelize instance (same server and credentials), created on first use. */
export function readPool(sequelize: Sequelize): Pool {
  let pool = pools.get(sequelize);
  if (!pool) {
    const c = sequelize.config;
    pool = mariadb.createPool({
      host: c.host,
      port: Number(c.port),
      user: c.username,
      password: c.password ?? undefined,
      database: c.database,
      connectionLimit: 8,
      // mariadb 3.0's pool grows only while fewer than minimumIdle are idle, so 0 would never connect.
      minimumIdle: 1,
      idleTimeout: 10,
      // Only autocommit SELECTs run here: no session state to reset, so no extra round trip per release.
      noControlAfterUse: true,
      acquireTimeout: 5000,
      connectTimeout: 3000,
      // Give up on one connection attempt (with the driver's retries) after 3 s; the waiting query then fails as 503.
      initializationTimeout: 3000,
      socketTimeout: 30000,
      bigIntAsNumber: true,
      decimalAsNumber: true,
    });
    // The driver reports a failed background connection attempt as an 'error' event, which would
    // crash the process without a listener. The query waiting for that connection fails on its own
    // (acquire timeout → 503), so the event itself needs no further handling.
    (pool as unknown as NodeJS.EventEmitter).on('error', () => undefined);
    pools.set(sequelize, pool);
  }
  return pool;
}

/** End the read pool of this Sequelize instance, if one was made. */
export async function closeReadPool(sequelize: Sequelize): Promise<void> {
  const pool = pools.get(sequelize);
  pools.delete(sequelize);
  await pool?.end();
}
