import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('sessions', {
    sid: { type: DataTypes.STRING(64), primaryKey: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    expires: { type: DataTypes.DATE, allowNull: true },
    data: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('sessions', ['expires']);
  await qi.addIndex('sessions', ['user_id']);
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('sessions');
};
