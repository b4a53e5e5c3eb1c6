import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** What an audit entry acted on, named in words as it was at that moment ("@rohan", a run's actuator, date and gain). */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('audit_entries', 'target_label', { type: DataTypes.STRING(300), allowNull: true });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeColumn('audit_entries', 'target_label');
};
