import { randomBytes } from 'node:crypto';
import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

const id = { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true };
const userRef = { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' };

/**
 * The conversation around a build and what people follow:
 * - `review_posts`: the thread between a build's maker and the moderators;
 * - `follows`: a maker follows a build, a part or another maker;
 * - `notifications`: what each person is told in the app (unread until marked read);
 * - per-kind mail choices (`users.mail_off`, kinds turned off) and the per-user key that signs one-click
 *   unsubscribe links (`users.mail_key`); `mail_outbox.headers` carries List-Unsubscribe (RFC 8058);
 * - comments can be reported (`reports.target_type` gains 'comment').
 */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('review_posts', {
    id,
    build_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'builds', key: 'id' }, onDelete: 'CASCADE' },
    author_id: userRef,
    body: { type: DataTypes.TEXT, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('review_posts', ['build_id', 'id']);
  await qi.createTable('follows', {
    id,
    user_id: userRef,
    target_type: { type: DataTypes.STRING(10), allowNull: false },
    target_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('follows', ['user_id', 'target_type', 'target_id'], { unique: true, name: 'follows_once' });
  await qi.addIndex('follows', ['target_type', 'target_id']);
  await qi.createTable('notifications', {
    id,
    user_id: userRef,
    kind: { type: DataTypes.STRING(20), allowNull: false },
    text: { type: DataTypes.STRING(400), allowNull: false },
    path: { type: DataTypes.STRING(200), allowNull: false },
    read_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('notifications', ['user_id', 'id']);
  await qi.addIndex('notifications', ['user_id', 'read_at']);
  await qi.addColumn('users', 'mail_off', { type: DataTypes.STRING(100), allowNull: false, defaultValue: '' });
  await qi.addColumn('users', 'mail_key', { type: DataTypes.STRING(64), allowNull: true });
  // Every existing account gets its key now; new ones get theirs when created (the model's default).
  const [users] = (await qi.sequelize.query('SELECT id FROM users WHERE mail_key IS NULL')) as [Array<{ id: number }>, unknown];
  for (const u of users) {
    await qi.sequelize.query('UPDATE users SET mail_key = ? WHERE id = ?', { replacements: [randomBytes(32).toString('base64url'), u.id] });
  }
  await qi.addColumn('mail_outbox', 'headers', { type: DataTypes.TEXT, allowNull: true });
  await qi.changeColumn('reports', 'target_type', { type: DataTypes.ENUM('build', 'run', 'part', 'listing', 'comment'), allowNull: false });
};
export const down: Migration = async ({ context: qi }) => {
  await qi.bulkDelete('reports', { target_type: 'comment' });
  await qi.changeColumn('reports', 'target_type', { type: DataTypes.ENUM('build', 'run', 'part', 'listing'), allowNull: false });
  await qi.removeColumn('mail_outbox', 'headers');
  await qi.removeColumn('users', 'mail_key');
  await qi.removeColumn('users', 'mail_off');
  await qi.dropTable('notifications');
  await qi.dropTable('follows');
  await qi.dropTable('review_posts');
};
