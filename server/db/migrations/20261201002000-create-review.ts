import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** The audit trail, reports and the mail outbox. */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('audit_entries', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    actor_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' } },
    action: { type: DataTypes.STRING(40), allowNull: false },
    target_type: { type: DataTypes.STRING(20), allowNull: false },
    target_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('audit_entries', ['created_at']);
  await qi.addIndex('audit_entries', ['actor_id', 'created_at']);
  await qi.addIndex('audit_entries', ['target_type', 'target_id']);

  await qi.createTable('reports', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    reporter_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    target_type: { type: DataTypes.ENUM('build', 'run', 'part', 'listing'), allowNull: false },
    target_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    reason: { type: DataTypes.ENUM('wrong-data', 'spam', 'unsafe', 'offensive', 'duplicate', 'other'), allowNull: false },
    note: { type: DataTypes.TEXT, allowNull: true },
    status: { type: DataTypes.ENUM('open', 'resolved', 'dismissed'), allowNull: false, defaultValue: 'open' },
    resolution_note: { type: DataTypes.TEXT, allowNull: true },
    resolved_by_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    resolved_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('reports', ['status', 'created_at']);
  await qi.addIndex('reports', ['target_type', 'target_id']);

  await qi.createTable('mail_outbox', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    to_address: { type: DataTypes.STRING(254), allowNull: false },
    subject: { type: DataTypes.STRING(300), allowNull: false },
    text_body: { type: DataTypes.TEXT, allowNull: false },
    html_body: { type: DataTypes.TEXT, allowNull: false },
    attempts: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    next_attempt_at: { type: DataTypes.DATE, allowNull: false },
    sent_at: { type: DataTypes.DATE, allowNull: true },
    last_error: { type: DataTypes.STRING(500), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('mail_outbox', ['sent_at', 'next_attempt_at']);
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('mail_outbox');
  await qi.dropTable('reports');
  await qi.dropTable('audit_entries');
};
