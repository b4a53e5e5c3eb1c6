import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ListingCondition, ListingKind, ListingStatus, PriceKind } from '@shared/schemas/listing-vocabulary.ts';

export class Listing extends Model<InferAttributes<Listing>, InferCreationAttributes<Listing>> {
  declare id: CreationOptional<number>;
  declare ownerId: number;
  declare partId: number;
  declare kind: ListingKind;
  declare quantity: number;
  declare condition: ListingCondition;
  declare priceKind: PriceKind;
  declare priceAmount: number | null;
  declare currency: string | null;
  declare region: string;
  declare shipsTo: string | null;
  declare notes: string | null;
  declare status: CreationOptional<ListingStatus>;
  declare hiddenAt: CreationOptional<Date | null>;
  declare hiddenNote: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Listing.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        partId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        kind: { type: DataTypes.STRING(10), allowNull: false },
        quantity: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        condition: { type: DataTypes.STRING(20), allowNull: false },
        priceKind: { type: DataTypes.STRING(6), allowNull: false },
        priceAmount: {
          type: DataTypes.DECIMAL(10, 2),
          allowNull: true,
          get(this: Listing) {
            const raw = this.getDataValue('priceAmount') as unknown;
            return raw === null || raw === undefined ? null : Number(raw);
          },
        },
        currency: DataTypes.STRING(3),
        region: { type: DataTypes.STRING(80), allowNull: false },
        shipsTo: DataTypes.STRING(160),
        notes: DataTypes.TEXT,
        status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'open' },
        hiddenAt: DataTypes.DATE,
        hiddenNote: DataTypes.TEXT,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'listings', modelName: 'Listing', underscored: true },
    );
  }
}
