// Recomputes the stored fit of every calibration run from its points. The nonlinearity figure is
// now independent linearity on the calibration curve: max over distinct drive voltages of |mean
// reading at V (up and down sweeps averaged) − line| / span × 100 % [S: ISA-51.1 / ANSI/ISA-S37.1
// terms — memory for the clause]; runs stored before that hold max |residual| / span, which
// counts the hysteresis loop as nonlinearity. The other fit columns are rewritten from the same
// fit so a row never mixes two versions of the code.
//
// Part statistics are not recomputed: they pool |gain| and hysteresis of accepted runs
// (part-stats.service.ts), and neither changed. The line fit is the code that wrote the stored
// gains, and hysteresis groups the same sweep sums in the same order as before (sweep-gap.ts moved
// into voltage-groups.ts), so those columns are rewritten with the values they already hold.
// recomputePartStats() could not run here anyway: it uses the models, which cli/migrate.ts and
// cli/prepare.ts initialise only after migrating.
import { QueryTypes, type Transaction } from 'sequelize';
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

const UPDATE_FIT = `UPDATE calibration_runs SET point_count = ?, gain_nm_per_v = ?, gain_std_err_nm_per_v = ?,
  gain_ci95_lo_nm_per_v = ?, gain_ci95_hi_nm_per_v = ?, intercept_nm = ?, r2 = ?, residual_std_nm = ?, span_nm = ?,
  nonlinearity_pct_fs = ?, hysteresis_pct_fs = ? WHERE id = ?`;

/** The fit columns of one stored run in UPDATE_FIT order, or null when its points no longer fit. */
function refit(run: StoredRun): unknown[] | null {
  try {
    const points: unknown = JSON.parse(run.points_json);
    if (!Array.isArray(points)) return null;
    const fit = fitCalibrationInUnits(
      { points: points as RecordedCalibrationPoint[], voltageUnit: run.voltage_unit, displacementUnit: run.displacement_unit, model: run.model },
      { maxPoints: Number.MAX_SAFE_INTEGER },
    );
    return [
      fit.n, fit.gainNmPerV, fit.gainStdErrNmPerV, fit.gainCi95NmPerV[0], fit.gainCi95NmPerV[1], fit.interceptNm,
      fit.r2, fit.residualStdNm, fit.spanNm, fit.nonlinearityPctFs, fit.hysteresisPctFs, run.id,
    ];
  } catch {
    return null;
  }
}

/** Refits every run in batches by id, one transaction per batch; runs that no longer fit stay as stored. */
export const up: Migration = async ({ context: qi }) => {
  let lastId = 0;
  let updated = 0;
  let unfittable = 0;
  for (;;) {
    const batch = await qi.sequelize.transaction(async (transaction: Transaction) => {
      const runs = await qi.sequelize.query<StoredRun>(
        'SELECT id, points_json, voltage_unit, displacement_unit, model FROM calibration_runs WHERE id > ? ORDER BY id LIMIT ?',
        { replacements: [lastId, BATCH], type: QueryTypes.SELECT, transaction },
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
};

/** Nothing to undo: the figure it replaced was computed under the superseded definition. */
export const down: Migration = async () => {};
