import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class AppMeta extends Model<InferAttributes<AppMeta>, InferCreationAttributes<AppMeta>> {
  declare metaKey: string;
  declare metaValue: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AppMeta.init(
      {
        metaKey: { type: DataTypes.STRING(64), primaryKey: true },
        metaValue: { type: DataTypes.STRING(500), allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'app_meta', modelName: 'AppMeta', underscored: true },
    );
  }
}
