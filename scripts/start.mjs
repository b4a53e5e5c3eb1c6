// `npm start`: install what is missing, start the private MariaDB, migrate, seed the demo on the
// first run, build the client when stale, and serve. Ctrl-C / SIGTERM stops everything it started.
import { spawn, spawnSync } from 'node:child_process';
import { join } from 'node:path';
import { ensureDebianPackages, ensureNodeModules } from './lib/setup.mjs';
import { initDataDir, startServer, ensureDatabase, stopServer } from './lib/mariadb.mjs';
import { DATA_DIR, localSecrets, clientBuildIsStale, serverBuildIsStale } from './lib/paths.mjs';
import { buildServer } from './build-server.mjs';

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

let mariadb = null;
let app = null;
let stopping = false;

async function shutdown(code) {
  if (stopping) return;
  stopping = true;
  if (app && app.exitCode === null) {
    const exited = new Promise((r) => app.once('exit', r));
    app.kill('SIGTERM');
    await exited;
  }
  if (mariadb) {
    await stopServer(mariadb);
    console.log('MariaDB stopped.');
  }
  process.exit(code);
}
process.on('SIGINT', () => shutdown(0));
process.on('SIGTERM', () => shutdown(0));

try {
  if (initDataDir(dbDir)) console.log(`Initialised MariaDB data directory in ${dbDir}`);
  mariadb = await startServer(dbDir, dbPort);
  mariadb.on('exit', (c) => {
    if (!stopping) {
      console.error(`MariaDB exited unexpectedly (${c})`);
      shutdown(1);
    }
  });
  ensureDatabase(dbDir, { database: env.DB_NAME, user: env.DB_USER, password: env.DB_PASSWORD });

  // Production runs the compiled server (dist/server, esbuild); tsx is for development and tests.
  if (serverBuildIsStale()) {
    console.log('Building the server …');
    await buildServer();
  }
  const prepare = spawnSync(process.execPath, ['--enable-source-maps', 'dist/server/prepare.mjs'], { stdio: 'inherit', env });
  if (prepare.status !== 0) throw new Error('migrations or seeding failed');

  if (clientBuildIsStale()) {
    console.log('Building the client …');
    const b = spawnSync('npx', ['vite', 'build', '--logLevel', 'warn'], { stdio: 'inherit', env });
    if (b.status !== 0) throw new Error('client build failed');
  }

  app = spawn(process.execPath, ['--enable-source-maps', 'dist/server/index.mjs'], { stdio: 'inherit', env });
  app.on('exit', (code) => {
    if (!stopping) shutdown(code ?? 1);
  });
} catch (err) {
  console.error(err instanceof Error ? err.message : err);
  await shutdown(1);
}
