import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/**
 * A lease on each outbox mail, so several app instances send every mail once: a worker sets
 * `claimed_by` (its instance id) and `claimed_until` in one UPDATE before sending; an expired
 * lease (a worker that died mid-send) lets another worker take the mail.
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('mail_outbox', 'claimed_by', { type: DataTypes.STRING(80), allowNull: true });
  await qi.addColumn('mail_outbox', 'claimed_until', { type: DataTypes.DATE, allowNull: true });
  await qi.addIndex('mail_outbox', ['claimed_by'], { name: 'mail_outbox_claimed_by' });
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeIndex('mail_outbox', 'mail_outbox_claimed_by');
  await qi.removeColumn('mail_outbox', 'claimed_until');
  await qi.removeColumn('mail_outbox', 'claimed_by');
};
