// `npm start`'s supervisor (scripts/start.mjs) with its own data directory and ports: the app and MariaDB
// killed with SIGKILL come back by themselves while three makers keep writing (every acknowledged write is
// there exactly once, none half-written), SIGTERM stops everything with exit 0, a start after a killed start
// stops what that one left running, and an app that keeps dying is restarted with growing delays until the
// supervisor gives up with exit 71. Recovery times are printed ([measured]).
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, describe, expect, test } from 'vitest';
import { freePort, scratchBase } from '../../scripts/lib/scratch.mjs';
import { waitFor } from '../support/wait-for.ts';

const dataDir = mkdtempSync(join(scratchBase(), 'scanwright-supervisor-'));
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

const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));
const appUrl = () => `http://127.0.0.1:${env.PORT}`;

/** SQL as root over the stack's MariaDB socket; tab-separated rows. */
function sql(query: string): string[][] {
  const res = spawnSync(
    'mariadb',
    [
      '--no-defaults',
      `--socket=${join(dataDir, 'mariadb', 'mysqld.sock')}`,
      '--user=root',
      '--batch',
      '--skip-column-names',
      'scanwright',
      '-e',
      query,
    ],
    { encoding: 'utf8' },
  );
  if (res.status !== 0) throw new Error(`mariadb: ${res.stderr}`);
  return res.stdout
    .split('\n')
    .filter(Boolean)
    .map((l) => l.split('\t'));
}

interface Maker {
  login: string;
  cookie: string;
  csrf: string;
}

/** Sign in through the stack's OAuth stand-in, following each redirect by hand. */
async function signIn(login: string): Promise<Maker> {
  const sid = (res: Response) =>
    res.headers
      .getSetCookie()
      .map((c) => c.split(';')[0])
      .find((c) => c.startsWith('scanwright.sid='));
  const first = await fetch(`${appUrl()}/auth/github?login=${login}`, { redirect: 'manual' });
  let cookie = sid(first) ?? '';
  const atProvider = await fetch(first.headers.get('location')!, { redirect: 'manual' });
  const done = await fetch(atProvider.headers.get('location')!, { redirect: 'manual', headers: { cookie } });
  cookie = sid(done) ?? cookie;
  const session = await (await fetch(`${appUrl()}/api/session`, { headers: { cookie } })).json();
  expect(session.user?.login).toBe(login);
  return { login, cookie, csrf: session.csrfToken };
}

interface Write {
  key: string;
  title: string;
  /** Every answer, in order (0 = no answer: refused, reset or timed out). */
  statuses: number[];
  /** The build id of the 2xx answer, once acknowledged. */
  id?: number;
}

const draftBody = (title: string) => ({ title, instrumentKind: 'profilometer', summary: `Written under a fault: ${title}.` });

/**
 * A bounded write load: `clients` makers' clients each creating drafts one after another (at most 150 each)
 * until stopped. A POST without a 2xx answer is retried with the same Idempotency-Key for up to 15 s.
 */
function writeLoad(maker: Maker, tag: string, clients = 3) {
  const writes: Write[] = [];
  let running = true;
  const post = async (w: Write) => {
    try {
      const res = await fetch(`${appUrl()}/api/builds`, {
        method: 'POST',
        headers: {
          accept: 'application/json',
          'content-type': 'application/json',
          cookie: maker.cookie,
          'x-csrf-token': maker.csrf,
          'idempotency-key': w.key,
        },
        body: JSON.stringify(draftBody(w.title)),
        signal: AbortSignal.timeout(5000),
      });
      const body = await res.json().catch(() => null);
      return { status: res.status, id: body?.id as number | undefined, code: body?.error?.code as string | undefined };
    } catch {
      return { status: 0 };
    }
  };
  const one = async (w: Write) => {
    const deadline = Date.now() + 15_000;
    while (Date.now() < deadline) {
      const res = await post(w);
      w.statuses.push(res.status);
      if (res.status >= 200 && res.status < 300) return void (w.id = res.id);
      // Other 4xx are a mistake in the test, not a fault: do not retry them.
      if (res.status >= 400 && res.status < 500 && !(res.status === 409 && res.code === 'idempotency_in_progress')) return;
      await pause(150);
    }
  };
  const client = async (c: number) => {
    for (let i = 0; running && i < 150; i++) {
      const key = `${tag}-${c}-${i}-${randomUUID()}`;
      const w: Write = { key, title: `Load ${key}`, statuses: [] };
      writes.push(w);
      await one(w);
      await pause(30);
    }
  };
  const done = Promise.all(Array.from({ length: clients }, (_, c) => client(c)));
  return {
    writes,
    /** Stop starting new writes and wait for those under way (each ends within 15 s). */
    async stop() {
      running = false;
      await done;
    },
  };
}

/**
 * The check after a fault: every acknowledged write is in the database exactly once, as the row it
 * answered with; none is there twice; every row is whole (owner, kind and summary as sent).
 */
function expectExactlyOnce(maker: Maker, writes: Write[], what: string) {
  const rows = sql(
    `SELECT b.id, b.title, b.instrument_kind, b.summary, u.login FROM builds b JOIN users u ON u.id = b.owner_id ` +
      `WHERE b.title LIKE 'Load %' ORDER BY b.id`,
  );
  const byTitle = new Map<string, string[][]>();
  for (const r of rows) byTitle.set(r[1], [...(byTitle.get(r[1]) ?? []), r]);
  const acked = writes.filter((w) => w.id !== undefined);
  const mine = writes.filter((w) => byTitle.has(w.title));
  const missing = acked.filter((w) => byTitle.get(w.title)?.length !== 1 || byTitle.get(w.title)![0][0] !== String(w.id));
  const twice = [...byTitle.values()].filter((r) => r.length > 1);
  const half = mine
    .map((w) => byTitle.get(w.title)![0])
    .filter(([, title, kind, summary, login]) => kind !== 'profilometer' || summary !== draftBody(title).summary || login !== maker.login);
  const retried = writes.filter((w) => w.statuses.length > 1);
  const answers: Record<string, number> = {};
  for (const w of writes) for (const s of w.statuses) answers[s] = (answers[s] ?? 0) + 1;
  console.log(
    `[measured] ${what}: ${writes.length} writes, ${acked.length} acknowledged, ${retried.length} retried with the same key, ` +
      `${writes.length - acked.length} never acknowledged (${mine.length - acked.length} of those stored); answers ${JSON.stringify(answers)}`,
  );
  // A write cut by a kill after its commit but before its answer was recorded keeps its key claimed: retries get
  // 409 idempotency_in_progress until the claim is taken as abandoned (server/services/idempotency.service.ts).
  const stuck = writes.filter((w) => w.id === undefined && w.statuses.at(-1) === 409);
  if (stuck.length) console.log(`[measured] ${what}: ${stuck.length} keys still claimed (409) after 15 s of retries`);
  expect(missing.map((w) => w.key)).toEqual([]);
  expect(twice).toEqual([]);
  expect(half).toEqual([]);
  // Only fault answers: 2xx, 503 while MariaDB is away, 409 for a key still claimed, 0 while the app is down.
  expect(Object.keys(answers).filter((s) => !['0', '201', '409', '503'].includes(s))).toEqual([]);
  expect(acked.length).toBeGreaterThan(10);
  // The fault hit the load: some writes were refused or cut and retried with their key.
  expect(retried.length).toBeGreaterThan(0);
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
  let maker: Maker;

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

  test('when the app is killed with SIGKILL under write load, then it answers again within 5 s and no acknowledged write is lost or doubled', async () => {
    maker = await signIn(`load${Date.now().toString(36)}`);
    const load = writeLoad(maker, 'app');
    await pause(1000);
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
    await pause(1000);
    await load.stop();
    expectExactlyOnce(maker, load.writes, 'app SIGKILL under load');
  }, 60_000);

  test('when MariaDB is killed with SIGKILL under write load, then the app answers 503 meanwhile, 200 within 15 s, and no acknowledged write is lost or doubled', async () => {
    const load = writeLoad(maker, 'db');
    await pause(1000);
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
    await pause(1000);
    await load.stop();
    expectExactlyOnce(maker, load.writes, 'MariaDB SIGKILL under load');
  }, 60_000);

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

describe('npm start with an app that keeps dying', () => {
  test('when the app dies again after each restart, then the delays grow and it gives up with exit 71', async () => {
    // Small limits so the give-up comes in seconds (the defaults are 10 failures and 30 s).
    const saved = env;
    env = { ...env, SUPERVISOR_MAX_FAILURES: '4', SUPERVISOR_MAX_DELAY_MS: '2000' };
    const stack = start();
    env = saved;
    await untilHealthy(60_000);
    const db = pidOf('mariadb/mysqld.pid');
    const gaps: number[] = [];
    for (let failure = 1; failure <= 4; failure++) {
      const old = pidOf('run/app.pid');
      // Wait until the supervisor has seen it listen (it polls every 100 ms), so the death counts as a crash.
      await pause(400);
      process.kill(old, 'SIGKILL');
      const killedAt = Date.now();
      if (failure === 4) break;
      await waitFor(() => existsSync(join(dataDir, 'run/app.pid')) && pidOf('run/app.pid') !== old, {
        timeoutMs: 10_000,
        intervalMs: 10,
        what: 'the app to be started again',
      });
      gaps.push(Date.now() - killedAt);
      await untilHealthy(15_000);
    }
    const code = await stack.exited;
    console.log(`[measured] kill → restart of the app with SUPERVISOR_MAX_DELAY_MS=2000: ${gaps.join(', ')} ms; then exit ${code}`);
    // The supervisor's delays: 0.5 s doubling, capped at 2 s [practice: exponential backoff].
    const delays = [...stack.output().matchAll(/restarting the app in ([\d.]+) s/g)].map((m) => Number(m[1]));
    expect(delays).toEqual([0.5, 1, 2]);
    gaps.forEach((gap, i) => {
      expect(gap).toBeGreaterThanOrEqual(delays[i] * 1000 - 20);
      expect(gap).toBeLessThan(delays[i] * 1000 + 1500);
    });
    expect(gaps[1]).toBeGreaterThan(gaps[0]);
    expect(gaps[2]).toBeGreaterThan(gaps[1]);
    expect(stack.output()).toMatch(/the app failed 4 times in a row; giving up/);
    expect(code).toBe(71);
    expect(alive(db)).toBe(false);
    expect(existsSync(join(dataDir, 'run/supervisor.pid'))).toBe(false);
  }, 90_000);
});
