// `node scripts/check-serve.mjs`: start the app the way docs/deploy/scanwright.service does — its ExecStart
// (`node scripts/serve.mjs`, what `npm run serve` runs; npm itself would not pass SIGTERM on) with the unit's
// Environment= lines, plus what its EnvironmentFile would hold — against a throwaway
// MariaDB, check it answers /api/health (and /api/ready), then SIGTERM it and check it exits 0.
// Paths and ports of the unit are replaced by scratch ones; no stand-ins (a GitHub app id and a mail
// relay URL are set, as in production; nothing here signs in or sends mail). Exits 0 when all holds.
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { setTimeout as sleep } from 'node:timers/promises';
import { freePort } from './lib/scratch.mjs';
import { startThrowawayMariaDb } from './lib/throwaway-mariadb.mjs';
import { running, waitExit } from './lib/processes.mjs';

const UNIT = 'docs/deploy/scanwright.service';
const say = (line) => process.stdout.write(`[check-serve] ${line}\n`);

/** KEY=value of every Environment= line of the unit, and its ExecStart words. */
function readUnit(file) {
  const env = {};
  let exec = null;
  for (const line of readFileSync(file, 'utf8').split('\n')) {
    const m = /^Environment=([A-Z_][A-Z0-9_]*)=(.*)$/.exec(line.trim());
    if (m) env[m[1]] = m[2];
    const e = /^ExecStart=(.*)$/.exec(line.trim());
    if (e) exec = e[1].split(/\s+/);
  }
  return { env, exec };
}

const { env: unitEnv, exec } = readUnit(UNIT);
if (!exec || !exec[0].endsWith('/node')) throw new Error(`${UNIT}: no ExecStart=/usr/bin/node … line`);
const problems = [];
const scratch = mkdtempSync(join(tmpdir(), 'scanwright-check-serve-'));
const db = await startThrowawayMariaDb({
  database: unitEnv.DB_NAME ?? 'scanwright',
  user: unitEnv.DB_USER ?? 'scanwright',
  password: 'check-serve-db-password',
});
const port = await freePort();
const env = {
  PATH: process.env.PATH,
  HOME: process.env.HOME ?? scratch,
  ...unitEnv,
  // What /etc/scanwright/scanwright.env would give:
  DB_PASSWORD: db.db.password,
  SESSION_SECRET: randomBytes(32).toString('base64url'),
  GITHUB_CLIENT_ID: 'check-serve-client',
  GITHUB_CLIENT_SECRET: 'check-serve-secret',
  SMTP_URL: `smtp://127.0.0.1:${await freePort()}`,
  // The unit's machine-wide paths and ports, replaced by scratch ones:
  DB_HOST: '127.0.0.1',
  DB_PORT: String(db.port),
  PORT: String(port),
  PUBLIC_URL: `http://127.0.0.1:${port}`,
  UPLOADS_DIR: join(scratch, 'uploads'),
  READY_MIN_FREE_MB: '1',
};
say(`unit environment from ${UNIT}: ${Object.keys(unitEnv).join(', ')}`);

const started = Date.now();
say(`ExecStart: ${exec.join(' ')}`);
const child = spawn(process.execPath, exec.slice(1), { env, stdio: ['ignore', 'inherit', 'inherit'] });
const get = async (path) => {
  try {
    const res = await fetch(`http://127.0.0.1:${port}${path}`, { signal: AbortSignal.timeout(3000) });
    return { status: res.status, body: await res.json().catch(() => null) };
  } catch {
    return { status: 0, body: null };
  }
};
let health = { status: 0 };
while (Date.now() - started < 60_000 && running(child)) {
  health = await get('/api/health');
  if (health.status === 200) break;
  await sleep(200);
}
const upMs = Date.now() - started;
if (health.status !== 200) problems.push(`/api/health answered ${health.status || 'nothing'} within ${upMs} ms`);
else {
  say(`/api/health 200 after ${upMs} ms: ${JSON.stringify(health.body)}`);
  const ready = await get('/api/ready');
  say(`/api/ready ${ready.status}: ${JSON.stringify(ready.body)}`);
  if (ready.status !== 200) problems.push(`/api/ready answered ${ready.status}`);
}

const stopAt = Date.now();
if (running(child)) child.kill('SIGTERM');
if (!(await waitExit(child, 20_000))) {
  problems.push('still running 20 s after SIGTERM');
  child.kill('SIGKILL');
  await waitExit(child, 5000);
}
if (child.exitCode !== 0) problems.push(`exit ${child.exitCode ?? child.signalCode} after SIGTERM (want 0)`);
else say(`exit 0, ${Date.now() - stopAt} ms after SIGTERM`);

await db.destroy();
rmSync(scratch, { recursive: true, force: true });
if (problems.length) {
  say(`NOT OK:\n  ${problems.join('\n  ')}`);
  process.exit(1);
}
say('OK');
