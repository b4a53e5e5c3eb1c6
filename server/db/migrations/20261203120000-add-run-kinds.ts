// Runs of three kinds (points, peak-to-peak, sine-record), a "measured on" date, the kind's own fit
// figures (detail_json) and a stored plot series (plot_json: every point of a small run, else an LTTB
// selection of PLOT_POINTS) so pages never read the raw record. Existing runs are point runs; their
// plot series is filled here in batches.
import { DataTypes, QueryTypes, type QueryInterface, type Transaction } from 'sequelize';
import { lttb } from '@shared/stats/lttb.ts';
import type { Migration } from '../migrator.ts';

const BATCH = 200;
const PLOT_POINTS = 2000;

interface StoredPoints {
  id: number;
  points_json: string;
}

function plotOf(json: string): string {
  try {
    const points: unknown = JSON.parse(json);
    if (!Array.isArray(points)) return '[]';
    return JSON.stringify(lttb(points as Array<{ displacement: number }>, PLOT_POINTS, (p) => Number(p.displacement)));
  } catch {
    return '[]';
  }
}

async function fillPlots(qi: QueryInterface): Promise<void> {
  let lastId = 0;
  for (;;) {
    const batch = await qi.sequelize.transaction(async (transaction: Transaction) => {
      const runs = await qi.sequelize.query<StoredPoints>('SELECT id, points_json FROM calibration_runs WHERE id > ? ORDER BY id LIMIT ?', {
        replacements: [lastId, BATCH],
        type: QueryTypes.SELECT,
        transaction,
      });
      for (const r of runs)
        await qi.sequelize.query('UPDATE calibration_runs SET plot_json = ? WHERE id = ?', {
          replacements: [plotOf(r.points_json), r.id],
          transaction,
        });
      return runs;
    });
    if (batch.length === 0) break;
    lastId = batch[batch.length - 1]!.id;
    if (batch.length < BATCH) break;
  }
}

export const up: Migration = async ({ context: qi }) => {
  await qi.addColumn('calibration_runs', 'kind', { type: DataTypes.STRING(16), allowNull: false, defaultValue: 'points' });
  await qi.addColumn('calibration_runs', 'measured_on', { type: DataTypes.DATEONLY, allowNull: true });
  await qi.addColumn('calibration_runs', 'detail_json', { type: DataTypes.TEXT, allowNull: true });
  await qi.addColumn('calibration_runs', 'plot_json', { type: DataTypes.TEXT('medium'), allowNull: true });
  await fillPlots(qi);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.removeColumn('calibration_runs', 'plot_json');
  await qi.removeColumn('calibration_runs', 'detail_json');
  await qi.removeColumn('calibration_runs', 'measured_on');
  await qi.removeColumn('calibration_runs', 'kind');
};
