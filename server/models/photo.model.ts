import {
  DataTypes,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type ModelAttributes,
  type Sequelize,
} from 'sequelize';
import { AttachedPhoto, attachedPhotoAttributes } from './attached-photo.ts';

/** A photo in a build log: the fields every stored photo has, plus its owner and the log entry it belongs to. */
export class Photo extends AttachedPhoto<InferAttributes<Photo>, InferCreationAttributes<Photo>> {
  declare buildId: number;
  declare entryId: CreationOptional<number | null>;
  declare ownerId: number;

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
