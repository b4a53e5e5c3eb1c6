import {
  DataTypes,
  Model,
  type CreationOptional,
  type InferAttributes,
  type InferCreationAttributes,
  type NonAttribute,
  type Sequelize,
} from 'sequelize';
import type { ActuatorAxis, ActuatorDrive } from '@shared/schemas/actuator-vocabulary.ts';
import type { Part } from './part.model.ts';

export class Actuator extends Model<InferAttributes<Actuator>, InferCreationAttributes<Actuator>> {
  declare id: CreationOptional<number>;
  declare buildId: number;
  declare partId: number;
  declare label: string | null;
  declare axis: ActuatorAxis;
  declare drive: ActuatorDrive;
  declare amplifier: string | null;
  declare maxVolts: number | null;
  declare notes: string | null;
  declare driveMatrixJson: CreationOptional<string | null>;
  declare linearisationJson: CreationOptional<string | null>;
  declare createdAt: CreationOptional<Date>;
  declare updatedAt: CreationOptional<Date>;
  declare part?: NonAttribute<Part>;

  static initModel(sequelize: Sequelize) {
    Actuator.init(
      {
        id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
        buildId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        partId: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
        label: DataTypes.STRING(120),
        axis: { type: DataTypes.STRING(4), allowNull: false },
        drive: { type: DataTypes.STRING(20), allowNull: false },
        amplifier: DataTypes.STRING(200),
        maxVolts: DataTypes.DOUBLE,
        notes: DataTypes.TEXT,
        driveMatrixJson: DataTypes.TEXT,
        linearisationJson: DataTypes.TEXT('medium'),
        createdAt: DataTypes.DATE,
        updatedAt: DataTypes.DATE,
      },
      { sequelize, tableName: 'actuators', modelName: 'Actuator', underscored: true },
    );
  }
}
