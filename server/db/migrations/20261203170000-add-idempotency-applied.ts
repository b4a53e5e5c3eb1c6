import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/**
 * Which row the first request under an Idempotency-Key created, written in that request's own transaction: a
 * retry after a crash between the commit and the stored answer can then tell "done" from "never happened".
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('idempotency_keys', 'applied_resource', { type: DataTypes.STRING(80), allowNull: true });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeColumn('idempotency_keys', 'applied_resource');
};
