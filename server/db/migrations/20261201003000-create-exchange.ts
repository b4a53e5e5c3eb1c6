import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** The exchange: listings, their photos, and message threads between makers. */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('listings', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    owner_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    part_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'parts', key: 'id' } },
    kind: { type: DataTypes.ENUM('offering', 'seeking'), allowNull: false },
    quantity: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    condition: { type: DataTypes.ENUM('new', 'salvaged-tested', 'salvaged-untested'), allowNull: false },
    price_kind: { type: DataTypes.ENUM('price', 'free', 'swap'), allowNull: false },
    price_amount: { type: DataTypes.DECIMAL(10, 2), allowNull: true },
    currency: { type: DataTypes.STRING(3), allowNull: true },
    region: { type: DataTypes.STRING(80), allowNull: false },
    ships_to: { type: DataTypes.STRING(160), allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    status: { type: DataTypes.ENUM('open', 'reserved', 'closed'), allowNull: false, defaultValue: 'open' },
    hidden_at: { type: DataTypes.DATE, allowNull: true },
    hidden_note: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('listings', ['status', 'hidden_at', 'created_at']);
  await qi.addIndex('listings', ['part_id', 'status']);
  await qi.addIndex('listings', ['owner_id', 'updated_at']);

  await qi.createTable('listing_photos', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    listing_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'listings', key: 'id' }, onDelete: 'CASCADE' },
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
  await qi.addIndex('listing_photos', ['listing_id', 'position']);

  await qi.createTable('message_threads', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    listing_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'listings', key: 'id' }, onDelete: 'CASCADE' },
    starter_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    owner_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    last_message_at: { type: DataTypes.DATE, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('message_threads', ['listing_id', 'starter_id'], { unique: true });
  await qi.addIndex('message_threads', ['owner_id', 'last_message_at']);
  await qi.addIndex('message_threads', ['starter_id', 'last_message_at']);

  await qi.createTable('messages', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    thread_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'message_threads', key: 'id' },
      onDelete: 'CASCADE',
    },
    sender_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    body: { type: DataTypes.TEXT, allowNull: false },
    read_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('messages', ['thread_id', 'created_at']);
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('messages');
  await qi.dropTable('message_threads');
  await qi.dropTable('listing_photos');
  await qi.dropTable('listings');
};
