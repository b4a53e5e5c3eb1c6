import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class ListingPhoto extends Model<InferAttributes<ListingPhoto>, InferCreationAttributes<ListingPhoto>> {
  declare id: CreationOptional<number>;
  declare listingId: number;
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
    ListingPhoto.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        listingId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
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
      { sequelize, tableName: 'listing_photos', modelName: 'ListingPhoto', underscored: true },
    );
  }
}
