import { Sequelize } from 'sequelize';
import type { Config } from '../config.ts';

/** One connection pool per process; short acquire timeouts so a dead database fails fast (503), not hangs. */
export function createSequelize(db: Config['db']): Sequelize {
  return new Sequelize(db.name, db.user, db.password, {
    host: db.host,
    port: db.port,
    dialect: 'mariadb',
    logging: false,
    timezone: '+00:00',
    define: { underscored: true },
    pool: { max: db.poolMax, min: 0, acquire: 5000, idle: 10000, evict: 5000 },
    dialectOptions: { connectTimeout: 3000, socketTimeout: 30000 },
    retry: { max: 0 },
  });
}
