import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** The first answer to a POST sent with an Idempotency-Key, kept 24 h so a retry gets it again. */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('idempotency_keys', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    user_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    // Binary: keys differing only in case are different keys.
    idem_key: { type: DataTypes.STRING(255).BINARY, allowNull: false },
    method: { type: DataTypes.STRING(8), allowNull: false },
    path: { type: DataTypes.STRING(500), allowNull: false },
    body_hash: { type: DataTypes.CHAR(64), allowNull: false },
    response_status: { type: DataTypes.SMALLINT.UNSIGNED, allowNull: true },
    response_body: { type: DataTypes.TEXT('long'), allowNull: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('idempotency_keys', ['user_id', 'idem_key'], { unique: true, name: 'idempotency_keys_user_key' });
  await qi.addIndex('idempotency_keys', ['expires_at']);
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('idempotency_keys');
};
