import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/**
 * Rate-limit counters shared by every app instance on this database (RATE_LIMIT_STORE=mariadb): one row per limiter and
 * client key (sha256, so addresses and token ids of any length fit the primary key), the hits in the current window
 * and when it ends.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('rate_limit_counters', {
    counter_key: { type: DataTypes.CHAR(64), primaryKey: true },
    hits: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    reset_at: { type: DataTypes.DATE(3), allowNull: false },
  });
  await qi.addIndex('rate_limit_counters', ['reset_at'], { name: 'rate_limit_counters_reset_at' });
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('rate_limit_counters');
};
