import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** A drive linearisation saved onto an actuator (settings, per-branch polynomials, table, before/after) as JSON; null when none. */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('actuators', 'linearisation_json', { type: DataTypes.TEXT('medium'), allowNull: true });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeColumn('actuators', 'linearisation_json');
};
