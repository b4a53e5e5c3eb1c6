// `npm run bench:cluster`: the mixed load of `bench:load` (scripts/lib/load-mix.ts) against two shapes in one run, one
// after the other, on the same data (demo scenario with its pictures plus generated parts, on tmpfs when there is one):
//   single  — one app instance on one private MariaDB, as `npm start` (scripts/lib/bench-single.ts), ports 3130–3134;
//   cluster — `npm run cluster` itself (scripts/lib/cluster-run.mjs): three Galera nodes behind haproxy, two app
//             instances behind haproxy, s3rver for photos, rate-limit store in MariaDB; its own fresh data directory.
// In each shape the health route alone is measured too, as the floor every request stands on. Prints each shape's
// per-route table, then throughput, p95 of all requests and of the writes, each as a ratio to the single shape.
// Rate limits are off in both (as in bench:load). Loopback only; about 4 minutes; stops everything it started.
import { chmodSync, existsSync, mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { join } from 'node:path';
import type { Sequelize } from 'sequelize';
// @ts-expect-error plain ESM helper without types
import { CLUSTER_PORTS, startClusterChild } from './lib/cluster-run.mjs';
import { scratchBase } from './lib/scratch.mjs';
import { startSingleShape, type SingleShape } from './lib/bench-single.ts';
import {
  addGeneratedParts,
  collectServerErrors,
  healthRoute,
  loadRoute,
  mixTable,
  p95Of,
  prepareLoadMix,
  runLoadMix,
  serverErrorSummary,
  type MixResult,
  type RouteFigures,
} from './lib/load-mix.ts';
import { createSequelize } from '../server/db/sequelize.ts';
import { initModels } from '../server/models/index.ts';

const MEASURE_S = Number(process.env.BENCH_SECONDS ?? 20);
const WARMUP_S = 3;
const HEALTH_S = Number(process.env.BENCH_HEALTH_SECONDS ?? 8);
const GENERATED_PARTS = Number(process.env.BENCH_PARTS ?? 3000);
const SINGLE_PORTS = { db: 3130, app: 3131, oauth: 3132, smtp: 3133, inbox: 3134 };
const t0 = Date.now();
const say = (s: string) => process.stdout.write(`[${((Date.now() - t0) / 1000).toFixed(1).padStart(5)} s] ${s}\n`);

interface ClusterChild {
  ready: Promise<void>;
  stop: () => Promise<void>;
}
interface ShapeResult {
  shape: string;
  mix: MixResult;
  health: RouteFigures;
  serverErrors: string[];
}

/** Throws unless nothing listens on `port` on loopback. */
const assertFree = (port: number) =>
  new Promise<void>((resolve, reject) => {
    const s = createServer();
    s.once('error', () => reject(new Error(`port ${port} is in use; bench:cluster needs it`)));
    s.listen(port, '127.0.0.1', () => s.close(() => resolve()));
  });

/** The mixed load and then the health route alone, against `origin`, with the models bound to its database. */
async function measureShape(shape: string, origin: string, serverErrors: string[]): Promise<ShapeResult> {
  await addGeneratedParts(GENERATED_PARTS);
  const routes = await prepareLoadMix(origin);
  say(`${shape}: ${GENERATED_PARTS} generated parts; mixed load: warm-up ${WARMUP_S} s, measuring ${MEASURE_S} s`);
  const mix = await runLoadMix(origin, routes, WARMUP_S, MEASURE_S);
  say(`${shape}: health route: warm-up 1 s, measuring ${HEALTH_S} s`);
  await loadRoute(origin, healthRoute, 1);
  const health = await loadRoute(origin, healthRoute, HEALTH_S);
  return { shape, mix, health, serverErrors };
}

let single: SingleShape | null = null;
let cluster: ClusterChild | null = null;
let clusterSequelize: Sequelize | null = null;
let clusterDir: string | null = null;
async function cleanup() {
  await single?.stop();
  single = null;
  await clusterSequelize?.close().catch(() => undefined);
  clusterSequelize = null;
  await cluster?.stop();
  cluster = null;
  if (clusterDir) rmSync(clusterDir, { recursive: true, force: true });
  clusterDir = null;
}
process.on('SIGINT', () => void cleanup().then(() => process.exit(130)));

const results: ShapeResult[] = [];
try {
  const clusterPorts = [
    CLUSTER_PORTS.web,
    ...CLUSTER_PORTS.apps,
    CLUSTER_PORTS.dbProxy,
    3511,
    3512,
    3513,
    ...CLUSTER_PORTS.nodeChecks,
    CLUSTER_PORTS.s3,
    CLUSTER_PORTS.oauth,
    CLUSTER_PORTS.smtp,
    CLUSTER_PORTS.inbox,
  ] as number[];
  for (const port of [...Object.values(SINGLE_PORTS), ...clusterPorts]) await assertFree(port);

  // ---- single: one app, one MariaDB --------------------------------------------------------------
  single = await startSingleShape(SINGLE_PORTS, 'compiled');
  say(`single: MariaDB on :${single.dbPort} (${single.dir}), migrated, demo seeded; server on ${single.origin}`);
  results.push(await measureShape('single', single.origin, single.serverErrors));
  await single.stop();
  single = null;
  say('single: stopped');

  // ---- cluster: npm run cluster, fresh ------------------------------------------------------------
  clusterDir = mkdtempSync(join(scratchBase(), 'scanwright-bench-cluster-'));
  chmodSync(clusterDir, 0o755); // the Galera nodes run as `mysql` and must reach their directories
  const tmp = join(clusterDir, 'tmp');
  mkdirSync(tmp);
  chmodSync(tmp, 0o1777); // mariadbd's $TMPDIR, apart from any other MariaDB's
  const clusterErrors: string[] = [];
  const keepErrors = collectServerErrors(clusterErrors);
  say(`cluster: starting npm run cluster with its data in ${clusterDir}`);
  cluster = startClusterChild({
    dataDir: clusterDir,
    env: { SCANWRIGHT_SKIP_CLIENT_BUILD: '1', RATE_LIMITS: 'false', LOG_LEVEL: 'warn', TMPDIR: tmp },
    onOutput: (c: Buffer) => {
      for (const line of c.toString().split('\n')) if (/^\[cluster\]/.test(line)) say(line);
      keepErrors(c);
    },
  }) as ClusterChild;
  await cluster.ready;
  const secretsFile = join(clusterDir, 'secrets.json');
  if (!existsSync(secretsFile)) throw new Error(`no ${secretsFile}`);
  const secrets = JSON.parse(readFileSync(secretsFile, 'utf8')) as { dbPassword: string };
  clusterSequelize = createSequelize({
    host: '127.0.0.1',
    port: CLUSTER_PORTS.dbProxy,
    name: 'scanwright',
    user: 'scanwright',
    password: secrets.dbPassword,
    poolMax: 5,
  });
  initModels(clusterSequelize);
  say(`cluster: ready at http://127.0.0.1:${CLUSTER_PORTS.web}`);
  results.push(await measureShape('cluster', `http://127.0.0.1:${CLUSTER_PORTS.web}`, clusterErrors));
  await cleanup();
  say('cluster: stopped');

  // ---- the figures ---------------------------------------------------------------------------------
  const out: string[] = [];
  for (const r of results) {
    out.push('', `${r.shape}: mixed load, per route`, ...mixTable(r.mix));
    if (r.serverErrors.length) out.push(`${r.shape}: server errors logged:`, ...serverErrorSummary(r.serverErrors));
  }
  const writesOf = (m: MixResult) => m.figures.filter((f) => f.route.method === 'POST');
  const rows = results.flatMap((r) => [
    { shape: r.shape, load: 'mixed', rps: r.mix.rps, p95: p95Of(r.mix.figures), p95w: p95Of(writesOf(r.mix)) },
    { shape: r.shape, load: '/api/health', rps: r.health.rps, p95: r.health.p95, p95w: NaN },
  ]);
  const base = (load: string) => rows.find((x) => x.shape === 'single' && x.load === load)!;
  const pad = (s: string | number, n: number) => String(s).padStart(n);
  const num = (x: number, digits: number) => (Number.isFinite(x) ? x.toFixed(digits) : '—');
  const ratio = (a: number, b: number) => num(a / b, 2);
  out.push(
    '',
    'shape    load          req/s   p95 ms   p95 writes ms   req/s ÷ single   p95 ÷ single   p95 writes ÷ single',
    ...rows.map((x) => {
      const b = base(x.load);
      return (
        `${x.shape.padEnd(8)} ${x.load.padEnd(12)} ${pad(num(x.rps, 0), 7)} ${pad(num(x.p95, 1), 8)} ${pad(num(x.p95w, 1), 15)} ` +
        `${pad(ratio(x.rps, b.rps), 16)} ${pad(ratio(x.p95, b.p95), 14)} ${pad(ratio(x.p95w, b.p95w), 21)}`
      );
    }),
    '',
    `mixed req/s ÷ health req/s in the same shape: ${results.map((r) => `${r.shape} ${ratio(r.mix.rps, r.health.rps)}`).join(', ')}`,
    'single = one app on one MariaDB; cluster = two apps behind haproxy on three Galera nodes behind haproxy (one writer).',
    `mixed = ${results[0].mix.figures.map((f) => `${f.route.name} ×${f.route.connections}`).join(', ')} connections;`,
    `health = ${healthRoute.name} ×${healthRoute.connections}. Writes = the two POST routes. ${MEASURE_S} s mixed, ${HEALTH_S} s health per shape.`,
  );
  const failed = results.filter((r) => r.mix.errors + r.mix.lost + r.health.errors + r.health.non2xx > 0);
  out.push(
    '',
    ...results.map(
      (r) =>
        `${r.shape}: errors (socket errors, timeouts, non-2xx) ${r.mix.errors + r.health.errors + r.health.non2xx}, lost writes ${r.mix.lost}`,
    ),
    failed.length ? 'FAILED' : 'OK',
  );
  process.stdout.write(`${out.join('\n')}\n`);
  process.exitCode = failed.length ? 1 : 0;
} catch (err) {
  process.stderr.write(`${err instanceof Error ? `${err.message}\n${err.stack}` : err}\n`);
  process.exitCode = 1;
} finally {
  await cleanup();
  say('done');
}
// stopServer's 30 s SIGKILL fallback timer stays pending after a clean stop; do not wait for it.
process.exit(process.exitCode ?? 0);
