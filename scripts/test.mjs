// `npm test`: the same installs (plus chromium), a throwaway MariaDB on tmpfs, migrations, a client
// build for the browser tests, then every test. Cleans up and exits non-zero on any failure.
import { spawnSync, spawn } from 'node:child_process';
import { existsSync, rmSync, readFileSync, mkdirSync } from 'node:fs';
import { join } from 'node:path';
import { ensureDebianPackages, ensureNodeModules } from './lib/setup.mjs';
import { ensureDatabase, copyDatabase } from './lib/mariadb.mjs';
import { startThrowawayMariaDb } from './lib/throwaway-mariadb.mjs';
import { clientBuildIsStale, serverBuildIsStale } from './lib/paths.mjs';
import { buildServer } from './build-server.mjs';

ensureDebianPackages({ chromium: true });
ensureNodeModules();

/** Workers of the api and browser projects, as many as `maxWorkers` in vitest.config.ts; one database copy each. */
const WORKERS = 2;
let mariadb = null;
let status;
let cleaning = false;

async function cleanup() {
  if (cleaning) return;
  cleaning = true;
  await mariadb?.destroy();
}
for (const sig of ['SIGINT', 'SIGTERM'])
  process.on(sig, async () => {
    await cleanup();
    process.exit(130);
  });

const runAsync = (cmd, args, env) =>
  new Promise((resolve) => {
    const child = spawn(cmd, args, { stdio: 'inherit', env });
    child.on('exit', (code) => resolve(code ?? 1));
  });

try {
  const extra = process.argv.slice(2);
  const projects = extra.flatMap((a, i) => (a === '--project' ? [extra[i + 1]] : a.startsWith('--project=') ? [a.slice(10)] : []));
  const needsClient = projects.length === 0 || projects.includes('browser');
  const needsServer = projects.length === 0 || projects.includes('faults');
  // The client for the browser tests; the compiled server for the fault tests that run `npm start` and the systemd
  // unit's `npm run serve`, built once here so two fault files never build it at the same time.
  // Both run while the database starts and is migrated and copied, and are awaited before any test runs.
  const buildClient = async () => {
    if (needsServer && serverBuildIsStale()) await buildServer();
    if (!needsClient || !clientBuildIsStale()) return;
    if ((await runAsync('npx', ['vite', 'build', '--logLevel', 'warn'], process.env)) !== 0) throw new Error('client build failed');
  };
  const builds = buildClient();
  builds.catch(() => undefined);
  const db = { database: 'scanwright_test', user: 'scanwright', password: 'test-only-password' };
  mariadb = await startThrowawayMariaDb({ ...db, label: 'test' });
  const { dir } = mariadb;
  const env = {
    ...process.env,
    NODE_ENV: 'test',
    TZ: 'UTC',
    DB_HOST: '127.0.0.1',
    DB_PORT: String(mariadb.port),
    DB_NAME: db.database,
    DB_USER: db.user,
    DB_PASSWORD: db.password,
    MARIADB_SOCKET: mariadb.socket,
    // Live-app browser tests: one uploads folder per worker under this one (demo pictures); removed with the run.
    TEST_UPLOADS_DIR: join(dir, 'uploads'),
    SESSION_SECRET: 'test-session-secret-test-session-secret',
    TEST_WORKER_DATABASES: String(WORKERS),
  };
  const migrate = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/migrate.ts'], { stdio: 'inherit', env });
  if (migrate.status !== 0) throw new Error('migrations failed');
  // API and browser test files run two at a time, each worker on its own copy of the migrated database
  // (tests/support/worker-database.ts), so one file's app never sees another's rows, mails or jobs.
  for (const stem of [db.database, `${db.database}_browser`])
    for (let worker = 1; worker <= WORKERS; worker++) {
      ensureDatabase(dir, { ...db, database: `${stem}_${worker}` });
      copyDatabase(dir, db.database, `${stem}_${worker}`);
    }
  mkdirSync('test-output', { recursive: true });
  const vitest = (args, json) =>
    runAsync('npx', ['vitest', 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${json}`, ...args], env);
  const reports = [];
  if (extra.length > 0) {
    await builds;
    reports.push('test-output/vitest.json');
    rmSync(reports[0], { force: true });
    status = await vitest(extra, reports[0]);
  } else {
    // A full run, in three phases (timed in DEVELOPERS.md), after the client and server builds:
    // 1. unit and api, two files at a time, each worker on its own copy of the migrated database;
    // 2. browser, two files at a time, each worker on its own database copy;
    // 3. faults, two files at a time, while the conventions are checked one after another: lint with the import
    //    boundaries and cycles, formatting, dead code (knip) and the types of client, server, shared code and tests.
    //    The faults time recoveries of killed processes and mostly wait, so the checks run at the lowest priority
    //    (nice 19) and take only the CPU the faults leave idle. Any failure fails the run.
    reports.push('test-output/vitest-unit-api.json', 'test-output/vitest-browser.json', 'test-output/vitest-faults.json');
    for (const f of reports) rmSync(f, { force: true });
    const checks = [
      ['lint', ['eslint', '.']],
      ['typecheck', ['tsc', '--noEmit', '-p', 'tsconfig.json']],
      ['format', ['prettier', '--check', '.', '--log-level', 'warn']],
      ['dead code', ['knip', '--no-progress']],
    ];
    // api tests serve dist/client when it exists, so they start after the build.
    await builds;
    const first = await vitest(['--project', 'unit', '--project', 'api'], reports[0]);
    const browser = await vitest(['--project', 'browser'], reports[1]);
    const checking = (async () => {
      const codes = [];
      for (const [, args] of checks) codes.push(await runAsync('nice', ['-n', '19', 'npx', ...args], env));
      return codes;
    })();
    const [faults, codes] = await Promise.all([vitest(['--project', 'faults'], reports[2]), checking]);
    checks.forEach(([name], i) => console.log(`${name}: ${codes[i] === 0 ? 'ok' : 'FAILED'}`));
    status = [first, browser, faults, ...codes].find((code) => code !== 0) ?? 0;
  }
  let passed = 0;
  let failed = 0;
  let total = 0;
  for (const file of reports.filter((f) => existsSync(f))) {
    const r = JSON.parse(readFileSync(file, 'utf8'));
    passed += r.numPassedTests;
    failed += r.numFailedTests;
    total += r.numTotalTests;
  }
  console.log(`\ntests: ${passed} passed, ${failed} failed`);
  if (total === 0) status = status || 1;
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  status = 1;
} finally {
  await cleanup();
}
process.exit(status);
