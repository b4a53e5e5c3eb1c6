import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** Actuators used in a build and their calibration runs (points stored, fit computed by the server). */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('actuators', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    build_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'builds', key: 'id' }, onDelete: 'CASCADE' },
    part_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'parts', key: 'id' }, onDelete: 'RESTRICT' },
    label: { type: DataTypes.STRING(120), allowNull: true },
    axis: { type: DataTypes.ENUM('X', 'Y', 'Z', 'XY'), allowNull: false },
    drive: { type: DataTypes.ENUM('single', 'pair-in-phase', 'pair-anti-phase', 'quartered-tube'), allowNull: false },
    amplifier: { type: DataTypes.STRING(200), allowNull: true },
    max_volts: { type: DataTypes.DOUBLE, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('actuators', ['build_id']);
  await qi.addIndex('actuators', ['part_id']);

  await qi.createTable('calibration_runs', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    actuator_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'actuators', key: 'id' }, onDelete: 'CASCADE' },
    build_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'builds', key: 'id' }, onDelete: 'CASCADE' },
    part_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'parts', key: 'id' }, onDelete: 'RESTRICT' },
    owner_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, references: { model: 'users', key: 'id' }, onDelete: 'CASCADE' },
    status: { type: DataTypes.ENUM('pending', 'accepted', 'rejected'), allowNull: false, defaultValue: 'pending' },
    method: { type: DataTypes.ENUM('indicator', 'capacitive', 'interferometer', 'optical-lever', 'reference-sample'), allowNull: false },
    voltage_unit: { type: DataTypes.ENUM('V', 'mV'), allowNull: false },
    displacement_unit: { type: DataTypes.ENUM('nm', 'um', 'angstrom', 'uin', 'mil'), allowNull: false },
    model: { type: DataTypes.ENUM('intercept', 'origin'), allowNull: false },
    drive_json: { type: DataTypes.TEXT, allowNull: true },
    conditions_json: { type: DataTypes.TEXT, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    points_json: { type: DataTypes.TEXT('long'), allowNull: false },
    point_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    gain_nm_per_v: { type: DataTypes.DOUBLE, allowNull: false },
    gain_std_err_nm_per_v: { type: DataTypes.DOUBLE, allowNull: true },
    gain_ci95_lo_nm_per_v: { type: DataTypes.DOUBLE, allowNull: true },
    gain_ci95_hi_nm_per_v: { type: DataTypes.DOUBLE, allowNull: true },
    intercept_nm: { type: DataTypes.DOUBLE, allowNull: false },
    r2: { type: DataTypes.DOUBLE, allowNull: true },
    residual_std_nm: { type: DataTypes.DOUBLE, allowNull: true },
    span_nm: { type: DataTypes.DOUBLE, allowNull: false },
    nonlinearity_pct_fs: { type: DataTypes.DOUBLE, allowNull: true },
    hysteresis_pct_fs: { type: DataTypes.DOUBLE, allowNull: true },
    review_note: { type: DataTypes.TEXT, allowNull: true },
    reviewed_by_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    reviewed_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('calibration_runs', ['actuator_id', 'created_at']);
  await qi.addIndex('calibration_runs', ['part_id', 'status', 'gain_nm_per_v']);
  await qi.addIndex('calibration_runs', ['status', 'created_at']);
  await qi.addIndex('calibration_runs', ['build_id']);
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('calibration_runs');
  await qi.dropTable('actuators');
};
