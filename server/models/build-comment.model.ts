import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class BuildComment extends Model<InferAttributes<BuildComment>, InferCreationAttributes<BuildComment>> {
  declare id: CreationOptional<number>;
  declare buildId: number;
  declare authorId: number;
  declare body: string;
  declare hiddenAt: CreationOptional<Date | null>;
  declare hiddenNote: CreationOptional<string | null>;
  declare hiddenById: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    BuildComment.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        buildId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        authorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        body: { type: DataTypes.TEXT, allowNull: false },
        hiddenAt: DataTypes.DATE,
        hiddenNote: DataTypes.TEXT,
        hiddenById: DataTypes.INTEGER.UNSIGNED,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'build_comments', modelName: 'BuildComment', underscored: true },
    );
  }
}
