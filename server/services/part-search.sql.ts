// The registry search as one hand-written, parameterised SQL statement (MariaDB), run on the plain
// read pool (server/db/read-pool.ts). The registry page is the hottest read in the product;
// building it through Sequelize's query generator, model instances and per-field type casts cost
// about half of each request, so the search speaks SQL directly here.
import type { Sequelize } from 'sequelize';
import type { ListPartsQuery, PartListItemDto } from '@shared/schemas/part.ts';
import { containsPattern } from '../db/like-pattern.ts';
import { readPool } from '../db/read-pool.ts';

/** Exactly the fields of a registry row (PartListItemDto), so rows go out as the driver returns them. */
const COLUMNS = `id, name, category, status, salvage_source AS salvageSource, material, safe_volts AS safeVolts, capacitance_nf AS capacitanceNf,
  accepted_run_count AS acceptedRunCount, build_count AS buildCount, gain_median_nm_per_v AS gainMedianNmPerV,
  gain_p25_nm_per_v AS gainP25NmPerV, gain_p75_nm_per_v AS gainP75NmPerV, gain_min_nm_per_v AS gainMinNmPerV,
  gain_max_nm_per_v AS gainMaxNmPerV, hysteresis_median_pct AS hysteresisMedianPct,
  DATE_FORMAT(created_at, '%Y-%m-%dT%H:%i:%s.000Z') AS createdAt`; // DATETIME(0) holding UTC (Sequelize timezone +00:00)

const ORDER: Record<ListPartsQuery['sort'], string> = {
  gain: 'gain_median_nm_per_v ASC, id ASC',
  '-gain': 'gain_median_nm_per_v DESC, id DESC',
  runs: 'accepted_run_count ASC, id ASC',
  '-runs': 'accepted_run_count DESC, id DESC',
  newest: 'created_at DESC, id DESC',
  name: 'name ASC, id ASC',
};

/** WHERE of a search: listed parts only; a gain range matches the median and drops parts without runs. */
export function partSearchWhere(q: ListPartsQuery): { sql: string; params: unknown[] } {
  const parts = ["status = 'accepted'"];
  const params: unknown[] = [];
  if (q.category) {
    parts.push('category = ?');
    params.push(q.category);
  }
  if (q.gainMin !== undefined || q.gainMax !== undefined) parts.push('gain_median_nm_per_v IS NOT NULL');
  if (q.gainMin !== undefined) {
    parts.push('gain_median_nm_per_v >= ?');
    params.push(q.gainMin);
  }
  if (q.gainMax !== undefined) {
    parts.push('gain_median_nm_per_v <= ?');
    params.push(q.gainMax);
  }
  if (q.minRuns !== undefined) {
    parts.push('accepted_run_count >= ?');
    params.push(q.minRuns);
  }
  const volts: string[] = [];
  if (q.minVolts !== undefined) {
    volts.push('safe_volts >= ?');
    params.push(q.minVolts);
  }
  if (q.maxVolts !== undefined) {
    volts.push('safe_volts <= ?');
    params.push(q.maxVolts);
  }
  // A part without a stated rating fails any comparison (NULL), so it drops out unless asked for.
  if (volts.length > 0) parts.push(q.unrated === 'include' ? `(safe_volts IS NULL OR (${volts.join(' AND ')}))` : volts.join(' AND '));
  if (q.q) {
    const like = containsPattern(q.q);
    parts.push('(name LIKE ? OR salvage_source LIKE ?)');
    params.push(like, like);
  }
  return { sql: parts.join(' AND '), params };
}

/**
 * The index that serves a sort. Without the hint MariaDB 10.11 scans (status, gain) by status
 * alone for descending sorts (see migration 20261201003200); text searches are left to the optimizer.
 */
function sortIndex(q: ListPartsQuery): string | null {
  if (q.q) return null;
  const noGainRange = q.gainMin === undefined && q.gainMax === undefined;
  switch (q.sort) {
    case 'gain':
      return q.category ? 'parts_status_category_gain' : 'parts_status_gain_median_nm_per_v';
    case '-gain':
      return q.category ? 'parts_status_category_gain_desc' : 'parts_status_gain_desc';
    case '-runs':
      return noGainRange ? 'parts_status_runs_desc' : null;
    case 'newest':
      return noGainRange ? 'parts_status_created_desc' : null;
    default:
      return null;
  }
}

/** The page statement of a search (also what the benchmark EXPLAINs). */
export function selectPartsSql(q: ListPartsQuery, limit: number, offset: number): { sql: string; replacements: unknown[] } {
  const where = partSearchWhere(q);
  const index = sortIndex(q);
  return {
    sql: `SELECT ${COLUMNS} FROM parts ${index ? `FORCE INDEX (${index})` : ''} WHERE ${where.sql} ORDER BY ${ORDER[q.sort]} LIMIT ? OFFSET ?`,
    replacements: [...where.params, limit, offset],
  };
}

/** The count statement of a search. */
export function countPartsSql(q: ListPartsQuery): { sql: string; replacements: unknown[] } {
  const where = partSearchWhere(q);
  return { sql: `SELECT COUNT(*) AS n FROM parts WHERE ${where.sql}`, replacements: where.params };
}

/** One page (or, for exports, the first `limit` rows) of a search, as plain rows. */
export async function selectParts(sequelize: Sequelize, q: ListPartsQuery, limit: number, offset: number): Promise<PartListItemDto[]> {
  const { sql, replacements } = selectPartsSql(q, limit, offset);
  return readPool(sequelize).query(sql, replacements) as Promise<PartListItemDto[]>;
}

/** How many parts a voltage filter hides because they state no rating: 0 without one or when they are included. */
export async function countUnratedHidden(sequelize: Sequelize, q: ListPartsQuery): Promise<number> {
  if ((q.minVolts === undefined && q.maxVolts === undefined) || q.unrated === 'include') return 0;
  const where = partSearchWhere({ ...q, minVolts: undefined, maxVolts: undefined });
  const [row] = (await readPool(sequelize).query(
    `SELECT COUNT(*) AS n FROM parts WHERE ${where.sql} AND safe_volts IS NULL`,
    where.params,
  )) as Array<{
    n: number | bigint;
  }>;
  return Number(row?.n ?? 0);
}

/** How many parts match a search. */
export async function countParts(sequelize: Sequelize, q: ListPartsQuery): Promise<number> {
  const { sql, replacements } = countPartsSql(q);
  const [row] = (await readPool(sequelize).query(sql, replacements)) as Array<{ n: number | bigint }>;
  return Number(row?.n ?? 0);
}
