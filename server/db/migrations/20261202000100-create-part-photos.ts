import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** Photos of registry parts (same columns as listing_photos; see models/attached-photo.ts). */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('part_photos', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    part_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'parts', key: 'id' }, onDelete: 'CASCADE' },
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
  await qi.addIndex('part_photos', ['part_id', 'position']);
  // Upload clean-up asks "does any photo still show this content?" by hash, across all three photo tables.
  await qi.addIndex('part_photos', ['content_hash']);
  await qi.addIndex('listing_photos', ['content_hash']);
};
export const down: Migration = async ({ context: qi }) => {
  await qi.removeIndex('listing_photos', ['content_hash']);
  await qi.dropTable('part_photos');
};
