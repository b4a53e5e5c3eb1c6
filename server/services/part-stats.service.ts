import { Op, literal, type Transaction, type WhereOptions } from 'sequelize';
import { summarize } from '@shared/stats/quantiles.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { Part } from '../models/part.model.ts';
import { invalidateRegistryCounts } from './registry-count-cache.ts';

/** SQL on `calibration_runs`: the run's build is published. An accepted run counts only while it is. */
export const IN_PUBLISHED_BUILD = "build_id IN (SELECT pb.id FROM builds pb WHERE pb.status = 'published')";

/**
 * The runs that count in the registry (part figures, part pages, exports, histograms, the desk's comparison):
 * accepted, in a build that is published now. A build returned, declined or taken back stops its runs counting.
 */
export const countingRuns = (where: WhereOptions<CalibrationRun> = {}): WhereOptions<CalibrationRun> => ({
  ...where,
  status: 'accepted',
  [Op.and]: [literal(IN_PUBLISHED_BUILD)],
});

/**
 * Recompute a part's pooled figures from its counting runs (`countingRuns`), inside the caller's transaction.
 * Gains pool as magnitudes: the sign of a gain only says which way the element moves.
 */
export async function recomputePartStats(partId: number, transaction: Transaction): Promise<void> {
  const runs = await CalibrationRun.findAll({
    where: countingRuns({ partId }),
    attributes: ['gainNmPerV', 'hysteresisPctFs', 'buildId'],
    transaction,
  });
  const gains = summarize(runs.map((r) => Math.abs(r.gainNmPerV)));
  const hysteresis = summarize(runs.map((r) => r.hysteresisPctFs).filter((h): h is number => h !== null));
  await Part.update(
    {
      acceptedRunCount: runs.length,
      buildCount: new Set(runs.map((r) => r.buildId)).size,
      gainMedianNmPerV: gains.median,
      gainP25NmPerV: gains.p25,
      gainP75NmPerV: gains.p75,
      gainMinNmPerV: gains.min,
      gainMaxNmPerV: gains.max,
      hysteresisMedianPct: hysteresis.median,
    },
    { where: { id: partId }, transaction },
  );
  transaction.afterCommit(invalidateRegistryCounts);
}

/** After a build's status changed: recompute every part its runs are on, in the same transaction. */
export async function recomputeBuildParts(buildId: number, transaction: Transaction): Promise<void> {
  const runs = await CalibrationRun.findAll({ where: { buildId }, attributes: ['partId'], group: ['partId'], transaction });
  // Parts in id order, so two transactions lock them in the same order.
  for (const partId of runs.map((r) => r.partId).sort((a, b) => a - b)) {
    await Part.findByPk(partId, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] });
    await recomputePartStats(partId, transaction);
  }
}
