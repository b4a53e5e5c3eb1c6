import { DataTypes, Model, type CreationOptional, type InferAttributes, type InferCreationAttributes, type Sequelize } from 'sequelize';

export class AuditEntry extends Model<InferAttributes<AuditEntry>, InferCreationAttributes<AuditEntry>> {
  declare id: CreationOptional<number>;
  declare actorId: number;
  declare action: string;
  declare targetType: string;
  declare targetId: number;
  /** The target named in words when the entry was made (null on entries older than the column). */
  declare targetLabel: string | null;
  declare note: string | null;
  declare createdAt: CreationOptional<Date>;

  static initModel(sequelize: Sequelize) {
    AuditEntry.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        actorId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        action: { type: DataTypes.STRING(40), allowNull: false },
        targetType: { type: DataTypes.STRING(20), allowNull: false },
        targetId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        targetLabel: DataTypes.STRING(300),
        note: DataTypes.TEXT,
        createdAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'audit_entries', modelName: 'AuditEntry', underscored: true, updatedAt: false },
    );
  }
}
