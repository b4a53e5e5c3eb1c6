import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** A two-axis mixer result saved onto an XY-pair actuator (G, offsets, drive limits, model, date) as JSON; null when none. */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('actuators', 'drive_matrix_json', { type: DataTypes.TEXT, allowNull: true });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeColumn('actuators', 'drive_matrix_json');
};
