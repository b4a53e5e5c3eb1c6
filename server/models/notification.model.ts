import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { NotificationKind } from '@shared/schemas/notification.ts';

/** Something one person is told in the app: what happened, where to look, and whether they have read it. */
export class Notification extends Model<InferAttributes<Notification>, InferCreationAttributes<Notification>> {
  declare id: CreationOptional<number>;
  declare userId: number;
  declare kind: NotificationKind;
  declare text: string;
  declare path: string;
  declare readAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Notification.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        userId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        kind: { type: DataTypes.STRING(20), allowNull: false },
        text: { type: DataTypes.STRING(400), allowNull: false },
        path: { type: DataTypes.STRING(200), allowNull: false },
        readAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'notifications', modelName: 'Notification', underscored: true },
    );
  }
}
