import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type ModelAttributes,
  type Sequelize,
} from 'sequelize';
import { attachedPhotoAttributes } from './attached-photo.ts';

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
        // The columns every stored photo has, keyed to its build, plus the build photo's own two.
        ...attachedPhotoAttributes('buildId'),
        entryId: DataTypes.INTEGER.UNSIGNED,
        ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
      } as ModelAttributes<Photo>,
      { sequelize, tableName: 'photos', modelName: 'Photo', underscored: true },
    );
  }
}
