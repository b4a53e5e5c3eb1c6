// `npm run bench:load`: a mixed read/write load on the real server process (`server/index.ts`),
// against a throwaway MariaDB on tmpfs seeded with the demo scenario plus generated parts.
// Autocannon on loopback, one instance per route, all at once; about 60 s in all by default
// (BENCH_SECONDS sets the measured part, 40 by default). Rate limits are off.
// Prints throughput and latency per route, errors, and lost writes (201s vs rows that appeared).
import { spawn, type ChildProcess } from 'node:child_process';
import { accessSync, constants, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import autocannon from 'autocannon';
import { Op } from 'sequelize';
// @ts-expect-error plain ESM helper without types
import { initDataDir, startServer, ensureDatabase, stopServer } from './lib/mariadb.mjs';
import { createSequelize } from '../server/db/sequelize.ts';
import { createMigrator } from '../server/db/migrator.ts';
import { initModels } from '../server/models/index.ts';
import { seedDemoOnce } from '../server/db/seed/demo.ts';
import { demoSweep } from '../server/db/seed/demo-points.ts';
import { Part } from '../server/models/part.model.ts';
import { Build } from '../server/models/build.model.ts';
import { Actuator } from '../server/models/actuator.model.ts';
import { CalibrationRun } from '../server/models/calibration-run.model.ts';
import { Listing } from '../server/models/listing.model.ts';
import { Message } from '../server/models/message.model.ts';
import { User } from '../server/models/user.model.ts';
import { quantileSorted } from '../shared/stats/quantiles.ts';

const MEASURE_S = Number(process.env.BENCH_SECONDS ?? 40);
const WARMUP_S = Math.max(1, Math.min(3, Math.round(MEASURE_S / 10)));
const GENERATED_PARTS = Number(process.env.BENCH_PARTS ?? 3000);
const MAKER = 'bench-maker';
const t0 = Date.now();
const say = (s: string) => process.stdout.write(`[${((Date.now() - t0) / 1000).toFixed(1).padStart(5)} s] ${s}\n`);

const freePort = () =>
  new Promise<number>((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
const pick = <T>(xs: readonly T[]) => xs[Math.floor(Math.random() * xs.length)];

// ---- a private MariaDB, migrated and seeded --------------------------------------------------
let base = tmpdir();
try {
  accessSync('/dev/shm', constants.W_OK);
  base = '/dev/shm';
} catch {
  /* tmpdir */
}
const dir = mkdtempSync(join(base, 'scanwright-bench-load-'));
// mariadbd keeps temporary tables in $TMPDIR and a starting server deletes every `#sql*` file there,
// so a private directory keeps this instance and any other starting at the same time apart.
process.env.TMPDIR = join(dir, 'tmp');
mkdirSync(process.env.TMPDIR);
const dbPort = await freePort();
const db = {
  host: '127.0.0.1',
  port: dbPort,
  name: 'scanwright_load',
  user: 'scanwright_bench',
  password: 'bench-only-password',
  poolMax: 5,
};
let mariadb: ChildProcess | null = null;
let app: ChildProcess | null = null;

async function cleanup() {
  if (app && app.exitCode === null && app.signalCode === null) {
    const gone = new Promise((r) => app!.once('exit', r));
    app.kill('SIGTERM');
    await gone;
  }
  await stopServer(mariadb);
  rmSync(dir, { recursive: true, force: true });
}
process.on('SIGINT', () => void cleanup().then(() => process.exit(130)));

try {
  initDataDir(dir);
  mariadb = await startServer(dir, dbPort);
  ensureDatabase(dir, { database: db.name, user: db.user, password: db.password });
  const sequelize = createSequelize(db);
  await createMigrator(sequelize).up();
  initModels(sequelize);
  await seedDemoOnce(sequelize);
  const demoPart = await Part.findOne({ where: { status: 'accepted' }, order: [['id', 'ASC']] });
  for (let i = 0; i < GENERATED_PARTS; i += 1000) {
    await Part.bulkCreate(
      Array.from({ length: Math.min(1000, GENERATED_PARTS - i) }, (_, k) => {
        const gain = 5 + Math.random() * 300;
        return {
          category: pick(['bimorph', 'buzzer-disc', 'stack', 'tube'] as const),
          name: `Generated part ${i + k}`,
          salvageSource: 'bench generator',
          material: 'PZT-5A',
          lengthMm: 10 + (k % 30),
          widthMm: null,
          thicknessMm: 0.5,
          outerDiameterMm: null,
          wallMm: null,
          layers: null,
          capacitanceNf: 1,
          safeVolts: 60,
          notes: null,
          status: 'accepted' as const,
          proposedById: null,
          acceptedRunCount: 1 + (k % 5),
          buildCount: 1,
          gainMedianNmPerV: gain,
          gainP25NmPerV: gain * 0.95,
          gainP75NmPerV: gain * 1.05,
          gainMinNmPerV: gain * 0.9,
          gainMaxNmPerV: gain * 1.1,
          hysteresisMedianPct: 5,
        };
      }),
    );
  }
  say(`MariaDB on :${dbPort} (${dir}), migrated, demo seeded, ${GENERATED_PARTS} generated parts`);

  // ---- the real server, as `npm start` runs it ------------------------------------------------
  const [port, oauth, smtp, inbox] = [await freePort(), await freePort(), await freePort(), await freePort()];
  const { GITHUB_CLIENT_ID: _i, GITHUB_CLIENT_SECRET: _s, SMTP_URL: _m, ADMIN_LOGINS: _a, ...inherited } = process.env;
  const origin = `http://127.0.0.1:${port}`;
  app = spawn(process.execPath, ['--import', 'tsx', 'server/index.ts'], {
    stdio: ['ignore', 'pipe', 'inherit'],
    env: {
      ...inherited,
      NODE_ENV: 'production',
      LOG_LEVEL: 'warn',
      HOST: '127.0.0.1',
      PORT: String(port),
      PUBLIC_URL: origin,
      OAUTH_STANDIN_PORT: String(oauth),
      SMTP_CATCHER_PORT: String(smtp),
      INBOX_PORT: String(inbox),
      RATE_LIMITS: 'false',
      DB_HOST: db.host,
      DB_PORT: String(db.port),
      DB_NAME: db.name,
      DB_USER: db.user,
      DB_PASSWORD: db.password,
      SESSION_SECRET: 'bench-load-session-secret-0123456789',
      UPLOADS_DIR: join(dir, 'uploads'),
    },
  });
  await new Promise<void>((resolve, reject) => {
    let out = '';
    app!.stdout!.on('data', (c: Buffer) => {
      out += c;
      if (out.includes('Scanwright is running')) resolve();
    });
    app!.once('exit', (c) => reject(new Error(`server exited (${c}) before listening:\n${out}`)));
  });
  // Keep the server's error log lines (pino level ≥ 50) to show after the table.
  const serverErrors: string[] = [];
  app.stdout!.on('data', (c: Buffer) => {
    for (const line of c.toString().split('\n')) if (/"level":(50|60)/.test(line)) serverErrors.push(line);
  });
  say(`server on ${origin} (DB_POOL_MAX ${process.env.DB_POOL_MAX ?? 10})`);

  // ---- sign in as a maker through the OAuth stand-in --------------------------------------------
  const sid = (res: Response) =>
    res.headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .find((c) => c.startsWith('scanwright.sid='));
  const start = await fetch(`${origin}/auth/github?login=${MAKER}`, { redirect: 'manual' });
  const atProvider = await fetch(start.headers.get('location')!, { redirect: 'manual' });
  const done = await fetch(atProvider.headers.get('location')!, { redirect: 'manual', headers: { cookie: sid(start) ?? '' } });
  const cookie = sid(done);
  const session = (await (await fetch(`${origin}/api/session`, { headers: { cookie: cookie ?? '' } })).json()) as {
    user: { login: string } | null;
    csrfToken: string;
  };
  if (session.user?.login !== MAKER || !cookie) throw new Error(`sign-in failed: ${JSON.stringify(session)}`);
  const maker = (await User.findOne({ where: { login: MAKER } }))!;

  // The maker's own builds and actuators to record runs on; listings of others to write to.
  const actuatorIds: number[] = [];
  for (let i = 0; i < 4; i++) {
    const build = await Build.create({
      ownerId: maker.id,
      title: `Bench build ${i}`,
      instrumentKind: 'profilometer',
      summary: 'Load benchmark.',
      body: '',
      stage: 'working',
      status: 'draft',
    });
    actuatorIds.push(
      (
        await Actuator.create({
          buildId: build.id,
          partId: demoPart!.id,
          label: null,
          axis: 'X',
          drive: 'single',
          amplifier: null,
          maxVolts: 40,
          notes: null,
        })
      ).id,
    );
  }
  const listingIds = (
    await Listing.findAll({ where: { status: 'open', hiddenAt: null, ownerId: { [Op.ne]: maker.id } }, attributes: ['id'] })
  ).map((l) => l.id);
  const publishedBuildIds = (await Build.findAll({ where: { status: 'published' }, attributes: ['id'] })).map((b) => b.id);
  const partIds = (await Part.findAll({ where: { status: 'accepted' }, attributes: ['id'] })).map((p) => p.id);
  const points = demoSweep({ gainNmPerV: 90, loopFraction: 0.05, noiseNm: 0.5, maxVolts: 40, steps: 10, unit: 'nm', seed: 7 });
  const runBody = JSON.stringify({ points, voltageUnit: 'V', displacementUnit: 'nm', model: 'intercept', method: 'indicator' });
  const authed = { cookie, 'x-csrf-token': session.csrfToken, 'content-type': 'application/json' };

  interface Route {
    name: string;
    connections: number;
    method: 'GET' | 'POST';
    path: () => string;
    body?: () => string;
    headers?: Record<string, string>;
    rows?: () => Promise<number>;
  }
  const routes: Route[] = [
    { name: 'GET /api/builds', connections: 4, method: 'GET', path: () => '/api/builds' },
    { name: 'GET /api/builds/:id', connections: 4, method: 'GET', path: () => `/api/builds/${pick(publishedBuildIds)}` },
    {
      name: 'GET /api/parts?gainMin&gainMax',
      connections: 4,
      method: 'GET',
      path: () => {
        const lo = 10 + Math.floor(Math.random() * 200);
        return `/api/parts?gainMin=${lo}&gainMax=${lo + 40}&sort=-gain`;
      },
    },
    { name: 'GET /api/parts/:id', connections: 4, method: 'GET', path: () => `/api/parts/${pick(partIds)}` },
    {
      name: 'POST /api/actuators/:id/runs',
      connections: 2,
      method: 'POST',
      path: () => `/api/actuators/${pick(actuatorIds)}/runs`,
      body: () => runBody,
      headers: authed,
      rows: () => CalibrationRun.count({ where: { actuatorId: actuatorIds } }),
    },
    {
      name: 'POST /api/listings/:id/messages',
      connections: 2,
      method: 'POST',
      path: () => `/api/listings/${pick(listingIds)}/messages`,
      body: () => JSON.stringify({ body: `Still available? ${Math.random()}` }),
      headers: authed,
      rows: () => Message.count({ where: { senderId: maker.id } }),
    },
  ];

  interface Figures {
    route: Route;
    sent: number;
    requests: number;
    rps: number;
    p50: number;
    p95: number;
    p99: number;
    max: number;
    errors: number;
    non2xx: number;
    statuses: Map<number, number>;
  }
  function run(route: Route, seconds: number): Promise<Figures> {
    return new Promise((resolve, reject) => {
      const latencies: number[] = [];
      const statuses = new Map<number, number>();
      let sent = 0;
      // setupRequest and timeout are autocannon 9 options the shared type file leaves out.
      const options = {
        url: origin,
        connections: route.connections,
        duration: seconds,
        pipelining: 1,
        timeout: 10,
        requests: [
          {
            method: route.method,
            headers: route.headers,
            setupRequest: (req: Record<string, unknown>) => (
              sent++,
              { ...req, path: route.path(), ...(route.body ? { body: route.body() } : {}) }
            ),
          },
        ],
      };
      const instance = autocannon(options as unknown as Parameters<typeof autocannon>[0], (err, result) => {
        if (err) return reject(err);
        latencies.sort((a, b) => a - b);
        resolve({
          route,
          sent,
          requests: latencies.length,
          rps: latencies.length / seconds,
          p50: quantileSorted(latencies, 0.5) ?? NaN,
          p95: quantileSorted(latencies, 0.95) ?? NaN,
          p99: quantileSorted(latencies, 0.99) ?? NaN,
          max: latencies[latencies.length - 1] ?? NaN,
          errors: result.errors + result.timeouts,
          non2xx: result.non2xx,
          statuses,
        });
      });
      instance.on('response', (_c: unknown, status: number, _b: number, ms: number) => {
        latencies.push(ms);
        statuses.set(status, (statuses.get(status) ?? 0) + 1);
      });
    });
  }

  say(`warm-up ${WARMUP_S} s`);
  await Promise.all(routes.map((r) => run(r, WARMUP_S)));
  await new Promise((r) => setTimeout(r, 500));
  const before = await Promise.all(routes.map((r) => r.rows?.() ?? 0));
  say(`measuring ${MEASURE_S} s, ${routes.reduce((n, r) => n + r.connections, 0)} connections over ${routes.length} routes`);
  const figures = await Promise.all(routes.map((r) => run(r, MEASURE_S)));
  await new Promise((r) => setTimeout(r, 1000)); // let requests cut off at the end settle
  const after = await Promise.all(routes.map((r) => r.rows?.() ?? 0));
  await sequelize.close();

  const pad = (s: string | number, n: number) => String(s).padStart(n);
  const lines = [
    '',
    `route                            conns  requests   req/s   p50 ms   p95 ms   p99 ms   max ms  errors  non-2xx   201s  rows+  unanswered  lost`,
  ];
  let totalErrors = 0;
  let totalLost = 0;
  figures.forEach((f, i) => {
    const created = f.statuses.get(201) ?? 0;
    const added = after[i] - before[i];
    // Requests still in flight when the window closed were sent but never answered: they may be stored.
    const unanswered = f.sent - f.requests;
    const lost = f.route.rows ? Math.max(0, created - added) : 0;
    const unexplained = f.route.rows ? Math.max(0, added - created - unanswered) : 0;
    totalErrors += f.errors + f.non2xx;
    totalLost += lost + unexplained;
    lines.push(
      `${f.route.name.padEnd(32)} ${pad(f.route.connections, 5)} ${pad(f.requests, 9)} ${pad(f.rps.toFixed(0), 7)} ` +
        `${pad(f.p50.toFixed(1), 8)} ${pad(f.p95.toFixed(1), 8)} ${pad(f.p99.toFixed(1), 8)} ` +
        `${pad(f.max.toFixed(0), 8)} ${pad(f.errors, 7)} ${pad(f.non2xx, 8)}` +
        (f.route.rows ? ` ${pad(created, 6)} ${pad(added, 6)} ${pad(unanswered, 11)} ${pad(lost, 5)}` : ''),
    );
    if (f.non2xx) lines.push(`  statuses: ${[...f.statuses].map(([s, n]) => `${s}×${n}`).join(' ')}`);
  });
  const all = figures.reduce((s, f) => s + f.requests, 0);
  lines.push(
    `${'all routes'.padEnd(32)} ${pad(
      routes.reduce((s, r) => s + r.connections, 0),
      5,
    )} ${pad(all, 9)} ${pad((all / MEASURE_S).toFixed(0), 7)}`,
  );
  lines.push(
    '',
    `errors (socket errors, timeouts, non-2xx): ${totalErrors}   lost writes: ${totalLost}   ${totalErrors === 0 && totalLost === 0 ? 'OK' : 'FAILED'}`,
  );
  lines.push('lost = 201s without a new row, or new rows beyond 201s + unanswered (requests cut off when the window closed).');
  if (serverErrors.length) {
    const kinds = new Map<string, number>();
    for (const l of serverErrors) {
      const e = JSON.parse(l) as { msg?: string; err?: { message?: string }; req?: { method?: string; url?: string } };
      const key = `${e.req?.method ?? ''} ${e.req?.url?.replace(/\d+/g, ':id') ?? ''} ${e.msg}: ${(e.err?.message ?? '').split('\n')[0].slice(0, 160)}`;
      kinds.set(key, (kinds.get(key) ?? 0) + 1);
    }
    lines.push('', 'server errors logged:', ...[...kinds].map(([k, n]) => `  ${n} × ${k}`));
  }
  process.stdout.write(`${lines.join('\n')}\n`);
  process.exitCode = totalErrors === 0 && totalLost === 0 ? 0 : 1;
} catch (err) {
  process.stderr.write(`${err instanceof Error ? `${err.message}\n${err.stack}` : err}\n`);
  process.exitCode = 1;
} finally {
  await cleanup();
  say('done');
}
// stopServer's 30 s SIGKILL fallback timer stays pending after a clean stop; do not wait for it.
process.exit(process.exitCode ?? 0);
