// Recomputes the stored fit of every calibration run from its points. The nonlinearity figure is
// now independent linearity on the calibration curve: max over distinct drive voltages of |mean
// reading at V (up and down sweeps averaged) − line| / span × 100 % [S: ISA-51.1 / ANSI/ISA-S37.1
// terms — memory for the clause]; runs stored before that hold max |residual| / span, which
// counts the hysteresis loop as nonlinearity. Only that column is rewritten: the gain, its
// interval, R², span and hysteresis come from code that did not change.
//
// Part statistics are not recomputed: they pool |gain| and hysteresis of accepted runs
// (part-stats.service.ts), and neither changed. recomputePartStats() could not run here anyway: it
// uses the models, which cli/migrate.ts and cli/prepare.ts initialise only after migrating.
import { QueryTypes, type QueryInterface, type Transaction } from 'sequelize';
import { fitCalibrationInUnits, type RecordedCalibrationPoint } from '@shared/workbench/calibration-fit.ts';
import type { FitModel } from '@shared/workbench/line-fit.ts';
import type { DisplacementUnit, VoltageUnit } from '@shared/units.ts';
import type { Migration } from '../migrator.ts';

const BATCH = 500;

interface StoredRun {
  id: number;
  points_json: string;
  voltage_unit: VoltageUnit;
  displacement_unit: DisplacementUnit;
  model: FitModel;
}

const UPDATE_FIT = 'UPDATE calibration_runs SET nonlinearity_pct_fs = ? WHERE id = ?';

/** The new nonlinearity and the id, in UPDATE_FIT order, or null when the run's points no longer fit. */
function refit(run: StoredRun): unknown[] | null {
  try {
    const points: unknown = JSON.parse(run.points_json);
    if (!Array.isArray(points)) return null;
    const fit = fitCalibrationInUnits(
      {
        points: points as RecordedCalibrationPoint[],
        voltageUnit: run.voltage_unit,
        displacementUnit: run.displacement_unit,
        model: run.model,
      },
      { maxPoints: Number.MAX_SAFE_INTEGER },
    );
    return [fit.nonlinearityPctFs, run.id];
  } catch {
    return null;
  }
}

/**
 * Refits runs in batches by id, one transaction per batch; runs that no longer fit stay as stored.
 * `onlyIds` limits it to some runs (tests use it so they touch only their own rows).
 */
export async function recomputeNonlinearity(
  qi: QueryInterface,
  onlyIds?: readonly number[],
): Promise<{ updated: number; unfittable: number }> {
  let lastId = 0;
  let updated = 0;
  let unfittable = 0;
  for (;;) {
    const batch = await qi.sequelize.transaction(async (transaction: Transaction) => {
      const runs = await qi.sequelize.query<StoredRun>(
        `SELECT id, points_json, voltage_unit, displacement_unit, model FROM calibration_runs WHERE id > ?${onlyIds ? ' AND id IN (?)' : ''} ORDER BY id LIMIT ?`,
        {
          replacements: onlyIds ? [lastId, onlyIds.length > 0 ? onlyIds : [0], BATCH] : [lastId, BATCH],
          type: QueryTypes.SELECT,
          transaction,
        },
      );
      for (const run of runs) {
        const columns = refit(run);
        if (!columns) {
          unfittable++;
          continue;
        }
        await qi.sequelize.query(UPDATE_FIT, { replacements: columns, transaction });
        updated++;
      }
      return runs;
    });
    if (batch.length === 0) break;
    lastId = batch[batch.length - 1]!.id;
    if (batch.length < BATCH) break;
  }
  return { updated, unfittable };
}

/** Recomputes every stored run's nonlinearity. */
export const up: Migration = async ({ context: qi }) => {
  await recomputeNonlinearity(qi);
};

/** Nothing to undo: the figure it replaced was computed under the superseded definition. */
export const down: Migration = async () => {};
