import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { PartCategory, PartStatus } from '@shared/schemas/part-vocabulary.ts';

export class Part extends Model<InferAttributes<Part>, InferCreationAttributes<Part>> {
  declare id: CreationOptional<number>;
  declare category: PartCategory;
  declare name: string;
  declare salvageSource: string | null;
  declare material: string | null;
  declare lengthMm: number | null;
  declare widthMm: number | null;
  declare thicknessMm: number | null;
  declare outerDiameterMm: number | null;
  declare wallMm: number | null;
  declare layers: number | null;
  declare capacitanceNf: number | null;
  declare safeVolts: number | null;
  declare notes: string | null;
  declare status: CreationOptional<PartStatus>;
  declare proposedById: number | null;
  declare mergedIntoId: CreationOptional<number | null>;
  declare acceptedRunCount: CreationOptional<number>;
  declare buildCount: CreationOptional<number>;
  declare gainMedianNmPerV: CreationOptional<number | null>;
  declare gainP25NmPerV: CreationOptional<number | null>;
  declare gainP75NmPerV: CreationOptional<number | null>;
  declare gainMinNmPerV: CreationOptional<number | null>;
  declare gainMaxNmPerV: CreationOptional<number | null>;
  declare hysteresisMedianPct: CreationOptional<number | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const num = () => ({ type: DataTypes.DOUBLE, allowNull: true });
    Part.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        category: { type: DataTypes.STRING(20), allowNull: false },
        name: { type: DataTypes.STRING(160), allowNull: false },
        salvageSource: DataTypes.STRING(240),
        material: DataTypes.STRING(40),
        lengthMm: num(),
        widthMm: num(),
        thicknessMm: num(),
        outerDiameterMm: num(),
        wallMm: num(),
        layers: DataTypes.INTEGER.UNSIGNED,
        capacitanceNf: num(),
        safeVolts: num(),
        notes: DataTypes.TEXT,
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'proposed' },
        proposedById: DataTypes.INTEGER.UNSIGNED,
        mergedIntoId: DataTypes.INTEGER.UNSIGNED,
        acceptedRunCount: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        buildCount: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
        gainMedianNmPerV: num(),
        gainP25NmPerV: { ...num(), field: 'gain_p25_nm_per_v' },
        gainP75NmPerV: { ...num(), field: 'gain_p75_nm_per_v' },
        gainMinNmPerV: num(),
        gainMaxNmPerV: num(),
        hysteresisMedianPct: num(),
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'parts', modelName: 'Part', underscored: true },
    );
  }
}
