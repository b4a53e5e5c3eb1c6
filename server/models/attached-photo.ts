import { DataTypes, Model, type CreationOptional, type ModelAttributes } from 'sequelize';

/**
 * What every stored photo holds (tables photos, part_photos and listing_photos): the two stored WebP variants under
 * content-hash names, their size, alt text and order. Build photos (models/photo.model.ts) add an owner and a log
 * entry, and type their attributes through the parameters (as Sequelize's Model does).
 */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- the same default as Sequelize's own Model
export abstract class AttachedPhoto<TAttributes extends object = any, TCreation extends object = TAttributes> extends Model<
  TAttributes,
  TCreation
> {
  declare id: CreationOptional<number>;
  declare contentHash: string;
  declare displayFile: string;
  declare thumbFile: string;
  declare width: number;
  declare height: number;
  declare alt: string;
  declare position: CreationOptional<number>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
}

/** The columns of an attached-photo table, with the foreign key to what it is attached to. */
export function attachedPhotoAttributes(ownerKey: string): ModelAttributes {
  return {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    [ownerKey]: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    contentHash: { type: DataTypes.STRING(64), allowNull: false },
    displayFile: { type: DataTypes.STRING(120), allowNull: false },
    thumbFile: { type: DataTypes.STRING(120), allowNull: false },
    width: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    height: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    alt: { type: DataTypes.STRING(300), allowNull: false },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    createdAt: DataTypes.DATE,
    updatedAt: DataTypes.DATE,
  };
}
