// Operations faults against the real server process (`node --import tsx server/index.ts`) and a private MariaDB:
// SIGTERM under keep-alive load (drain), and the outbox with two instances on one database, a relay that hangs
// and comes back, and a claim left by an instance that died.
import { mkdtempSync, rmSync } from 'node:fs';
import { Agent, request as httpRequest } from 'node:http';
import { connect, createServer, type Server as NetServer, type Socket } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Sequelize } from 'sequelize';
import { createSequelize } from '../../server/db/sequelize.ts';
import { initModels } from '../../server/models/index.ts';
import { OutboxMail } from '../../server/models/outbox-mail.model.ts';
import { startSmtpCatcher, type SmtpCatcher } from '../../server/dev/smtp-catcher.ts';
import { uniqueLogin } from '../support/factories.ts';
import { startPrivateMariaDb, type PrivateMariaDb } from '../support/private-mariadb.ts';
import { startServerProcess, type RunningServer } from '../support/server-process.ts';
import { waitFor } from '../support/wait-for.ts';

const SESSION_SECRET = 'operations-faults-session-secret-012345';
const START_TIMEOUT_MS = 45_000;

let db: PrivateMariaDb;
let sequelize: Sequelize;
let uploads: string;
const servers: RunningServer[] = [];

/** Spawn the real server on free ports against the private database; `env` adds or overrides variables. */
async function startServer(env: Record<string, string> = {}): Promise<RunningServer> {
  const server = await startServerProcess({ db, uploads, sessionSecret: SESSION_SECRET, env, startTimeoutMs: START_TIMEOUT_MS });
  servers.push(server);
  return server;
}

const sidOf = (res: Response) =>
  res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .find((c) => c.startsWith('scanwright.sid='));

/** Sign in through the instance's own OAuth stand-in; the cookie and CSRF token of the new session. */
async function signInAt(server: RunningServer, login: string): Promise<{ cookie: string; csrf: string }> {
  const start = await fetch(`${server.base}/auth/github?login=${login}`, { redirect: 'manual' });
  let cookie = sidOf(start) ?? '';
  const atProvider = await fetch(start.headers.get('location')!, { redirect: 'manual' });
  const done = await fetch(atProvider.headers.get('location')!, { redirect: 'manual', headers: { cookie } });
  cookie = sidOf(done) ?? cookie;
  const session = await (await fetch(`${server.base}/api/session`, { headers: { cookie } })).json();
  expect(session.user?.login).toBe(login);
  return { cookie, csrf: session.csrfToken };
}

beforeAll(async () => {
  db = await startPrivateMariaDb({ database: 'scanwright_faults_operations' });
  sequelize = createSequelize(db.db);
  initModels(sequelize);
  uploads = mkdtempSync(join(tmpdir(), 'scanwright-operations-uploads-'));
}, 60_000);

afterAll(async () => {
  await Promise.all(servers.map((s) => s.stop()));
  await sequelize?.close();
  await db?.destroy();
  if (uploads) rmSync(uploads, { recursive: true, force: true });
});

interface Outcome {
  what: string;
  status: number;
  code?: string;
  connection?: string;
  error?: string;
  sentAt: number;
  doneAt: number;
  id?: number;
}

describe('SIGTERM under keep-alive load', () => {
  test('then ready turns 503, every request in flight completes, acknowledged writes are stored once, and the process exits 0 within 10 s', async () => {
    const server = await startServer();
    const login = uniqueLogin('drain');
    const maker = await signInAt(server, login);
    const agent = new Agent({ keepAlive: true, maxSockets: 16 });
    const title = `Drain ${Date.now()}`;

    const call = (what: string, method: string, path: string, body?: unknown): Promise<Outcome> => {
      const sentAt = Date.now();
      const payload = body === undefined ? undefined : JSON.stringify(body);
      const headers: Record<string, string> = { accept: 'application/json' };
      if (payload) Object.assign(headers, { 'content-type': 'application/json', cookie: maker.cookie, 'x-csrf-token': maker.csrf });
      return new Promise((resolve) => {
        const req = httpRequest({ host: '127.0.0.1', port: server.port, path, method, headers, agent }, (res) => {
          let text = '';
          res.setEncoding('utf8');
          res.on('data', (c: string) => (text += c));
          res.on('end', () => {
            let parsed: { id?: number; error?: { code?: string } } = {};
            try {
              parsed = JSON.parse(text);
            } catch {
              /* not JSON */
            }
            resolve({
              what,
              status: res.statusCode!,
              code: parsed.error?.code,
              id: parsed.id,
              connection: res.headers.connection,
              sentAt,
              doneAt: Date.now(),
            });
          });
          res.on('error', (err: NodeJS.ErrnoException) =>
            resolve({ what, status: -1, error: err.code ?? err.message, sentAt, doneAt: Date.now() }),
          );
        });
        req.on('error', (err: NodeJS.ErrnoException) =>
          resolve({ what, status: -1, error: err.code ?? err.message, sentAt, doneAt: Date.now() }),
        );
        req.end(payload);
      });
    };

    const log: Outcome[] = [];
    let n = 0;
    const worker = async (w: number) => {
      for (let i = 0; ; i++) {
        const kind = (w + i) % 4;
        const o =
          kind === 0
            ? await call('create-build', 'POST', '/api/builds', {
                title: `${title} #${n++}`,
                instrumentKind: 'profilometer',
                summary: 'Under drain.',
              })
            : kind === 1
              ? await call('ready', 'GET', '/api/ready')
              : kind === 2
                ? await call('parts', 'GET', '/api/parts?gainMin=1')
                : await call('builds', 'GET', '/api/builds');
        log.push(o);
        // Once the listener is closed a new connection is refused: that request was never accepted, the loop ends.
        if (o.error) return;
      }
    };
    const workers = Array.from({ length: 16 }, (_, w) => worker(w));
    await waitFor(() => log.filter((o) => o.status === 201).length >= 10 && log.length >= 100, {
      timeoutMs: 20_000,
      what: 'some load before the signal',
    });

    // A request whose headers are half sent: in flight (begun) when the signal arrives, finished afterwards.
    const raw: Socket = connect(server.port, '127.0.0.1');
    await new Promise((r) => raw.once('connect', r));
    let rawAnswer = '';
    raw.setEncoding('utf8');
    raw.on('data', (c: string) => (rawAnswer += c));
    const rawClosed = new Promise((r) => raw.once('close', r));
    raw.write('GET /api/ready HTTP/1.1\r\nHost: 127.0.0.1\r\n');
    await new Promise((r) => setTimeout(r, 100));

    const signalledAt = Date.now();
    server.child.kill('SIGTERM');
    await server.waitForOutput(/"msg":"shutting down"/);
    raw.write('\r\n');
    const exit = await server.exited;
    const drainMs = Date.now() - signalledAt;
    await Promise.all(workers);
    await rawClosed;
    agent.destroy();

    // Ready said 503 draining to the request that finished after the signal, and closed its connection.
    expect(rawAnswer).toMatch(/^HTTP\/1\.1 503 /);
    expect(rawAnswer).toMatch(/\r\nconnection: close\r\n/i);
    expect(rawAnswer).toContain('"code":"draining"');

    // Nothing cut: every request either got its whole answer, or was refused a new connection after the listener closed.
    const failures = log.filter((o) => o.error);
    expect(
      failures.filter((o) => o.error !== 'ECONNREFUSED'),
      JSON.stringify(failures.slice(0, 5)),
    ).toEqual([]);
    expect(failures.every((o) => o.sentAt >= signalledAt)).toBe(true);
    const answered = log.filter((o) => !o.error);
    for (const o of answered) {
      if (o.what === 'ready' && o.status === 503) expect(o.code).toBe('draining');
      else expect([200, 201], `${o.what} ${o.status} ${o.code}`).toContain(o.status);
    }
    const afterSignal = answered.filter((o) => o.doneAt >= signalledAt);
    expect(afterSignal.length).toBeGreaterThan(0);
    expect(afterSignal.filter((o) => o.sentAt >= signalledAt + 50).every((o) => o.connection === 'close')).toBe(true);

    // Every acknowledged build is stored exactly once, and nothing unacknowledged slipped in.
    const acked = answered.filter((o) => o.status === 201).map((o) => o.id!);
    const [rows] = await sequelize.query(`SELECT id FROM builds WHERE title LIKE '${title} #%'`);
    expect((rows as { id: number }[]).map((r) => r.id).sort((a, b) => a - b)).toEqual([...acked].sort((a, b) => a - b));

    expect(exit).toEqual({ code: 0, signal: null });
    expect(drainMs).toBeLessThan(10_000);
    expect(server.output()).toMatch(/"msg":"drained; exiting"/);
    expect(server.output()).not.toMatch(/forced exit/);
    console.info(
      `[measured] drain under keep-alive load (16 connections): ${drainMs} ms from SIGTERM to exit 0; ` +
        `${afterSignal.length} answers after the signal, ${failures.length} refused new connections, ${acked.length} builds acknowledged`,
    );
  }, 60_000);
});

/** A TCP stand-in for the relay: `hang` accepts and never answers; `up` pipes to the real catcher. */
async function relayProxy(target: number): Promise<{ port: number; mode: 'hang' | 'up'; close(): Promise<void> }> {
  const sockets = new Set<Socket>();
  const state = { mode: 'hang' as 'hang' | 'up' };
  const server: NetServer = createServer((client) => {
    sockets.add(client);
    client.on('close', () => sockets.delete(client));
    client.on('error', () => undefined);
    if (state.mode === 'hang') return;
    const upstream = connect(target, '127.0.0.1');
    sockets.add(upstream);
    upstream.on('close', () => sockets.delete(upstream));
    upstream.on('error', () => client.destroy());
    client.pipe(upstream).pipe(client);
  });
  await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
  const port = (server.address() as { port: number }).port;
  return {
    port,
    get mode() {
      return state.mode;
    },
    set mode(m) {
      state.mode = m;
    },
    async close() {
      for (const s of sockets) s.destroy();
      await new Promise((r) => server.close(r));
    },
  };
}

const queueMails = (subjectPrefix: string, count: number) =>
  OutboxMail.bulkCreate(
    Array.from({ length: count }, (_, i) => ({
      toAddress: `reader-${i}@example.org`,
      subject: `${subjectPrefix} ${i}`,
      textBody: 'A mail of the outbox fault test.',
      htmlBody: '<p>A mail of the outbox fault test.</p>',
      nextAttemptAt: new Date(),
    })),
  );

describe('the outbox with two instances on one database', () => {
  let catcher: SmtpCatcher;
  let relay: Awaited<ReturnType<typeof relayProxy>>;
  let a: RunningServer;
  let b: RunningServer;
  const bySubject = (prefix: string) => {
    const counts = new Map<string, number>();
    for (const m of catcher.messages) if (m.subject.startsWith(prefix)) counts.set(m.subject, (counts.get(m.subject) ?? 0) + 1);
    return counts;
  };

  beforeAll(async () => {
    catcher = await startSmtpCatcher(0, null);
    relay = await relayProxy(Number(new URL(catcher.smtpUrl).port));
    relay.mode = 'up';
    const env = { SMTP_URL: `smtp://127.0.0.1:${relay.port}`, SMTP_TIMEOUT_S: '2', OUTBOX_LEASE_S: '4' };
    [a, b] = await Promise.all([startServer(env), startServer(env)]);
  }, 60_000);
  afterAll(async () => {
    await Promise.all([a?.stop(), b?.stop()]);
    await relay?.close();
    await catcher?.close();
  });

  test('when 300 mails are queued with the relay up, then both instances send, and each mail is delivered exactly once', async () => {
    const prefix = `Two instances ${Date.now()}`;
    await queueMails(prefix, 300);
    // Which instance holds claims while the backlog drains (claimed_by is `<host>:<pid>:<random>`).
    const holders = new Set<string>();
    const started = Date.now();
    await waitFor(
      async () => {
        const [rows] = await sequelize.query('SELECT DISTINCT claimed_by AS holder FROM mail_outbox WHERE claimed_by IS NOT NULL');
        for (const r of rows as { holder: string }[]) holders.add(r.holder.split(':')[1]!);
        return (await OutboxMail.count({ where: { sentAt: null } })) === 0;
      },
      { timeoutMs: 45_000, intervalMs: 10, what: 'every mail sent' },
    );
    const drainedMs = Date.now() - started;
    await new Promise((r) => setTimeout(r, 500));
    const counts = bySubject(prefix);
    expect(counts.size).toBe(300);
    expect([...counts.values()].filter((n) => n > 1)).toEqual([]);
    expect(catcher.messages.filter((m) => m.subject.startsWith(prefix))).toHaveLength(300);
    expect([...holders].sort()).toEqual([String(a.child.pid), String(b.child.pid)].sort());
    console.info(`[measured] 300 mails over two instances: all sent once in ${drainedMs} ms (including up to 5 s until the first pass)`);
  }, 60_000);

  test('when the relay hangs (accepts, never answers) and comes back, then every mail is delivered once, soon after', async () => {
    const prefix = `Hanging relay ${Date.now()}`;
    relay.mode = 'hang';
    await queueMails(prefix, 20);
    // Both instances try, time out after 2 s and pause sending; the mails tried wait with a backoff of 30 s or more.
    await Promise.all([a.waitForOutput(/mail relay not answering/, 20_000), b.waitForOutput(/mail relay not answering/, 20_000)]);
    expect(bySubject(prefix).size).toBe(0);
    // The mails tried wait out a backoff (the warning is logged just before the row is updated).
    await waitFor(
      async () => {
        const [[{ tried }]] = (await sequelize.query(
          `SELECT COUNT(*) AS tried FROM mail_outbox WHERE subject LIKE '${prefix}%' AND attempts > 0 AND next_attempt_at > NOW()`,
        )) as [[{ tried: number }], unknown];
        return Number(tried) > 0;
      },
      { timeoutMs: 5000, what: 'mails waiting out a backoff' },
    );

    relay.mode = 'up';
    const backAt = Date.now();
    await waitFor(async () => bySubject(prefix).size === 20, { timeoutMs: 30_000, what: 'all 20 delivered after the relay came back' });
    const deliveredMs = Date.now() - backAt;
    await waitFor(async () => (await OutboxMail.count({ where: { sentAt: null } })) === 0, { timeoutMs: 10_000, what: 'rows marked sent' });
    await new Promise((r) => setTimeout(r, 500));
    expect([...bySubject(prefix).values()].filter((n) => n > 1)).toEqual([]);
    expect(`${a.output()}${b.output()}`).toMatch(/mail relay answers again; backoff reset/);
    console.info(`[measured] relay back → all 20 waiting mails delivered once in ${deliveredMs} ms (SMTP timeouts 2 s, backoff reset)`);
  }, 60_000);

  test('when an instance died holding a claim, then another instance sends the mail once after the lease expires', async () => {
    const prefix = `Orphaned claim ${Date.now()}`;
    const [mail] = await queueMails(prefix, 1);
    // What an instance killed right after claiming leaves behind: its id and a 4 s lease, no sent_at.
    await sequelize.query(
      `UPDATE mail_outbox SET claimed_by = 'dead-host:1:00000000', claimed_until = NOW() + INTERVAL 4 SECOND WHERE id = ${mail!.id}`,
    );
    const [[{ until }]] = (await sequelize.query(`SELECT claimed_until AS until FROM mail_outbox WHERE id = ${mail!.id}`)) as [
      [{ until: Date }],
      unknown,
    ];
    await new Promise((r) => setTimeout(r, 1500));
    expect(bySubject(prefix).size).toBe(0);
    const caught = await catcher.waitFor((m) => m.subject === `${prefix} 0`, 20_000);
    const afterExpiryMs = new Date(caught.receivedAt).getTime() - new Date(until).getTime();
    await waitFor(async () => (await OutboxMail.findByPk(mail!.id))?.sentAt, { timeoutMs: 5000, what: 'the orphaned mail marked sent' });
    await new Promise((r) => setTimeout(r, 500));
    expect(afterExpiryMs).toBeGreaterThanOrEqual(-1000);
    expect(bySubject(prefix).get(`${prefix} 0`)).toBe(1);
    console.info(
      `[measured] an expired claim (4 s lease) was picked up and sent ${afterExpiryMs} ms after it expired (worker interval 5 s)`,
    );
  }, 60_000);
});
