// `npm run bench:search`: autocannon against the nm/V search and /api/health in the same run, at
// 10 k and 100 k parts (seeded on first use by seed-scale). Loopback only, bounded in time.
// Targets: search throughput ≥ 1/3 of health's; p95 at 100 k ≤ 1.5 × p95 at 10 k.
import autocannon from 'autocannon';
import { createSequelize } from '../server/db/sequelize.ts';
import { countPartsSql, selectPartsSql } from '../server/services/part-search.sql.ts';
import { listPartsQuery } from '../shared/schemas/part.ts';
import { quantileSorted } from '../shared/stats/quantiles.ts';
import { benchConfig, scaleDbName, startBenchDb } from './lib/bench-db.ts';
import { seedScale } from './seed-scale.ts';
import { startServerProcess } from './lib/bench-server.ts';

const SIZES = [
  { parts: 10_000, runs: 100_000 },
  { parts: 100_000, runs: 1_000_000 },
];
const SEARCH = '/api/parts?gainMin=80&gainMax=150&sort=-gain&pageSize=25';
const DURATION_S = Number(process.env.BENCH_SECONDS ?? 10);

interface Figures {
  rps: number;
  p95: number;
  p50: number;
  errors: number;
  requests: number;
}

function measure(url: string): Promise<Figures> {
  return new Promise((resolve, reject) => {
    const latencies: number[] = [];
    const instance = autocannon({ url, connections: 16, duration: DURATION_S, pipelining: 1 }, (err, result) => {
      if (err) return reject(err);
      latencies.sort((a, b) => a - b);
      resolve({
        rps: result.requests.average,
        p95: quantileSorted(latencies, 0.95) ?? NaN,
        p50: quantileSorted(latencies, 0.5) ?? NaN,
        errors: result.errors + result.non2xx,
        requests: result.requests.total,
      });
    });
    instance.on('response', (_client: unknown, _status: number, _bytes: number, ms: number) => latencies.push(ms));
  });
}

const stop = await startBenchDb();
const rows: Array<{ size: number; route: string } & Figures> = [];
try {
  for (const size of SIZES) {
    await seedScale(size.parts, size.runs);
    const server = await startServerProcess(scaleDbName(size.parts));
    const base = server.base;
    await measure(`${base}${SEARCH}`); // warm-up pass, discarded
    for (const [route, path] of [
      ['health', '/api/health'],
      ['search', SEARCH],
    ] as const) {
      rows.push({ size: size.parts, route, ...(await measure(`${base}${path}`)) });
    }
    const sq = createSequelize(benchConfig(scaleDbName(size.parts)).db);
    const q = listPartsQuery.parse(Object.fromEntries(new URL(SEARCH, 'http://x').searchParams));
    const page = selectPartsSql(q, q.pageSize, 0);
    const count = countPartsSql(q);
    const [plan] = await sq.query(`EXPLAIN ${page.sql}`, { replacements: page.replacements });
    const [countPlan] = await sq.query(`EXPLAIN ${count.sql}`, { replacements: count.replacements });
    process.stdout.write(
      `\nEXPLAIN at ${size.parts} parts (page):\n${JSON.stringify(plan, null, 1)}\nEXPLAIN (count):\n${JSON.stringify(countPlan, null, 1)}\n`,
    );
    await sq.close();
    await server.stop();
  }
} finally {
  await stop();
}

process.stdout.write('\nsize     route    req/s     p50 ms   p95 ms   errors\n');
for (const r of rows)
  process.stdout.write(
    `${String(r.size).padEnd(8)} ${r.route.padEnd(8)} ${r.rps.toFixed(0).padStart(7)} ${r.p50.toFixed(2).padStart(8)} ${r.p95.toFixed(2).padStart(8)} ${String(r.errors).padStart(8)}\n`,
  );
const at = (size: number, route: string) => rows.find((r) => r.size === size && r.route === route)!;
for (const s of SIZES) {
  const ratio = at(s.parts, 'search').rps / at(s.parts, 'health').rps;
  process.stdout.write(`search/health throughput at ${s.parts}: ${ratio.toFixed(2)} (target ≥ 0.33) ${ratio >= 1 / 3 ? 'OK' : 'MISSED'}\n`);
}
const growth = at(100_000, 'search').p95 / at(10_000, 'search').p95;
process.stdout.write(`search p95 100k/10k: ${growth.toFixed(2)} (target ≤ 1.5) ${growth <= 1.5 ? 'OK' : 'MISSED'}\n`);
