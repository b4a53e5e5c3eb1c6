// `npm test`: the same installs (plus chromium), a throwaway MariaDB on tmpfs, migrations, a client
// build for the browser tests, then every test. Cleans up and exits non-zero on any failure.
import { spawnSync, spawn } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync, accessSync, constants, readFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createServer } from 'node:net';
import { ensureDebianPackages, ensureNodeModules } from './lib/setup.mjs';
import { initDataDir, startServer, ensureDatabase, stopServer } from './lib/mariadb.mjs';
import { clientBuildIsStale } from './lib/paths.mjs';

ensureDebianPackages({ chromium: true });
ensureNodeModules();

const freePort = () =>
  new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address();
      s.close(() => resolve(port));
    });
  });

let base = tmpdir();
try {
  accessSync('/dev/shm', constants.W_OK);
  base = '/dev/shm';
} catch {
  /* use tmpdir */
}
const dir = mkdtempSync(join(base, 'scanwright-test-'));
let mariadb = null;
let status;
let cleaning = false;

async function cleanup() {
  if (cleaning) return;
  cleaning = true;
  await stopServer(mariadb);
  rmSync(dir, { recursive: true, force: true });
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
  const port = await freePort();
  initDataDir(dir);
  mariadb = await startServer(dir, port, { fast: true });
  const db = { database: 'scanwright_test', user: 'scanwright', password: 'test-only-password' };
  ensureDatabase(dir, db);
  const env = {
    ...process.env,
    NODE_ENV: 'test',
    TZ: 'UTC',
    DB_HOST: '127.0.0.1',
    DB_PORT: String(port),
    DB_NAME: db.database,
    DB_USER: db.user,
    DB_PASSWORD: db.password,
    MARIADB_SOCKET: join(dir, 'mysqld.sock'),
    // Live-app browser tests share one uploads folder (demo pictures seeded once); removed with the run.
    TEST_UPLOADS_DIR: join(dir, 'uploads'),
    SESSION_SECRET: 'test-session-secret-test-session-secret',
  };
  const migrate = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/migrate.ts'], { stdio: 'inherit', env });
  if (migrate.status !== 0) throw new Error('migrations failed');
  const extra = process.argv.slice(2);
  const projects = extra.flatMap((a, i) => (a === '--project' ? [extra[i + 1]] : a.startsWith('--project=') ? [a.slice(10)] : []));
  const needsClient = projects.length === 0 || projects.includes('browser');
  if (needsClient && clientBuildIsStale()) {
    const build = spawnSync('npx', ['vite', 'build', '--logLevel', 'warn'], { stdio: 'inherit', env });
    if (build.status !== 0) throw new Error('client build failed');
  }
  mkdirSync('test-output', { recursive: true });
  // A full run also checks the conventions (about 45 s): the lint rules with the import boundaries and
  // cycles, the formatting, dead code (knip) and the types of client, server, shared code and tests.
  // Any failure fails the run.
  let checksOk = true;
  if (extra.length === 0) {
    const checks = [
      ['lint', ['eslint', '.']],
      ['typecheck', ['tsc', '--noEmit', '-p', 'tsconfig.json']],
      ['format', ['prettier', '--check', '.', '--log-level', 'warn']],
      ['dead code', ['knip', '--no-progress']],
    ];
    // Two at a time (the machine has two cores); each prints its own output.
    const results = [];
    for (let i = 0; i < checks.length; i += 2) {
      results.push(...(await Promise.all(checks.slice(i, i + 2).map(([, args]) => runAsync('npx', args, env)))));
    }
    checks.forEach(([name], i) => console.log(`${name}: ${results[i] === 0 ? 'ok' : 'FAILED'}`));
    checksOk = results.every((code) => code === 0);
  }
  status = await runAsync(
    'npx',
    ['vitest', 'run', '--reporter=default', '--reporter=json', '--outputFile.json=test-output/vitest.json', ...extra],
    env,
  );
  if (!checksOk) status = status || 1;
  if (existsSync('test-output/vitest.json')) {
    const r = JSON.parse(readFileSync('test-output/vitest.json', 'utf8'));
    console.log(`\ntests: ${r.numPassedTests} passed, ${r.numFailedTests} failed`);
    if (r.numTotalTests === 0) status = status || 1;
  }
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  status = 1;
} finally {
  await cleanup();
}
process.exit(status);
