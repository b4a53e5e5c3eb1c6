// Part figures count accepted runs only while their build is published (part-stats.service.ts `countingRuns`).
// Before, accepted runs of drafts, returned and declined builds counted too; this recomputes every part's pooled
// figures once under the new rule: magnitudes of gains, Hyndman–Fan type-7 quartiles (shared/stats/quantiles.ts),
// the median hysteresis and the number of builds. Raw SQL: the models are initialised only after migrating.
import { QueryTypes } from 'sequelize';
import { summarize } from '@shared/stats/quantiles.ts';
import type { Migration } from '../migrator.ts';

interface CountingRun {
  part_id: number;
  build_id: number;
  gain_nm_per_v: number;
  hysteresis_pct_fs: number | null;
}

export const up: Migration = async ({ context: qi }) => {
  const sequelize = qi.sequelize;
  await sequelize.transaction(async (transaction) => {
    const runs = await sequelize.query<CountingRun>(
      `SELECT r.part_id, r.build_id, r.gain_nm_per_v, r.hysteresis_pct_fs FROM calibration_runs r JOIN builds b ON b.id = r.build_id
       WHERE r.status = 'accepted' AND b.status = 'published'`,
      { type: QueryTypes.SELECT, transaction },
    );
    const byPart = new Map<number, CountingRun[]>();
    for (const r of runs) byPart.set(r.part_id, [...(byPart.get(r.part_id) ?? []), r]);
    const parts = await sequelize.query<{ id: number }>('SELECT id FROM parts', { type: QueryTypes.SELECT, transaction });
    for (const { id } of parts) {
      const mine = byPart.get(id) ?? [];
      const gains = summarize(mine.map((r) => Math.abs(Number(r.gain_nm_per_v))));
      const hysteresis = summarize(
        mine
          .map((r) => r.hysteresis_pct_fs)
          .filter((h): h is number => h !== null)
          .map(Number),
      );
      await sequelize.query(
        `UPDATE parts SET accepted_run_count = ?, build_count = ?, gain_median_nm_per_v = ?, gain_p25_nm_per_v = ?, gain_p75_nm_per_v = ?,
           gain_min_nm_per_v = ?, gain_max_nm_per_v = ?, hysteresis_median_pct = ? WHERE id = ?`,
        {
          replacements: [
            mine.length,
            new Set(mine.map((r) => r.build_id)).size,
            gains.median,
            gains.p25,
            gains.p75,
            gains.min,
            gains.max,
            hysteresis.median,
            id,
          ],
          transaction,
        },
      );
    }
  });
};

/** Nothing to undo: the figures are derived; the older rule would only count more runs again. */
export const down: Migration = async () => {};
