import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** One post in the review thread of a build: its maker and the moderators talk about the review. */
export class ReviewPost extends Model<InferAttributes<ReviewPost>, InferCreationAttributes<ReviewPost>> {
  declare id: CreationOptional<number>;
  declare buildId: number;
  declare authorId: number;
  declare body: string;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    ReviewPost.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        buildId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        authorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        body: { type: DataTypes.TEXT, allowNull: false },
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'review_posts', modelName: 'ReviewPost', underscored: true },
    );
  }
}
