import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class Photo extends Model<InferAttributes<Photo>, InferCreationAttributes<Photo>> {
  declare id: CreationOptional<number>;
  declare buildId: number;
  declare entryId: CreationOptional<number | null>;
  declare ownerId: number;
  declare contentHash: string;
  declare displayFile: string;
  declare thumbFile: string;
  declare width: number;
  declare height: number;
  declare alt: string;
  declare position: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Photo.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        buildId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        entryId: DataTypes.INTEGER.UNSIGNED,
        ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        contentHash: { type: DataTypes.STRING(64), allowNull: false },
        displayFile: { type: DataTypes.STRING(120), allowNull: false },
        thumbFile: { type: DataTypes.STRING(120), allowNull: false },
        width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        alt: { type: DataTypes.STRING(300), allowNull: false },
        position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'photos', modelName: 'Photo', underscored: true },
    );
  }
}
