import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { RunKind, RunMethod, RunStatus } from '@shared/schemas/run-vocabulary.ts';
import type { DisplacementUnit, VoltageUnit } from '@shared/units.ts';
import type { FitModel } from '@shared/workbench/line-fit.ts';

export class CalibrationRun extends Model<InferAttributes<CalibrationRun>, InferCreationAttributes<CalibrationRun>> {
  declare id: CreationOptional<number>;
  declare actuatorId: number;
  declare buildId: number;
  declare partId: number;
  declare ownerId: number;
  declare status: CreationOptional<RunStatus>;
  declare kind: CreationOptional<RunKind>;
  declare measuredOn: string | null;
  declare detailJson: string | null;
  declare plotJson: string | null;
  declare method: RunMethod;
  declare voltageUnit: VoltageUnit;
  declare displacementUnit: DisplacementUnit;
  declare model: FitModel;
  declare driveJson: string | null;
  declare conditionsJson: string | null;
  declare notes: string | null;
  declare pointsJson: string;
  declare pointCount: number;
  declare gainNmPerV: number;
  declare gainStdErrNmPerV: number | null;
  declare gainCi95LoNmPerV: number | null;
  declare gainCi95HiNmPerV: number | null;
  declare interceptNm: number;
  declare r2: number | null;
  declare residualStdNm: number | null;
  declare spanNm: number;
  declare nonlinearityPctFs: number | null;
  declare hysteresisPctFs: number | null;
  declare reviewNote: CreationOptional<string | null>;
  declare reviewedById: CreationOptional<number | null>;
  declare reviewedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    const num = () => ({ type: DataTypes.DOUBLE, allowNull: true });
    CalibrationRun.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        actuatorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        buildId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        partId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        ownerId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: 'pending' },
        kind: { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'points' },
        measuredOn: DataTypes.DATEONLY,
        detailJson: DataTypes.TEXT,
        plotJson: DataTypes.TEXT('medium'),
        method: { type: DataTypes.STRING(20), allowNull: false },
        voltageUnit: { type: DataTypes.STRING(4), allowNull: false },
        displacementUnit: { type: DataTypes.STRING(10), allowNull: false },
        model: { type: DataTypes.STRING(10), allowNull: false },
        driveJson: DataTypes.TEXT,
        conditionsJson: DataTypes.TEXT,
        notes: DataTypes.TEXT,
        pointsJson: { type: DataTypes.TEXT('long'), allowNull: false },
        pointCount: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        gainNmPerV: { type: DataTypes.DOUBLE, allowNull: false },
        gainStdErrNmPerV: num(),
        gainCi95LoNmPerV: { ...num(), field: 'gain_ci95_lo_nm_per_v' },
        gainCi95HiNmPerV: { ...num(), field: 'gain_ci95_hi_nm_per_v' },
        interceptNm: { type: DataTypes.DOUBLE, allowNull: false },
        r2: num(),
        residualStdNm: num(),
        spanNm: { type: DataTypes.DOUBLE, allowNull: false },
        nonlinearityPctFs: num(),
        hysteresisPctFs: num(),
        reviewNote: DataTypes.TEXT,
        reviewedById: DataTypes.INTEGER.UNSIGNED,
        reviewedAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'calibration_runs', modelName: 'CalibrationRun', underscored: true },
    );
  }
}
