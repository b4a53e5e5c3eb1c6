// Process faults: the real server process (`node --import tsx server/index.ts`) against a private
// MariaDB. SIGTERM with a request in flight, and two instances sharing one database and sessions.
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { request as httpRequest, type ClientRequest, type IncomingMessage } from 'node:http';
import { connect } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Sequelize } from 'sequelize';
import { createSequelize } from '../../server/db/sequelize.ts';
import { initModels } from '../../server/models/index.ts';
import { createUser, uniqueLogin } from '../support/factories.ts';
import { startPrivateMariaDb, type PrivateMariaDb } from '../support/private-mariadb.ts';
import { startServerProcess, type RunningServer } from '../support/server-process.ts';
import { waitFor } from '../support/wait-for.ts';

const SESSION_SECRET = 'process-faults-session-secret-0123456789';
const START_TIMEOUT_MS = 45_000;

let db: PrivateMariaDb;
let sequelize: Sequelize;
let uploads: string;
const servers: RunningServer[] = [];

/** Spawn the real server on free ports (app, OAuth stand-in, SMTP catcher, inbox) against the private DB. */
async function startServer(): Promise<RunningServer> {
  const server = await startServerProcess({ db, uploads, sessionSecret: SESSION_SECRET, startTimeoutMs: START_TIMEOUT_MS });
  servers.push(server);
  return server;
}

/** A cookie jar of one: the session cookie, as a browser would keep it. */
interface Browser {
  base: string;
  cookie: string;
  csrf: string;
}

const sidOf = (res: Response) =>
  res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .find((c) => c.startsWith('scanwright.sid='));

/** Sign in through the instance's own OAuth stand-in, following each redirect by hand. */
async function signInAt(server: RunningServer, login: string): Promise<Browser> {
  const start = await fetch(`${server.base}/auth/github?login=${login}`, { redirect: 'manual' });
  expect(start.status).toBe(302);
  let cookie = sidOf(start) ?? '';
  const atProvider = await fetch(start.headers.get('location')!, { redirect: 'manual' });
  const callback = atProvider.headers.get('location')!;
  expect(callback.startsWith(`${server.base}/auth/github/callback?`)).toBe(true);
  const done = await fetch(callback, { redirect: 'manual', headers: { cookie } });
  expect([done.status, done.headers.get('location')]).toEqual([302, '/']);
  cookie = sidOf(done) ?? cookie;
  const session = await (await fetch(`${server.base}/api/session`, { headers: { cookie } })).json();
  expect(session.user?.login).toBe(login);
  return { base: server.base, cookie, csrf: session.csrfToken };
}

async function api(b: Browser | { base: string }, method: string, path: string, body?: unknown) {
  const headers: Record<string, string> = { accept: 'application/json' };
  if ('cookie' in b) Object.assign(headers, { cookie: b.cookie, 'x-csrf-token': b.csrf });
  if (body !== undefined) headers['content-type'] = 'application/json';
  const res = await fetch(`${b.base}${path}`, { method, headers, body: body === undefined ? undefined : JSON.stringify(body) });
  return { status: res.status, body: await res.json().catch(() => null) };
}

/**
 * The kernel's view of the server end of a loopback connection (Linux /proc/net/tcp{,6}): established,
 * and nothing we sent is left unread in either socket's queue, so the server process has read it all.
 */
function serverHasRead(serverPort: number, clientPort: number): boolean {
  const hex = (port: number) => port.toString(16).toUpperCase().padStart(4, '0');
  const rows = ['/proc/net/tcp', '/proc/net/tcp6']
    .flatMap((file) => readFileSync(file, 'utf8').split('\n').slice(1))
    .map((line) => line.trim().split(/\s+/))
    .filter((cols) => cols.length > 4);
  const end = (local: number, remote: number) => rows.find(([, l, r]) => l?.endsWith(`:${hex(local)}`) && r?.endsWith(`:${hex(remote)}`));
  const server = end(serverPort, clientPort);
  const client = end(clientPort, serverPort);
  if (!server || !client) return false;
  const [, serverUnread] = server[4]!.split(':').map((q) => parseInt(q, 16));
  const [clientUnsent] = client[4]!.split(':').map((q) => parseInt(q, 16));
  return server[3] === '01' && serverUnread === 0 && clientUnsent === 0;
}

const globalStatus = (name: string) => Number(db.sql(`SHOW GLOBAL STATUS LIKE '${name}'`).trim().split(/\s+/).pop());
const appConnections = () =>
  Number(db.sql(`SELECT COUNT(*) FROM information_schema.PROCESSLIST WHERE USER = '${db.db.user}'`).trim().split(/\s+/).pop());

beforeAll(async () => {
  db = await startPrivateMariaDb({ database: 'scanwright_faults_process' });
  sequelize = createSequelize(db.db);
  initModels(sequelize);
  uploads = mkdtempSync(join(tmpdir(), 'scanwright-process-uploads-'));
}, 60_000);

afterAll(async () => {
  await Promise.all(servers.map((s) => s.stop()));
  await sequelize?.close();
  await db?.destroy();
  if (uploads) rmSync(uploads, { recursive: true, force: true });
});

describe('SIGTERM with a request in flight', () => {
  test('then the server stops accepting, finishes the request (200), closes the pool and exits 0', async () => {
    const server = await startServer();
    // Warm the pool so there are open MariaDB connections to close.
    await Promise.all([api(server, 'GET', '/api/builds'), api(server, 'GET', '/api/health'), api(server, 'GET', '/api/parts')]);
    expect(appConnections()).toBeGreaterThan(0);
    const abortedBefore = globalStatus('Aborted_clients');

    // 100 000 points, the first half sent now, the rest after SIGTERM: the request is in flight.
    const points = Array.from({ length: 100_000 }, (_, i) => ({
      volts: (i % 1000) * 0.1,
      displacement: (i % 1000) * 0.1 * 42.5 + ((i * 7919) % 13) * 0.01,
    }));
    const payload = Buffer.from(JSON.stringify({ points, displacementUnit: 'nm' }));
    let req!: ClientRequest;
    const response = new Promise<{ status: number; body: { n?: number; gainNmPerV?: number }; connection?: string }>((resolve, reject) => {
      req = httpRequest(
        {
          host: '127.0.0.1',
          port: server.port,
          path: '/api/workbench/fit',
          method: 'POST',
          headers: { 'content-type': 'application/json', 'content-length': payload.length },
        },
        (res: IncomingMessage) => {
          let text = '';
          res.setEncoding('utf8');
          res.on('data', (c: string) => {
            text += c;
          });
          res.on('end', () => resolve({ status: res.statusCode!, body: JSON.parse(text), connection: res.headers.connection }));
        },
      );
      req.on('error', reject);
    });
    const half = Math.floor(payload.length / 2);
    await new Promise<void>((r) => req.write(payload.subarray(0, half), () => r()));
    // In flight means the server process has accepted the connection and read all of the first half.
    await waitFor(() => serverHasRead(server.port, req.socket!.localPort!), { what: 'the server to read the first half' });

    const signalledAt = Date.now();
    server.child.kill('SIGTERM');
    await server.waitForOutput(/"msg":"shutting down"/);

    // No new connections once shutting down.
    const refused = await new Promise<string>((resolve) => {
      const s = connect(server.port, '127.0.0.1');
      s.once('connect', () => {
        s.destroy();
        resolve('connected');
      });
      s.once('error', (err: NodeJS.ErrnoException) => resolve(err.code ?? String(err)));
    });
    expect(refused).toBe('ECONNREFUSED');
    expect(server.child.exitCode).toBeNull();

    // The in-flight request completes normally.
    req.end(payload.subarray(half));
    const res = await response;
    expect(res.status).toBe(200);
    expect(res.body.n).toBe(100_000);
    expect(res.body.gainNmPerV).toBeCloseTo(42.5, 1);

    const exit = await server.exited;
    expect(exit).toEqual({ code: 0, signal: null });
    expect(Date.now() - signalledAt).toBeLessThan(10_000);
    expect(server.output()).not.toMatch(/forced exit/);
    // The pool said goodbye (COM_QUIT) instead of dropping its connections.
    await waitFor(() => appConnections() === 0, { timeoutMs: 2000, what: 'the pool to close its connections' });
    expect(appConnections()).toBe(0);
    expect(globalStatus('Aborted_clients')).toBe(abortedBefore);
  }, 90_000);
});

describe('two instances on two ports over one database', () => {
  let a: RunningServer;
  let b: RunningServer;
  beforeAll(async () => {
    [a, b] = await Promise.all([startServer(), startServer()]);
  }, 90_000);

  test('when a maker signs in on A, then the same session cookie is that maker on B', async () => {
    const login = uniqueLogin();
    const onA = await signInAt(a, login);
    const onB = { ...onA, base: b.base };
    const session = await api(onB, 'GET', '/api/session');
    expect(session).toMatchObject({ status: 200, body: { user: { login }, csrfToken: onA.csrf } });
    // And a write with that cookie and token is accepted by B.
    const created = await api(onB, 'POST', '/api/builds', {
      title: 'Made on B',
      instrumentKind: 'tunnelling-microscope',
      summary: 'Signed in on A.',
    });
    expect(created).toMatchObject({ status: 201, body: { title: 'Made on B', status: 'draft' } });
    expect(await api(onA, 'GET', `/api/builds/${created.body.id}`)).toMatchObject({
      status: 200,
      body: { id: created.body.id, title: 'Made on B' },
    });
  });

  test('when a moderator publishes on B a build submitted on A, then A shows it published', async () => {
    const moderatorLogin = uniqueLogin('mod');
    await createUser({ login: moderatorLogin, role: 'moderator' });
    const maker = await signInAt(a, uniqueLogin());
    const moderator = await signInAt(b, moderatorLogin);

    const build = await api(maker, 'POST', '/api/builds', {
      title: 'Two-instance build',
      instrumentKind: 'profilometer',
      summary: 'Submitted on A.',
    });
    expect(build.status).toBe(201);
    expect(await api(maker, 'POST', `/api/builds/${build.body.id}/submit`)).toMatchObject({ status: 200, body: { status: 'submitted' } });
    const queue = await api(moderator, 'GET', '/api/review/queue');
    expect(JSON.stringify(queue.body)).toContain('Two-instance build');

    expect(await api(moderator, 'POST', `/api/review/builds/${build.body.id}/decision`, { decision: 'publish' })).toMatchObject({
      status: 200,
      body: { id: build.body.id, status: 'published' },
    });
    expect(await api({ base: a.base }, 'GET', `/api/builds/${build.body.id}`)).toMatchObject({
      status: 200,
      body: { status: 'published' },
    });
    const list = await api({ base: a.base }, 'GET', '/api/builds?q=Two-instance');
    expect(list.body.items.map((i: { id: number }) => i.id)).toContain(build.body.id);
  });

  test('when the maker signs out on B, then the cookie is signed out on A too', async () => {
    const login = uniqueLogin();
    const onA = await signInAt(a, login);
    const out = await fetch(`${b.base}/auth/logout`, { method: 'POST', headers: { cookie: onA.cookie, 'x-csrf-token': onA.csrf } });
    expect(out.status).toBe(200);
    expect(await api(onA, 'GET', '/api/session')).toMatchObject({ status: 200, body: { user: null } });
  });
});
