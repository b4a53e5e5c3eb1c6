import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';
import type { ReportReason, ReportStatus, ReportTargetType } from '@shared/schemas/review-vocabulary.ts';

export class Report extends Model<InferAttributes<Report>, InferCreationAttributes<Report>> {
  declare id: CreationOptional<number>;
  declare reporterId: number;
  declare targetType: ReportTargetType;
  declare targetId: number;
  declare reason: ReportReason;
  declare note: string | null;
  declare status: CreationOptional<ReportStatus>;
  declare resolutionNote: CreationOptional<string | null>;
  declare resolvedById: CreationOptional<number | null>;
  declare resolvedAt: CreationOptional<Date | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    Report.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        reporterId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        targetType: { type: DataTypes.STRING(10), allowNull: false },
        targetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        reason: { type: DataTypes.STRING(20), allowNull: false },
        note: DataTypes.TEXT,
        status: { type: DataTypes.STRING(10), allowNull: false, defaultValue: 'open' },
        resolutionNote: DataTypes.TEXT,
        resolvedById: DataTypes.INTEGER.UNSIGNED,
        resolvedAt: DataTypes.DATE,
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'reports', modelName: 'Report', underscored: true },
    );
  }
}
