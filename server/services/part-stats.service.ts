import type { Transaction } from 'sequelize';
import { summarize } from '@shared/stats/quantiles.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { Part } from '../models/part.model.ts';
import { invalidateRegistryCounts } from './registry-count-cache.ts';

/**
 * Recompute a part's pooled figures from its accepted runs, inside the caller's transaction.
 * Gains pool as magnitudes: the sign of a gain only says which way the element moves.
 */
export async function recomputePartStats(partId: number, transaction: Transaction): Promise<void> {
  const runs = await CalibrationRun.findAll({
    where: { partId, status: 'accepted' },
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
