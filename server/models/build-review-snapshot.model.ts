import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

/** What a moderator looked at when deciding a build: its write-up and a summary of its runs (JSON of ReviewedRun). */
export class BuildReviewSnapshot extends Model<InferAttributes<BuildReviewSnapshot>, InferCreationAttributes<BuildReviewSnapshot>> {
  declare id: CreationOptional<number>;
  declare buildId: number;
  declare moderatorId: number;
  declare decision: string;
  declare body: string;
  declare runsJson: string;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    BuildReviewSnapshot.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        buildId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        moderatorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        decision: { type: DataTypes.STRING(20), allowNull: false },
        body: { type: DataTypes.TEXT('medium'), allowNull: false },
        runsJson: { type: DataTypes.TEXT('medium'), allowNull: false },
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'build_review_snapshots', modelName: 'BuildReviewSnapshot', underscored: true, updatedAt: false },
    );
  }
}
