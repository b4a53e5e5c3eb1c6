import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** Personal API tokens: only the SHA-256 of each secret is kept. */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('api_tokens', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    name: { type: DataTypes.STRING(80), allowNull: false },
    scopes: { type: DataTypes.STRING(100), allowNull: false },
    token_hash: { type: DataTypes.CHAR(64).BINARY, allowNull: false, unique: true },
    last_used_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('api_tokens', ['user_id', 'created_at']);
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('api_tokens');
};
