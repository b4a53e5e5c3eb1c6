import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/**
 * What a moderator looked at when deciding a build: the write-up and a summary of its runs (id, actuator,
 * gain as printed, status), one row per build decision, so a resubmission shows what changed since.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('build_review_snapshots', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    build_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'builds', key: 'id' }, onDelete: 'CASCADE' },
    moderator_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    decision: { type: DataTypes.STRING(20), allowNull: false },
    body: { type: DataTypes.TEXT('medium'), allowNull: false },
    runs_json: { type: DataTypes.TEXT('medium'), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('build_review_snapshots', ['build_id', 'id']);
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('build_review_snapshots');
};
