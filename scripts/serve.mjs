// `npm run serve`: the app alone, for production under systemd (docs/deploy/): the compiled server against
// a MariaDB you run (DB_HOST, DB_PORT, DB_NAME, DB_USER, DB_PASSWORD). Migrations are applied first; then
// the app runs as a child that gets SIGTERM/SIGINT passed on, and its exit code is this script's
// (0 after a clean drain). No local stand-ins: GitHub (GITHUB_CLIENT_ID/SECRET) and a mail relay (SMTP_URL)
// must be configured, unless --stand-ins (or SCANWRIGHT_STAND_INS=1) asks for the local ones.
import { spawn } from 'node:child_process';
import { existsSync } from 'node:fs';
import { EXIT } from './lib/exit-codes.mjs';
import { serverBuildIsStale } from './lib/paths.mjs';

const log = (line) => process.stderr.write(`[serve] ${line}\n`);
const env = { ...process.env, NODE_ENV: process.env.NODE_ENV ?? 'production' };
const standIns = process.argv.includes('--stand-ins') || env.SCANWRIGHT_STAND_INS === '1';

const missing = [];
if (!standIns && !(env.GITHUB_CLIENT_ID && env.GITHUB_CLIENT_SECRET))
  missing.push('GITHUB_CLIENT_ID and GITHUB_CLIENT_SECRET (GitHub sign-in)');
if (!standIns && !env.SMTP_URL) missing.push('SMTP_URL (the mail relay)');
if (env.DB_PASSWORD === undefined) missing.push('DB_PASSWORD (and DB_HOST, DB_PORT, DB_NAME, DB_USER unless the defaults)');
if (missing.length) {
  log(`Not set: ${missing.join('; ')}.\nSet them (see docs/deploy/), or add --stand-ins for the local GitHub and mail stand-ins.`);
  process.exit(EXIT.CONFIG_MISSING);
}

if (serverBuildIsStale()) {
  try {
    const { buildServer } = await import('./build-server.mjs');
    log('Building the server …');
    await buildServer();
  } catch (err) {
    if (!existsSync('dist/server/index.mjs')) {
      log(`No compiled server and no way to build it (${err instanceof Error ? err.message : err}). Run npm run build:server first.`);
      process.exit(EXIT.PREPARE_FAILED);
    }
    log('Sources look newer than dist/server but esbuild is not installed: serving the existing build.');
  }
}

let child = null;
let signalled = null;
for (const signal of ['SIGTERM', 'SIGINT']) {
  process.on(signal, () => {
    signalled = signal;
    if (child && child.exitCode === null && child.signalCode === null) child.kill(signal);
    else process.exit(EXIT.OK);
  });
}

function run(args) {
  child = spawn(process.execPath, ['--enable-source-maps', ...args], { stdio: 'inherit', env });
  return new Promise((resolve) => child.once('exit', (code, signal) => resolve({ code, signal })));
}

const migrated = await run(['dist/server/migrate.mjs']);
if (signalled) process.exit(EXIT.OK);
if (migrated.code !== 0) {
  log(`Migrations failed (exit ${migrated.code ?? migrated.signal}); the app was not started.`);
  process.exit(EXIT.PREPARE_FAILED);
}
const { code, signal } = await run(['dist/server/index.mjs']);
process.exit(code ?? 128 + ({ SIGTERM: 15, SIGINT: 2, SIGKILL: 9 }[signal] ?? 1));
