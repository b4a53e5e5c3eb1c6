import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class LogEntry extends Model<InferAttributes<LogEntry>, InferCreationAttributes<LogEntry>> {
  declare id: CreationOptional<number>;
  declare buildId: number;
  declare entryDate: string;
  declare title: string;
  declare body: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    LogEntry.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        buildId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        entryDate: { type: DataTypes.DATEONLY, allowNull: false },
        title: { type: DataTypes.STRING(160), allowNull: false },
        body: { type: DataTypes.TEXT('medium'), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'log_entries', modelName: 'LogEntry', underscored: true },
    );
  }
}
