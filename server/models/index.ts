import { DataTypes, type Sequelize } from 'sequelize';
import { User } from './user.model.ts';
import { AppMeta } from './app-meta.model.ts';

/** Bind every model to this process's Sequelize instance and declare associations. */
export function initModels(sequelize: Sequelize) {
  User.initModel(sequelize);
  AppMeta.initModel(sequelize);
  // The session store's model; its table comes from a migration, never from sync().
  sequelize.define(
    'Session',
    {
      sid: { type: DataTypes.STRING(64), primaryKey: true },
      userId: DataTypes.INTEGER.UNSIGNED,
      expires: DataTypes.DATE,
      data: DataTypes.TEXT,
    },
    { tableName: 'sessions', underscored: true },
  );
  return { User, AppMeta };
}
