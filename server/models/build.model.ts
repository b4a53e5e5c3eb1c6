import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { BuildStage, BuildStatus, InstrumentKind } from '@shared/schemas/build-vocabulary.ts';
import type { User } from './user.model.ts';

export class Build extends Model<InferAttributes<Build>, InferCreationAttributes<Build>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  declare title: string;
  declare instrumentKind: InstrumentKind;
  declare summary: string;
  declare body: CreationOptional<string>;
  declare stage: CreationOptional<BuildStage>;
  declare status: CreationOptional<BuildStatus>;
  declare coverPhotoId: CreationOptional<number | null>;
  declare editedSinceReview: CreationOptional<boolean>;
  declare reviewNote: CreationOptional<string | null>;
  /** The moderator chose to show the publish note to everyone; otherwise only the owner and moderators read it. */
  declare reviewNotePublic: CreationOptional<boolean>;
  declare submittedAt: CreationOptional<Date | null>;
  declare publishedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare owner?: NonAttribute<User>;

  static initModel(sequelize: Sequelize) {
    Build.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        title: { type: DataTypes.STRING(160), allowNull: false },
        instrumentKind: { type: DataTypes.STRING(30), allowNull: false },
        summary: { type: DataTypes.STRING(600), allowNull: false },
        body: { type: DataTypes.TEXT('medium'), allowNull: false, defaultValue: '' },
        stage: { type: DataTypes.STRING(20), allowNull: false, defaultValue: 'planning' },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'draft' },
        coverPhotoId: DataTypes.INTEGER.UNSIGNED,
        editedSinceReview: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        reviewNote: DataTypes.TEXT,
        reviewNotePublic: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
        submittedAt: DataTypes.DATE,
        publishedAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'builds', modelName: 'Build', underscored: true },
    );
  }
}
