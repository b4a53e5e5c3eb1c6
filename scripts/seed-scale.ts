// `npm run seed:scale -- --parts 100000 --runs 1000000`: fill a separate database with generated
// registry data by bulk inserts, for the search benchmark. Numbers are generated, not measurements.
import { parseArgs } from 'node:util';
import { createSequelize } from '../server/db/sequelize.ts';
import { createMigrator } from '../server/db/migrator.ts';
import { summarize } from '../shared/stats/quantiles.ts';
import { seededRandom } from '../shared/stats/seeded-random.ts';
import { benchConfig, scaleDbName, startBenchDb } from './lib/bench-db.ts';

const { values } = parseArgs({
  options: {
    parts: { type: 'string', default: '10000' },
    runs: { type: 'string', default: '100000' },
    force: { type: 'boolean', default: false },
  },
});
const nParts = Number(values.parts);
const nRuns = Number(values.runs);
if (!(nParts > 0 && nRuns >= 0)) throw new Error('--parts and --runs must be positive numbers');

/** Seed one database; skipped when it already holds this many parts (unless --force). */
export async function seedScale(parts: number, runs: number, force = false): Promise<void> {
  const config = benchConfig(scaleDbName(parts));
  const sq = createSequelize(config.db);
  try {
    await createMigrator(sq).up();
    const [[row]] = (await sq.query('SELECT COUNT(*) AS n FROM parts')) as [Array<{ n: number }>, unknown];
    if (Number(row!.n) >= parts && !force) {
      process.stdout.write(`${scaleDbName(parts)} already has ${row!.n} parts; skipping (use --force to reseed)\n`);
      return;
    }
    const t0 = Date.now();
    for (const table of ['calibration_runs', 'actuators', 'builds', 'parts', 'users']) await sq.query(`DELETE FROM ${table}`);
    const now = new Date().toISOString().slice(0, 19).replace('T', ' ');
    const rand = seededRandom(parts);
    const makers = Math.max(10, Math.round(parts / 20));
    const insert = async (table: string, cols: string[], rows: unknown[][]) => {
      for (let i = 0; i < rows.length; i += 2000) {
        const chunk = rows.slice(i, i + 2000);
        await sq.query(`INSERT INTO ${table} (${cols.join(',')}) VALUES ${chunk.map((r) => `(${r.map(() => '?').join(',')})`).join(',')}`, {
          replacements: chunk.flat(),
        });
      }
    };
    await insert(
      'users',
      ['id', 'github_id', 'login', 'role', 'created_at', 'updated_at'],
      Array.from({ length: makers }, (_, i) => [i + 1, `scale-${i}`, `scale-maker-${i}`, 'maker', now, now]),
    );
    await insert(
      'builds',
      ['id', 'owner_id', 'title', 'instrument_kind', 'summary', 'body', 'status', 'created_at', 'updated_at'],
      Array.from({ length: makers }, (_, i) => [i + 1, i + 1, `Scale build ${i}`, 'other', 'generated', '', 'published', now, now]),
    );
    const cats = ['bimorph', 'buzzer-disc', 'stack', 'tube', 'shear-plate', 'voice-coil', 'other'];
    const perPart = Math.floor(runs / parts);
    let extra = runs - perPart * parts;
    const partRows: unknown[][] = [];
    let runRows: unknown[][] = [];
    let runId = 1;
    const flushRuns = async () => {
      await insert(
        'calibration_runs',
        [
          'id',
          'actuator_id',
          'build_id',
          'part_id',
          'owner_id',
          'status',
          'method',
          'voltage_unit',
          'displacement_unit',
          'model',
          'points_json',
          'point_count',
          'gain_nm_per_v',
          'intercept_nm',
          'span_nm',
          'hysteresis_pct_fs',
          'created_at',
          'updated_at',
        ],
        runRows,
      );
      runRows = [];
    };
    const actuatorRows: unknown[][] = [];
    for (let p = 1; p <= parts; p++) {
      const center = 10 ** (0.3 + rand() * 2.7); // 2–1000 nm/V, log-uniform
      const k = perPart + (extra-- > 0 ? 1 : 0);
      const builder = 1 + Math.floor(rand() * makers);
      const gains: number[] = [];
      const hyst: number[] = [];
      const buildsOfPart = new Set<number>();
      if (k > 0) actuatorRows.push([p, builder, p, 'X', 'single', now, now]);
      for (let r = 0; r < k; r++) {
        const accepted = rand() < 0.8;
        const gain = center * (0.85 + rand() * 0.3);
        const h = 2 + rand() * 12;
        if (accepted) {
          gains.push(gain);
          hyst.push(h);
          buildsOfPart.add(builder);
        }
        runRows.push([
          runId++,
          p,
          builder,
          p,
          builder,
          accepted ? 'accepted' : 'pending',
          'indicator',
          'V',
          'nm',
          'intercept',
          '[]',
          18,
          gain,
          0,
          gain * 40,
          h,
          now,
          now,
        ]);
      }
      const g = summarize(gains);
      partRows.push([
        p,
        cats[p % cats.length],
        `Generated part ${p}`,
        'generated',
        p % 4 === 0 ? null : 20 + (p % 30) * 10,
        'accepted',
        gains.length,
        buildsOfPart.size,
        g.median,
        g.p25,
        g.p75,
        g.min,
        g.max,
        summarize(hyst).median,
        now,
        now,
      ]);
      if (partRows.length >= 5000 || p === parts) {
        await insert(
          'parts',
          [
            'id',
            'category',
            'name',
            'salvage_source',
            'safe_volts',
            'status',
            'accepted_run_count',
            'build_count',
            'gain_median_nm_per_v',
            'gain_p25_nm_per_v',
            'gain_p75_nm_per_v',
            'gain_min_nm_per_v',
            'gain_max_nm_per_v',
            'hysteresis_median_pct',
            'created_at',
            'updated_at',
          ],
          partRows.splice(0),
        );
        await insert('actuators', ['id', 'build_id', 'part_id', 'axis', 'drive', 'created_at', 'updated_at'], actuatorRows.splice(0));
        await flushRuns();
      }
    }
    await sq.query('ANALYZE TABLE parts, calibration_runs');
    process.stdout.write(`${scaleDbName(parts)}: ${parts} parts, ${runId - 1} runs in ${((Date.now() - t0) / 1000).toFixed(1)} s\n`);
  } finally {
    await sq.close();
  }
}

if (import.meta.url === `file://${process.argv[1]}`) {
  const stop = await startBenchDb();
  try {
    await seedScale(nParts, nRuns, values.force);
  } finally {
    await stop();
  }
}
