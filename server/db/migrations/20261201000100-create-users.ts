import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('users', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    github_id: { type: DataTypes.STRING(40), allowNull: false, unique: true },
    login: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: true },
    email: { type: DataTypes.STRING(254), allowNull: true },
    avatar_url: { type: DataTypes.STRING(500), allowNull: true },
    role: { type: DataTypes.ENUM('maker', 'moderator', 'admin'), allowNull: false, defaultValue: 'maker' },
    suspended_at: { type: DataTypes.DATE, allowNull: true },
    mail_opt_out: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    last_sign_in_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('users', ['role']);
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('users');
};
