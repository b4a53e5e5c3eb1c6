import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** Builds, their dated log entries and photos. */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('builds', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    owner_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    title: { type: DataTypes.STRING(160), allowNull: false },
    instrument_kind: {
      type: DataTypes.ENUM('tunnelling-microscope', 'force-microscope', 'profilometer', 'positioning-stage', 'manipulator', 'other'),
      allowNull: false,
    },
    summary: { type: DataTypes.STRING(600), allowNull: false },
    body: { type: DataTypes.TEXT('medium'), allowNull: false },
    stage: {
      type: DataTypes.ENUM('planning', 'assembling', 'first-signal', 'working', 'retired'),
      allowNull: false,
      defaultValue: 'planning',
    },
    status: { type: DataTypes.ENUM('draft', 'submitted', 'published', 'returned', 'declined'), allowNull: false, defaultValue: 'draft' },
    cover_photo_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    edited_since_review: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    review_note: { type: DataTypes.TEXT, allowNull: true },
    submitted_at: { type: DataTypes.DATE, allowNull: true },
    published_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('builds', ['status', 'published_at']);
  await qi.addIndex('builds', ['owner_id', 'updated_at']);
  await qi.addIndex('builds', ['status', 'instrument_kind', 'published_at']);

  await qi.createTable('log_entries', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    build_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'builds', key: 'id' }, onDelete: 'CASCADE' },
    entry_date: { type: DataTypes.DATEONLY, allowNull: false },
    title: { type: DataTypes.STRING(160), allowNull: false },
    body: { type: DataTypes.TEXT('medium'), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('log_entries', ['build_id', 'entry_date']);

  await qi.createTable('photos', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    build_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'builds', key: 'id' }, onDelete: 'CASCADE' },
    entry_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'log_entries', key: 'id' }, onDelete: 'SET NULL' },
    owner_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    content_hash: { type: DataTypes.STRING(64), allowNull: false },
    display_file: { type: DataTypes.STRING(120), allowNull: false },
    thumb_file: { type: DataTypes.STRING(120), allowNull: false },
    width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    alt: { type: DataTypes.STRING(300), allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('photos', ['build_id', 'position']);
  await qi.addIndex('photos', ['content_hash']);
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('photos');
  await qi.dropTable('log_entries');
  await qi.dropTable('builds');
};
