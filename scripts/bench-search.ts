// `npm run bench:search`: autocannon against the nm/V search and /api/health in the same run, at
// 10 k and 100 k parts (seeded on first use by seed-scale). Loopback only, bounded in time.
// Targets: search throughput ≥ 1/3 of health's; p95 at 100 k ≤ 1.5 × p95 at 10 k.
import type { AddressInfo } from 'node:net';
import autocannon from 'autocannon';
import { createApp } from '../server/app.ts';
import { createLogger } from '../server/logger.ts';
import type { Mailer } from '../server/services/mail.service.ts';
import { quantileSorted } from '../shared/stats/quantiles.ts';
import { benchConfig, scaleDbName, startBenchDb } from './lib/bench-db.ts';
import { seedScale } from './seed-scale.ts';

const SIZES = [
  { parts: 10_000, runs: 100_000 },
  { parts: 100_000, runs: 1_000_000 },
];
const SEARCH = '/api/parts?gainMin=80&gainMax=150&sort=-gain&pageSize=25';
const DURATION_S = Number(process.env.BENCH_SECONDS ?? 10);
const noMail: Mailer = { send: async () => true, close: () => {} };

interface Figures { rps: number; p95: number; p50: number; errors: number; requests: number }

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
    const config = benchConfig(scaleDbName(size.parts));
    const handle = await createApp(config, { mailer: noMail, log: createLogger('silent') });
    const server = handle.app.listen(0, '127.0.0.1');
    await new Promise((r) => server.once('listening', r));
    const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    await measure(`${base}${SEARCH}`); // warm-up pass, discarded
    for (const [route, path] of [['health', '/api/health'], ['search', SEARCH]] as const) {
      rows.push({ size: size.parts, route, ...(await measure(`${base}${path}`)) });
    }
    const [plan] = await handle.sequelize.query(
      "EXPLAIN SELECT * FROM parts WHERE status = 'accepted' AND gain_median_nm_per_v IS NOT NULL AND gain_median_nm_per_v >= 80 AND gain_median_nm_per_v <= 150 ORDER BY gain_median_nm_per_v DESC, id DESC LIMIT 0, 25",
    );
    const [countPlan] = await handle.sequelize.query(
      "EXPLAIN SELECT COUNT(*) FROM parts WHERE status = 'accepted' AND gain_median_nm_per_v IS NOT NULL AND gain_median_nm_per_v >= 80 AND gain_median_nm_per_v <= 150",
    );
    process.stdout.write(`\nEXPLAIN at ${size.parts} parts (page):\n${JSON.stringify(plan, null, 1)}\nEXPLAIN (count):\n${JSON.stringify(countPlan, null, 1)}\n`);
    server.closeAllConnections();
    await new Promise((r) => server.close(r));
    await handle.close();
  }
} finally {
  await stop();
}

process.stdout.write('\nsize     route    req/s     p50 ms   p95 ms   errors\n');
for (const r of rows) process.stdout.write(`${String(r.size).padEnd(8)} ${r.route.padEnd(8)} ${r.rps.toFixed(0).padStart(7)} ${r.p50.toFixed(2).padStart(8)} ${r.p95.toFixed(2).padStart(8)} ${String(r.errors).padStart(8)}\n`);
const at = (size: number, route: string) => rows.find((r) => r.size === size && r.route === route)!;
for (const s of SIZES) {
  const ratio = at(s.parts, 'search').rps / at(s.parts, 'health').rps;
  process.stdout.write(`search/health throughput at ${s.parts}: ${ratio.toFixed(2)} (target ≥ 0.33) ${ratio >= 1 / 3 ? 'OK' : 'MISSED'}\n`);
}
const growth = at(100_000, 'search').p95 / at(10_000, 'search').p95;
process.stdout.write(`search p95 100k/10k: ${growth.toFixed(2)} (target ≤ 1.5) ${growth <= 1.5 ? 'OK' : 'MISSED'}\n`);
