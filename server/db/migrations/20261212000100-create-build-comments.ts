import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** Comments on published builds from signed-in makers; moderators hide one with a note (the row stays). */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('build_comments', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    build_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'builds', key: 'id' }, onDelete: 'CASCADE' },
    author_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    body: { type: DataTypes.TEXT, allowNull: false },
    hidden_at: { type: DataTypes.DATE, allowNull: true },
    hidden_note: { type: DataTypes.TEXT, allowNull: true },
    hidden_by_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('build_comments', ['build_id', 'id']);
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('build_comments');
};
