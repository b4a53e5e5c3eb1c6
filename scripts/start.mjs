// `npm start`: install what is missing, start the private MariaDB, migrate, seed the demo on the
// first run, build the client when stale, and serve — supervised: the app or MariaDB dying is
// restarted with backoff (scripts/lib/supervisor.mjs), a daily backup runs inside (BACKUP_INTERVAL_H),
// and SIGINT/SIGTERM stop everything whatever state it is in. Exit codes: scripts/lib/exit-codes.mjs.
import { spawn } from 'node:child_process';
import { connect } from 'node:net';
import { join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { ensureDebianPackages, ensureNodeModules } from './lib/setup.mjs';
import { initDataDir, startServer, ensureDatabase } from './lib/mariadb.mjs';
import { DATA_DIR, ROOT, localSecrets, clientBuildIsStale, serverBuildIsStale } from './lib/paths.mjs';
import { EXIT } from './lib/exit-codes.mjs';
import { running, stopChild, waitExit } from './lib/processes.mjs';
import { cleanUpStale, pidFiles, removePid, writePid } from './lib/pid-files.mjs';
import { supervise } from './lib/supervisor.mjs';
import { startBackupSchedule } from './lib/backup-schedule.mjs';
import { buildServer } from './build-server.mjs';

const log = (line) => process.stdout.write(`[npm start] ${line}\n`);

ensureDebianPackages();
ensureNodeModules();

const secrets = localSecrets();
const dbDir = join(DATA_DIR, 'mariadb');
const dbPort = Number(process.env.MARIADB_PORT ?? 3307);
const env = {
  ...process.env,
  NODE_ENV: process.env.NODE_ENV ?? 'production',
  DB_HOST: '127.0.0.1',
  DB_PORT: String(dbPort),
  DB_NAME: process.env.DB_NAME ?? 'scanwright',
  DB_USER: process.env.DB_USER ?? 'scanwright',
  DB_PASSWORD: process.env.DB_PASSWORD ?? secrets.dbPassword,
  SESSION_SECRET: process.env.SESSION_SECRET ?? secrets.sessionSecret,
};
const appPort = Number(env.PORT ?? 3000);
const appHost = !env.HOST || env.HOST === '0.0.0.0' ? '127.0.0.1' : env.HOST;
const files = pidFiles(DATA_DIR);

let stopping = false;
let signals = 0;
/** Whatever runs right now, so a signal in any phase can stop it. */
const live = { db: null, app: null, step: null };
let dbSup = null;
let appSup = null;
let backups = null;

async function shutdown(code, why) {
  if (stopping) return;
  stopping = true;
  if (why) log(why);
  dbSup?.cancel();
  appSup?.cancel();
  backups?.stop();
  await stopChild(live.step, { graceMs: 5000 });
  if (running(live.app)) {
    live.app.kill('SIGTERM');
    // The app drains for at most 10 s and then exits 1 by itself; SIGKILL is the last resort.
    if (!(await waitExit(live.app, 15_000))) live.app.kill('SIGKILL');
    await waitExit(live.app, 5000);
    if (code === EXIT.OK && live.app.exitCode) code = live.app.exitCode;
  }
  removePid(files.app);
  if (running(live.db)) {
    await stopChild(live.db, { graceMs: 30_000 });
    log('MariaDB stopped.');
  }
  removePid(files.supervisor, process.pid);
  process.exit(code);
}

function onSignal(signal) {
  signals += 1;
  if (signals === 1) return void shutdown(EXIT.OK, `${signal}: stopping …`);
  // Asked again while stopping: do not make anyone wait.
  log(`${signal} again: killing everything now.`);
  for (const c of [live.step, live.app, live.db]) if (running(c)) c.kill('SIGKILL');
  removePid(files.app);
  removePid(files.supervisor, process.pid);
  process.exit(EXIT.FORCED);
}
process.on('SIGINT', () => onSignal('SIGINT'));
process.on('SIGTERM', () => onSignal('SIGTERM'));
process.on('SIGHUP', () => onSignal('SIGHUP'));

/** Run one preparation step as a child (async, so signals are handled meanwhile); resolves with its exit code. */
async function step(command, args) {
  live.step = spawn(command, args, { stdio: 'inherit', env });
  const child = live.step;
  await waitExit(child, 24 * 3600_000);
  live.step = null;
  return child.exitCode ?? 1;
}

/** True once something accepts TCP connections on the app's port. */
const listening = () =>
  new Promise((resolve) => {
    const s = connect(appPort, appHost);
    s.once('connect', () => {
      s.destroy();
      resolve(true);
    });
    s.once('error', () => resolve(false));
  });

/** Spawn the compiled app; `everListened` turns true once its port answers. */
async function startApp() {
  const child = spawn(process.execPath, ['--enable-source-maps', 'dist/server/index.mjs'], { stdio: 'inherit', env });
  child.everListened = false;
  live.app = child;
  writePid(files.app, child.pid);
  void (async () => {
    while (running(child) && !child.everListened) {
      if (await listening()) child.everListened = true;
      else await sleep(100);
    }
  })();
  return child;
}

const stale = await cleanUpStale({ dataDir: DATA_DIR, root: ROOT, dbDir, log });
if (stale.running) {
  log(`Another npm start is running from ${DATA_DIR} (pid ${stale.running}). Stop it first (kill ${stale.running}).`);
  process.exit(EXIT.ALREADY_RUNNING);
}
if (stale.stopped.length) log(`Stopped what an earlier npm start left running: ${stale.stopped.join(', ')}.`);
writePid(files.supervisor, process.pid);

try {
  if (initDataDir(dbDir)) log(`Initialised MariaDB data directory in ${dbDir}`);
  dbSup = supervise({
    name: 'MariaDB',
    start: () =>
      startServer(dbDir, dbPort, {
        onSpawn: (c) => {
          live.db = c;
        },
        shouldStop: () => stopping,
      }),
    stopping: () => stopping,
    onGiveUp: () => void shutdown(EXIT.GAVE_UP, 'MariaDB would not come back; stopping.'),
    log,
  });
  await dbSup.first();
} catch (err) {
  await shutdown(EXIT.MARIADB_WOULD_NOT_START, `MariaDB would not start: ${err instanceof Error ? err.message : err}`);
}

try {
  if (stopping) await new Promise(() => {});
  ensureDatabase(dbDir, { database: env.DB_NAME, user: env.DB_USER, password: env.DB_PASSWORD });
  // Production runs the compiled server (dist/server, esbuild); tsx is for development and tests.
  if (serverBuildIsStale()) {
    log('Building the server …');
    await buildServer();
  }
  if ((await step(process.execPath, ['--enable-source-maps', 'dist/server/prepare.mjs'])) !== 0)
    throw new Error('migrations or seeding failed');
  if (process.env.SCANWRIGHT_SKIP_CLIENT_BUILD !== '1' && clientBuildIsStale()) {
    log('Building the client …');
    if ((await step('npx', ['vite', 'build', '--logLevel', 'warn'])) !== 0) throw new Error('client build failed');
  }
} catch (err) {
  await shutdown(EXIT.PREPARE_FAILED, err instanceof Error ? err.message : String(err));
}

if (!stopping) {
  appSup = supervise({
    name: 'the app',
    start: startApp,
    stopping: () => stopping,
    // A clean exit 0 is final; a failure before it ever listened (a bad setting) would only repeat.
    decide: ({ code, signal }) => (signal === null && (code === 0 || !live.app?.everListened) ? 'final' : 'restart'),
    onFinal: ({ code }) =>
      void shutdown(code ?? 1, code === 0 ? 'The app stopped by itself (exit 0).' : `The app failed to start (exit ${code}).`),
    onGiveUp: () => void shutdown(EXIT.GAVE_UP, 'The app kept failing; stopping.'),
    log,
  });
  await appSup.first();
  backups = startBackupSchedule({
    socket: join(dbDir, 'mysqld.sock'),
    database: env.DB_NAME,
    uploadsDir: env.UPLOADS_DIR ?? 'uploads',
    log,
  });
}
