// The part page's two lists as hand-written joins on the plain read pool (see server/db/read-pool.ts): accepted runs
// with their build, actuator and maker, and open listings with their owner. Columns are exactly what the page shows.
import type { Sequelize } from 'sequelize';
import { readPool } from '../db/read-pool.ts';
import type { PartListingRow, PartRunRow } from '../presenters/part.presenter.ts';

const ISO = "'%Y-%m-%dT%H:%i:%s.000Z'"; // DATETIME(0) holding UTC (Sequelize timezone +00:00)

/** Accepted runs of a part in published builds (the runs that count), oldest first (at most `limit`), in one statement. */
export async function selectPartRuns(sequelize: Sequelize, partId: number, limit: number): Promise<PartRunRow[]> {
  return readPool(sequelize).query(
    `SELECT r.id, r.build_id AS buildId, b.title AS buildTitle, u.login AS maker, a.label AS actuatorLabel, a.axis, r.method, r.kind,
       r.gain_nm_per_v AS gainNmPerV, r.gain_std_err_nm_per_v AS gainStdErrNmPerV,
       r.gain_ci95_lo_nm_per_v AS gainCi95LoNmPerV, r.gain_ci95_hi_nm_per_v AS gainCi95HiNmPerV, r.hysteresis_pct_fs AS hysteresisPctFs,
       DATE_FORMAT(r.created_at, ${ISO}) AS createdAt
     FROM calibration_runs r LEFT JOIN builds b ON b.id = r.build_id LEFT JOIN users u ON u.id = b.owner_id
       LEFT JOIN actuators a ON a.id = r.actuator_id
     WHERE r.part_id = ? AND r.status = 'accepted' AND b.status = 'published' ORDER BY r.created_at ASC, r.id ASC LIMIT ?`,
    [partId, limit],
  ) as Promise<PartRunRow[]>;
}

/** Open and reserved listings of a part that are not hidden, newest first (at most `limit`), in one statement. */
export async function selectPartListings(sequelize: Sequelize, partId: number, limit: number): Promise<PartListingRow[]> {
  return readPool(sequelize).query(
    `SELECT l.id, l.kind, l.quantity, l.\`condition\`, l.price_kind AS priceKind, l.price_amount AS priceAmount, l.currency, l.region,
       u.login AS owner
     FROM listings l LEFT JOIN users u ON u.id = l.owner_id
     WHERE l.part_id = ? AND l.status <> 'closed' AND l.hidden_at IS NULL ORDER BY l.created_at DESC LIMIT ?`,
    [partId, limit],
  ) as Promise<PartListingRow[]>;
}
