// `npm start`'s supervisor (scripts/start.mjs) with its own data directory and ports: the app and MariaDB
// killed with SIGKILL come back by themselves, SIGTERM stops everything with exit 0, and a start after a
// killed start stops what that one left running. Recovery times are printed ([measured]).
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, test } from 'vitest';
import { freePort } from '../support/private-mariadb.ts';
import { waitFor } from '../support/wait-for.ts';

const base = existsSync('/dev/shm') ? '/dev/shm' : '/tmp';
const dataDir = mkdtempSync(join(base, 'scanwright-supervisor-'));
const stacks: ChildProcess[] = [];
let env: NodeJS.ProcessEnv;

async function ports() {
  env = {
    ...process.env,
    SCANWRIGHT_DATA_DIR: dataDir,
    SCANWRIGHT_SKIP_CLIENT_BUILD: '1',
    SCANWRIGHT_SKIP_INSTALL: '1',
    BACKUP_INTERVAL_H: '0',
    NODE_ENV: 'production',
    LOG_LEVEL: 'warn',
    HOST: '127.0.0.1',
    PORT: String(await freePort()),
    MARIADB_PORT: String(await freePort()),
    OAUTH_STANDIN_PORT: String(await freePort()),
    SMTP_CATCHER_PORT: String(await freePort()),
    INBOX_PORT: String(await freePort()),
    UPLOADS_DIR: join(dataDir, 'uploads'),
    RATE_LIMITS: 'false',
  };
  for (const k of ['GITHUB_CLIENT_ID', 'GITHUB_CLIENT_SECRET', 'SMTP_URL', 'DB_NAME', 'DB_USER', 'DB_PASSWORD', 'SESSION_SECRET'])
    delete env[k];
}

function start() {
  const child = spawn(process.execPath, ['scripts/start.mjs'], { env, stdio: ['ignore', 'pipe', 'pipe'] });
  let out = '';
  child.stdout!.on('data', (c) => (out += c));
  child.stderr!.on('data', (c) => (out += c));
  const exited = new Promise<number | null>((resolve) => child.once('exit', (code) => resolve(code)));
  stacks.push(child);
  return { child, output: () => out, exited };
}

const health = async () => {
  try {
    const res = await fetch(`http://127.0.0.1:${env.PORT}/api/health`, { signal: AbortSignal.timeout(2000) });
    return res.status;
  } catch {
    return 0;
  }
};
const pidOf = (file: string) => Number(readFileSync(join(dataDir, file), 'utf8').trim());
const alive = (pid: number) => {
  try {
    process.kill(pid, 0);
    const stat = readFileSync(`/proc/${pid}/stat`, 'utf8');
    return stat.slice(stat.lastIndexOf(')') + 2, stat.lastIndexOf(')') + 3) !== 'Z';
  } catch {
    return false;
  }
};
/** ms from now until /api/health answers 200. */
async function untilHealthy(timeoutMs: number) {
  const t0 = Date.now();
  await waitFor(async () => (await health()) === 200, { timeoutMs, intervalMs: 50, what: '/api/health 200' });
  return Date.now() - t0;
}

afterAll(async () => {
  for (const s of stacks) if (s.exitCode === null && s.signalCode === null) s.kill('SIGTERM');
  await new Promise((r) => setTimeout(r, 3000));
  for (const file of ['run/app.pid', 'mariadb/mysqld.pid']) {
    try {
      const pid = pidOf(file);
      if (alive(pid)) process.kill(pid, 'SIGKILL');
    } catch {
      /* none */
    }
  }
  rmSync(dataDir, { recursive: true, force: true });
}, 20_000);

describe('npm start supervising the app and MariaDB', () => {
  let stack: ReturnType<typeof start>;

  test('when it starts, then the app answers and pid files name the supervisor and the app', async () => {
    await ports();
    stack = start();
    const ms = await untilHealthy(80_000).catch((err) => {
      throw new Error(`${err.message}\n${stack.output().slice(-3000)}`);
    });
    console.log(`[measured] cold start to /api/health 200: ${ms} ms`);
    expect(pidOf('run/supervisor.pid')).toBe(stack.child.pid);
    expect(alive(pidOf('run/app.pid'))).toBe(true);
  }, 90_000);

  test('when the app is killed with SIGKILL, then it answers again within 5 s', async () => {
    const old = pidOf('run/app.pid');
    process.kill(old, 'SIGKILL');
    const t0 = Date.now();
    await waitFor(async () => !alive(old) && (await health()) !== 200, { timeoutMs: 3000, intervalMs: 10, what: 'the app to be gone' });
    await untilHealthy(10_000);
    const ms = Date.now() - t0;
    console.log(`[measured] app SIGKILL to /api/health 200: ${ms} ms`);
    expect(ms).toBeLessThan(5000);
    expect(pidOf('run/app.pid')).not.toBe(old);
    expect(stack.output()).toMatch(/the app was killed by SIGKILL/);
  }, 30_000);

  test('when MariaDB is killed with SIGKILL, then the app answers 503 meanwhile and 200 within 15 s', async () => {
    const old = pidOf('mariadb/mysqld.pid');
    process.kill(old, 'SIGKILL');
    const t0 = Date.now();
    const seen = new Set<number>();
    await waitFor(
      async () => {
        const s = await health();
        seen.add(s);
        return s === 200 && seen.has(503);
      },
      { timeoutMs: 20_000, intervalMs: 50, what: 'MariaDB back and /api/health 200' },
    );
    const ms = Date.now() - t0;
    console.log(`[measured] MariaDB SIGKILL to /api/health 200: ${ms} ms`);
    expect(ms).toBeLessThan(15_000);
    expect([...seen].filter((s) => s !== 200 && s !== 503)).toEqual([]);
    expect(pidOf('mariadb/mysqld.pid')).not.toBe(old);
    expect(stack.output()).toMatch(/MariaDB was killed by SIGKILL/);
  }, 30_000);

  test('when the supervisor gets SIGTERM, then everything stops and it exits 0', async () => {
    const app = pidOf('run/app.pid');
    const db = pidOf('mariadb/mysqld.pid');
    const t0 = Date.now();
    stack.child.kill('SIGTERM');
    expect(await stack.exited).toBe(0);
    console.log(`[measured] SIGTERM to supervisor exit 0: ${Date.now() - t0} ms`);
    expect(alive(app)).toBe(false);
    expect(alive(db)).toBe(false);
    expect(existsSync(join(dataDir, 'run/supervisor.pid'))).toBe(false);
  }, 60_000);

  test('when an earlier start was killed with SIGKILL, then a new start stops its leftovers and runs', async () => {
    const first = start();
    await untilHealthy(60_000);
    const app = pidOf('run/app.pid');
    const db = pidOf('mariadb/mysqld.pid');
    process.kill(first.child.pid!, 'SIGKILL');
    await first.exited;
    expect(alive(app) && alive(db)).toBe(true);

    const second = start();
    const t0 = Date.now();
    await waitFor(async () => /Stopped what an earlier npm start left running/.test(second.output()) && (await health()) === 200, {
      timeoutMs: 60_000,
      intervalMs: 100,
      what: 'the new start to clean up and answer',
    });
    console.log(`[measured] start over a killed start's leftovers to /api/health 200: ${Date.now() - t0} ms`);
    expect(alive(app)).toBe(false);
    expect(alive(db)).toBe(false);
    expect(pidOf('run/app.pid')).not.toBe(app);
    second.child.kill('SIGTERM');
    expect(await second.exited).toBe(0);
  }, 90_000);
});
