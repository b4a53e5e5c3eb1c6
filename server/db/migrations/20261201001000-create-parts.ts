import { DataTypes } from 'sequelize';
import type { Migration } from '../migrator.ts';

/** The parts registry: one row per transducer type, with pooled statistics kept on the row. */
export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('parts', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    category: { type: DataTypes.ENUM('bimorph', 'buzzer-disc', 'stack', 'tube', 'shear-plate', 'voice-coil', 'other'), allowNull: false },
    name: { type: DataTypes.STRING(160), allowNull: false },
    salvage_source: { type: DataTypes.STRING(240), allowNull: true },
    material: { type: DataTypes.STRING(40), allowNull: true },
    length_mm: { type: DataTypes.DOUBLE, allowNull: true },
    width_mm: { type: DataTypes.DOUBLE, allowNull: true },
    thickness_mm: { type: DataTypes.DOUBLE, allowNull: true },
    outer_diameter_mm: { type: DataTypes.DOUBLE, allowNull: true },
    wall_mm: { type: DataTypes.DOUBLE, allowNull: true },
    layers: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    capacitance_nf: { type: DataTypes.DOUBLE, allowNull: true },
    safe_volts: { type: DataTypes.DOUBLE, allowNull: true },
    notes: { type: DataTypes.TEXT, allowNull: true },
    status: { type: DataTypes.ENUM('proposed', 'accepted', 'rejected'), allowNull: false, defaultValue: 'proposed' },
    proposed_by_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true, references: { model: 'users', key: 'id' }, onDelete: 'SET NULL' },
    merged_into_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    accepted_run_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    build_count: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    gain_median_nm_per_v: { type: DataTypes.DOUBLE, allowNull: true },
    gain_p25_nm_per_v: { type: DataTypes.DOUBLE, allowNull: true },
    gain_p75_nm_per_v: { type: DataTypes.DOUBLE, allowNull: true },
    gain_min_nm_per_v: { type: DataTypes.DOUBLE, allowNull: true },
    gain_max_nm_per_v: { type: DataTypes.DOUBLE, allowNull: true },
    hysteresis_median_pct: { type: DataTypes.DOUBLE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('parts', ['status', 'category']);
  await qi.addIndex('parts', ['status', 'gain_median_nm_per_v']);
  await qi.addIndex('parts', ['name']);
};
export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('parts');
};
