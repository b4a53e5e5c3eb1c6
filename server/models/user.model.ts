import { randomBytes } from 'node:crypto';
import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { Role } from '@shared/policies.ts';

export class User extends Model<InferAttributes<User>, InferCreationAttributes<User>> {
  declare id: CreationOptional<number>;
  declare githubId: string;
  declare login: string;
  declare name: string | null;
  declare email: string | null;
  declare avatarUrl: string | null;
  declare role: CreationOptional<Role>;
  declare suspendedAt: CreationOptional<Date | null>;
  declare mailOptOut: CreationOptional<boolean>;
  /** Mail kinds this person turned off, comma-separated (see shared/schemas/mail-choices.ts). */
  declare mailOff: CreationOptional<string>;
  /** Random key that signs this person's one-click unsubscribe links; made with the account. */
  declare mailKey: CreationOptional<string | null>;
  declare lastSignInAt: CreationOptional<Date | null>;
  declare dataLicenceAcceptedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    User.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        githubId: { type: DataTypes.STRING(40), allowNull: false, unique: true },
        login: { type: DataTypes.STRING(64), allowNull: false, unique: true },
        name: DataTypes.STRING(120),
        email: DataTypes.STRING(254),
        avatarUrl: DataTypes.STRING(500),
        role: { type: DataTypes.ENUM('maker', 'moderator', 'admin'), allowNull: false, defaultValue: 'maker' },
        suspendedAt: DataTypes.DATE,
        mailOptOut: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        mailOff: { type: DataTypes.STRING(100), allowNull: false, defaultValue: '' },
        // Made with the account, so sending mail never writes the users row inside another transaction.
        mailKey: { type: DataTypes.STRING(64), allowNull: true, defaultValue: () => randomBytes(32).toString('base64url') },
        lastSignInAt: DataTypes.DATE,
        dataLicenceAcceptedAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'users', modelName: 'User', underscored: true },
    );
  }
}
