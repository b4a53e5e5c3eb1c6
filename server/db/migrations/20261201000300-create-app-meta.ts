import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** Key/value facts about this installation, e.g. when the demo was seeded. */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('app_meta', {
    meta_key: { type: DataTypes.STRING(64), primaryKey: true },
    meta_value: { type: DataTypes.STRING(500), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('app_meta');
};
