// `npm run bench:reads`: autocannon against /api/health and every public read (as a visitor, no cookie) in the same
// run, on a bench database holding the demo scenario copied to a few hundred builds and listings. Loopback only.
// Target: each read's throughput ≥ 1/3 of health's.
import { mkdtempSync, rmSync } from 'node:fs';
import { LocalPhotoStore } from '../server/storage/local-photo-store.ts';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import autocannon from 'autocannon';
import type { Sequelize } from 'sequelize';
import { createSequelize } from '../server/db/sequelize.ts';
import { createMigrator } from '../server/db/migrator.ts';
import { initModels } from '../server/models/index.ts';
import { seedDemoOnce } from '../server/db/seed/demo.ts';
import { demoPictureAttacher } from '../server/db/seed/demo-pictures.ts';
import { quantileSorted } from '../shared/stats/quantiles.ts';
import { benchConfig, startBenchDb } from './lib/bench-db.ts';
import { startServerProcess } from './lib/bench-server.ts';

const DATABASE = 'scanwright_reads';
const COPIES = 20; // the demo's builds and listings, copied this many times over
const OFFSET = 1_000_000; // id offset per copy
const DURATION_S = Number(process.env.BENCH_SECONDS ?? 8);
const TARGET = 1 / 3;

/** Tables copied per round, with the columns that point at rows copied in the same round (shifted with the id). */
const CLONED: Array<[table: string, shifted: string[]]> = [
  ['builds', ['id', 'cover_photo_id']],
  ['log_entries', ['id', 'build_id']],
  ['photos', ['id', 'build_id', 'entry_id']],
  ['actuators', ['id', 'build_id']],
  ['calibration_runs', ['id', 'build_id', 'actuator_id']],
  ['listings', ['id']],
  ['listing_photos', ['id', 'listing_id']],
];

/** Migrate, seed the demo (with its drawn pictures), then copy its builds and listings COPIES times; skipped when done before. */
async function seedReads(sq: Sequelize): Promise<void> {
  await createMigrator(sq).up();
  initModels(sq);
  const uploads = mkdtempSync(join(tmpdir(), 'scanwright-bench-reads-'));
  try {
    await seedDemoOnce(sq, demoPictureAttacher(new LocalPhotoStore(uploads)));
  } finally {
    rmSync(uploads, { recursive: true, force: true });
  }
  const [[row]] = (await sq.query('SELECT COUNT(*) AS n FROM builds')) as [Array<{ n: number }>, unknown];
  if (Number(row!.n) > COPIES) return;
  await sq.transaction(async (transaction) => {
    await sq.query('SET FOREIGN_KEY_CHECKS = 0', { transaction });
    for (const [table, shifted] of CLONED) {
      const [cols] = (await sq.query(
        'SELECT COLUMN_NAME AS c FROM information_schema.COLUMNS WHERE TABLE_SCHEMA = DATABASE() AND TABLE_NAME = ?',
        {
          replacements: [table],
          transaction,
        },
      )) as [Array<{ c: string }>, unknown];
      const names = cols.map((c) => `\`${c.c}\``);
      for (let k = 1; k <= COPIES; k++) {
        const select = names.map((n) => (shifted.includes(n.slice(1, -1)) ? `${n} + ${k * OFFSET}` : n)).join(', ');
        await sq.query(`INSERT INTO ${table} (${names.join(', ')}) SELECT ${select} FROM ${table} WHERE id < ${OFFSET}`, { transaction });
      }
    }
    await sq.query('SET FOREIGN_KEY_CHECKS = 1', { transaction });
  });
  await sq.query('ANALYZE TABLE builds, log_entries, photos, actuators, calibration_runs, listings, listing_photos, parts');
}

/** Ids of the richest public build, part and listing, so each page does its full work. */
async function pickIds(sq: Sequelize) {
  const one = async (sql: string) => ((await sq.query(sql)) as [Array<{ id: number }>, unknown])[0][0]!.id;
  return {
    build: await one(
      "SELECT b.id FROM builds b JOIN calibration_runs r ON r.build_id = b.id WHERE b.status = 'published' GROUP BY b.id ORDER BY COUNT(*) DESC, b.id LIMIT 1",
    ),
    part: await one("SELECT id FROM parts WHERE status = 'accepted' ORDER BY accepted_run_count DESC, id LIMIT 1"),
    listing: await one("SELECT id FROM listings WHERE status <> 'closed' AND hidden_at IS NULL ORDER BY id DESC LIMIT 1"),
  };
}

interface Figures {
  rps: number;
  p95: number;
  errors: number;
}

function measure(url: string, seconds = DURATION_S): Promise<Figures> {
  return new Promise((resolve, reject) => {
    const latencies: number[] = [];
    const instance = autocannon({ url, connections: 16, duration: seconds, pipelining: 1 }, (err, result) => {
      if (err) return reject(err);
      latencies.sort((a, b) => a - b);
      resolve({ rps: result.requests.average, p95: quantileSorted(latencies, 0.95) ?? NaN, errors: result.errors + result.non2xx });
    });
    instance.on('response', (_client: unknown, _status: number, _bytes: number, ms: number) => latencies.push(ms));
  });
}

const stop = await startBenchDb();
const rows: Array<{ route: string; path: string } & Figures> = [];
try {
  const sq = createSequelize(benchConfig(DATABASE).db);
  await seedReads(sq);
  const ids = await pickIds(sq);
  await sq.close();
  const routes: Array<[string, string]> = [
    ['health', '/api/health'],
    ['registry search', '/api/parts?sort=-gain&pageSize=25'],
    ['builds index', '/api/builds'],
    ['build page', `/api/builds/${ids.build}`],
    ['part page', `/api/parts/${ids.part}`],
    ['exchange index', '/api/listings'],
    ['listing page', `/api/listings/${ids.listing}`],
  ];
  const server = await startServerProcess(DATABASE);
  try {
    for (const [, path] of routes) await measure(`${server.base}${path}`, 1); // warm-up pass, discarded
    for (const [route, path] of routes) rows.push({ route, path, ...(await measure(`${server.base}${path}`)) });
  } finally {
    await server.stop();
  }
} finally {
  await stop();
}

const health = rows.find((r) => r.route === 'health')!.rps;
process.stdout.write('\nroute              req/s    p95 ms   errors   ratio   path\n');
for (const r of rows) {
  const ratio = r.rps / health;
  const verdict = r.route === 'health' ? '' : ratio >= TARGET ? 'OK' : 'MISSED';
  process.stdout.write(
    `${r.route.padEnd(16)} ${r.rps.toFixed(0).padStart(7)} ${r.p95.toFixed(2).padStart(9)} ${String(r.errors).padStart(8)} ${ratio.toFixed(2).padStart(7)} ${verdict.padEnd(6)} ${r.path}\n`,
  );
}
process.stdout.write(`target: every read ≥ ${TARGET.toFixed(2)} of health's throughput\n`);
