// When a maker accepted the data licence (shared/data-licence.ts) for what they contribute; null until then.
import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('users', 'data_licence_accepted_at', { type: DataTypes.DATE, allowNull: true });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeColumn('users', 'data_licence_accepted_at');
};
