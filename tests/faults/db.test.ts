// Database faults: MariaDB is stopped (SIGTERM) while decisions, writes and reads are in flight,
// then started again on the same data directory. Runs against a private MariaDB, never the shared one.
import { request as httpRequest, type Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn } from '../support/login.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { startPrivateMariaDb, type PrivateMariaDb } from '../support/private-mariadb.ts';
import { keepAliveAgent } from '../support/keep-alive-agent.ts';

const RESPONSE_BOUND_MS = 6000;
const RECOVERY_BOUND_MS = 8000;
const RUNS = 160;

interface Outcome {
  what: string;
  runId?: number;
  status: number;
  body: unknown;
  startedAt: number;
  ms: number;
}
interface Who {
  cookie: string;
  csrf: string;
}

const pause = (ms: number) => new Promise((r) => setTimeout(r, ms));
const isDbUnavailable = (o: Outcome) => o.status === 503 && (o.body as { error?: { code?: string } })?.error?.code === 'db_unavailable';

let db: PrivateMariaDb;
let t: TestApp;
let server: Server;
let port: number;

const agent = keepAliveAgent(32);

/** One request, bounded in time, with status, parsed body and duration. */
function call(what: string, path: string, opts: { method?: string; as?: Who; json?: unknown; runId?: number } = {}): Promise<Outcome> {
  const startedAt = Date.now();
  const payload = opts.json === undefined ? undefined : JSON.stringify(opts.json);
  const headers: Record<string, string> = { accept: 'application/json' };
  if (opts.as) Object.assign(headers, { cookie: opts.as.cookie, 'x-csrf-token': opts.as.csrf });
  if (payload) Object.assign(headers, { 'content-type': 'application/json', 'content-length': String(Buffer.byteLength(payload)) });
  return new Promise((resolve) => {
    const done = (status: number, body: unknown) =>
      resolve({ what, runId: opts.runId, status, body, startedAt, ms: Date.now() - startedAt });
    const req = httpRequest({ host: '127.0.0.1', port, path, method: opts.method ?? 'GET', headers, agent }, (res) => {
      let text = '';
      res.setEncoding('utf8');
      res.on('data', (c: string) => {
        text += c;
      });
      res.on('end', () => {
        try {
          done(res.statusCode ?? -1, JSON.parse(text));
        } catch {
          done(res.statusCode ?? -1, text);
        }
      });
      res.on('error', (err) => done(-1, `response error: ${err.message}`));
    });
    req.setTimeout(RESPONSE_BOUND_MS + 2000, () => req.destroy(new Error('no answer in time')));
    req.on('error', (err) => done(-1, `request error: ${err.message}`));
    req.end(payload);
  });
}

async function sessionOf(login: string): Promise<Who> {
  const agent = await signIn(t, login);
  const res = await agent.get('/api/session').expect(200);
  return { cookie: res.request.cookies as unknown as string, csrf: agent.csrf };
}

beforeAll(async () => {
  db = await startPrivateMariaDb({ database: 'scanwright_faults_db' });
  t = await startTestApp({ db: db.db });
  server = t.app.listen(0, '127.0.0.1');
  await new Promise((r) => server.once('listening', r));
  port = (server.address() as AddressInfo).port;
});

afterAll(async () => {
  server?.closeAllConnections();
  await new Promise((r) => (server ? server.close(r) : r(undefined)));
  await t?.close();
  await db?.destroy();
  agent.destroy();
});

describe('when MariaDB stops under load and starts again', () => {
  let maker: Who;
  let moderator: Who;
  let partIds: number[];
  let runIds: number[];
  let scenario: Outcome[];
  let ackedBeforeFault: { runId: number; buildId: number };
  const at = { stop: 0, stopped: 0, restart: 0, up: 0, healthy: 0 };

  const decide = (runId: number, log: Outcome[]) =>
    call('decide-run', `/api/review/runs/${runId}/decision`, { method: 'POST', as: moderator, json: { decision: 'accept' }, runId }).then(
      (o) => (log.push(o), o),
    );
  const createDraft = (n: number, log: Outcome[]) =>
    call('create-build', '/api/builds', {
      method: 'POST',
      as: maker,
      json: { title: `Fault draft ${n}`, instrumentKind: 'profilometer', summary: 'Written while the database was failing.' },
    }).then((o) => (log.push(o), o));

  beforeAll(async () => {
    const owner = await createUser();
    maker = await sessionOf(owner.login);
    moderator = await sessionOf((await createUser({ role: 'moderator' })).login);
    const build = await createBuildRow(owner.id, { status: 'published' });
    partIds = (await Promise.all([0, 1, 2].map(() => createPart()))).map((p) => p.id).sort((a, b) => a - b);
    runIds = [];
    for (let i = 0; i < RUNS; i++)
      runIds.push((await createRunRow({ buildId: build.id, partId: partIds[i % 3], ownerId: owner.id, gainNmPerV: 60 + i })).id);

    const log: Outcome[] = [];
    // Acknowledged before the fault: one decision and one new build.
    const ackRun = await decide(runIds[0], log);
    const ackBuild = await createDraft(0, log);
    if (ackRun.status !== 200 || ackBuild.status !== 201) throw new Error(`setup writes failed: ${JSON.stringify([ackRun, ackBuild])}`);
    ackedBeforeFault = { runId: runIds[0], buildId: (ackBuild.body as { id: number }).id };

    // The load: four moderators' worth of decisions, a maker writing drafts, readers, a health poller.
    let running = true;
    const queue = runIds.slice(1);
    const decider = async () => {
      while (running) {
        const id = queue.shift();
        if (id === undefined) await pause(20);
        else await decide(id, log);
        await pause(15);
      }
    };
    let draftNo = 1;
    const writer = async () => {
      while (running) {
        await createDraft(draftNo++, log);
        await pause(25);
      }
    };
    const reader = async () => {
      while (running) {
        for (const [what, path, as] of [
          ['read-build', `/api/builds/${build.id}`],
          ['read-parts', '/api/parts?gainMin=10&gainMax=500'],
          ['read-session', '/api/session', maker],
          ['visitor-session', '/api/session'],
        ] as const) {
          log.push(await call(what, path, { as }));
        }
        await pause(10);
      }
    };
    const health = async () => {
      while (running) {
        log.push(await call('health', '/api/health'));
        await pause(50);
      }
    };
    const workers = [decider(), decider(), decider(), decider(), writer(), reader(), reader(), health()];

    // Let some decisions be acknowledged first (at least 600 ms of load, longer on a slow machine).
    const acked = () => log.filter((o) => o.what === 'decide-run' && o.status === 200).length;
    const loadStart = Date.now();
    while (Date.now() - loadStart < 600 || (acked() < 4 && Date.now() - loadStart < 20_000)) await pause(25);
    at.stop = Date.now();
    await db.stop();
    at.stopped = Date.now();
    // Down for at least 1.5 s and until enough answers have come back from the outage (slow machines).
    const answeredDuringOutage = (health: boolean) =>
      log.filter((o) => o.startedAt >= at.stopped && (o.what === 'health') === health).length;
    while (
      Date.now() - at.stopped < 1500 ||
      ((answeredDuringOutage(true) < 5 || answeredDuringOutage(false) < 25) && Date.now() - at.stopped < 20_000)
    )
      await pause(50);
    at.restart = Date.now();
    await db.start();
    at.up = Date.now();
    // The app must find its way back by itself while the load keeps running.
    while (!at.healthy && Date.now() - at.up < RECOVERY_BOUND_MS + 10_000) {
      const ok = log.find((o) => o.what === 'health' && o.startedAt >= at.up && o.status === 200);
      if (ok) at.healthy = ok.startedAt + ok.ms;
      await pause(25);
    }
    // And some load after recovery, to see it served normally.
    const okAfter = () => log.filter((o) => at.healthy && o.startedAt > at.healthy + 200 && o.status < 300).length;
    const recovered = Date.now();
    while (Date.now() - recovered < 600 || (okAfter() < 10 && Date.now() - recovered < 20_000)) await pause(25);
    running = false;
    await Promise.all(workers);
    scenario = log;
  }, 150_000);

  test('then requests were in flight when mariadbd got SIGTERM, and kept coming while it was down', () => {
    expect(scenario.filter((o) => o.startedAt <= at.stop && o.startedAt + o.ms >= at.stop).length).toBeGreaterThan(0);
    expect(scenario.filter((o) => o.startedAt >= at.stopped && o.startedAt < at.restart).length).toBeGreaterThan(20);
  });

  test('then every response is a success or a 503 in the error shape, each within 6 s (no hang, no 500, no cut connection)', () => {
    const bad = scenario.filter((o) => {
      if (o.ms > RESPONSE_BOUND_MS) return true;
      if (o.status >= 200 && o.status < 300) return false;
      if (o.what === 'health') return !(o.status === 503 && (o.body as { db?: string })?.db === 'down');
      return !isDbUnavailable(o);
    });
    expect(bad).toEqual([]);
  });

  test('then /api/health and every database route answer 503 while MariaDB is stopped', () => {
    const during = scenario.filter((o) => o.startedAt >= at.stopped && o.startedAt + o.ms < at.restart);
    const health = during.filter((o) => o.what === 'health');
    expect(health.length).toBeGreaterThanOrEqual(5);
    for (const o of health) expect(o).toMatchObject({ status: 503, body: { status: 'degraded', db: 'down' } });
    const rest = during.filter((o) => o.what !== 'health');
    expect(rest.length).toBeGreaterThanOrEqual(20);
    expect(rest.filter((o) => !isDbUnavailable(o))).toEqual([]);
  });

  test('then the app recovers on its own within seconds of MariaDB answering again', async () => {
    expect(at.healthy).toBeGreaterThan(0);
    expect(at.healthy - at.up).toBeLessThan(RECOVERY_BOUND_MS);
    const after = scenario.filter((o) => o.startedAt > at.healthy + 200);
    expect(after.length).toBeGreaterThan(0);
    expect(after.filter((o) => o.status >= 300)).toEqual([]);
    const write = await createDraft(9999, []);
    expect(write).toMatchObject({ status: 201, body: { title: 'Fault draft 9999', status: 'draft' } });
  });

  test('then writes acknowledged before the fault are still there', async () => {
    expect(await call('check', `/api/runs/${ackedBeforeFault.runId}`)).toMatchObject({
      status: 200,
      body: { id: ackedBeforeFault.runId, status: 'accepted' },
    });
    expect(await call('check', `/api/builds/${ackedBeforeFault.buildId}`, { as: maker })).toMatchObject({
      status: 200,
      body: { id: ackedBeforeFault.buildId, title: 'Fault draft 0' },
    });
  });

  test('then every acknowledged write is stored, and a failed decision left no partial rows', async () => {
    const q = <T>(sql: string) => t.handle.sequelize.query(sql, { type: 'SELECT' }) as Promise<T[]>;
    const ids = runIds.join(',');
    const runs = await q<{ id: number; status: string; part_id: number }>(
      `SELECT id, status, part_id FROM calibration_runs WHERE id IN (${ids})`,
    );
    const audits = await q<{ target_id: number; n: number }>(
      `SELECT target_id, COUNT(*) AS n FROM audit_entries WHERE target_type = 'run' AND action = 'run.accept' AND target_id IN (${ids}) GROUP BY target_id`,
    );
    const auditCount = new Map(audits.map((a) => [Number(a.target_id), Number(a.n)]));
    const status = new Map(runs.map((r) => [r.id, r.status]));

    // 200 / 201 means committed.
    const acked = scenario.filter((o) => o.what === 'decide-run' && o.status === 200).map((o) => o.runId!);
    expect(acked.length).toBeGreaterThan(3);
    expect(acked.filter((id) => status.get(id) !== 'accepted')).toEqual([]);
    const created = scenario.filter((o) => o.what === 'create-build' && o.status === 201).map((o) => (o.body as { id: number }).id);
    const [{ n: stored }] = await q<{ n: number }>(`SELECT COUNT(*) AS n FROM builds WHERE id IN (${created.join(',')})`);
    expect(Number(stored)).toBe(created.length);

    // A decision is all or nothing: run status, audit entry, queued mail and part statistics together.
    expect(runs.filter((r) => (auditCount.get(r.id) ?? 0) !== (r.status === 'accepted' ? 1 : 0))).toEqual([]);
    const accepted = runs.filter((r) => r.status === 'accepted').length;
    const [{ n: mails }] = await q<{ n: number }>("SELECT COUNT(*) AS n FROM mail_outbox WHERE subject LIKE 'Calibration run accepted%'");
    expect(Number(mails)).toBe(accepted);
    const parts = await q<{ id: number; accepted_run_count: number }>(
      `SELECT id, accepted_run_count FROM parts WHERE id IN (${partIds.join(',')}) ORDER BY id`,
    );
    expect(parts.map((p) => [p.id, p.accepted_run_count])).toEqual(
      partIds.map((id) => [id, runs.filter((r) => r.part_id === id && r.status === 'accepted').length]),
    );

    // What failed can simply be decided again now (409 not_waiting when it had committed after all).
    const failed = scenario.filter((o) => o.what === 'decide-run' && o.status !== 200).map((o) => o.runId!);
    expect(failed.length).toBeGreaterThan(0);
    for (const id of runIds.filter((i) => !acked.includes(i))) {
      const again = await decide(id, []);
      if (again.status !== 200)
        expect([id, again.status, (again.body as { error: { code: string } }).error.code]).toEqual([id, 409, 'not_waiting']);
    }
    const final = await q<{ n: number }>(`SELECT SUM(accepted_run_count) AS n FROM parts WHERE id IN (${partIds.join(',')})`);
    expect(Number(final[0].n)).toBe(RUNS);
  });
});

describe('when moderators decide several runs of one part at the same moment', () => {
  test('then every decision succeeds (no deadlock surfacing as 500) and the part counts them all', async () => {
    const owner = await createUser();
    const moderator = await sessionOf((await createUser({ role: 'moderator' })).login);
    const build = await createBuildRow(owner.id, { status: 'published' });
    const part = await createPart();
    const runs = await Promise.all(
      Array.from({ length: 12 }, (_, i) => createRunRow({ buildId: build.id, partId: part.id, ownerId: owner.id, gainNmPerV: 50 + i })),
    );
    const res = await Promise.all(
      runs.map((r) =>
        call('decide-run', `/api/review/runs/${r.id}/decision`, { method: 'POST', as: moderator, json: { decision: 'accept' } }),
      ),
    );
    expect(res.filter((r) => r.status !== 200).map((r) => [r.status, r.body])).toEqual([]);
    expect(await call('part', `/api/parts/${part.id}`)).toMatchObject({ status: 200, body: { stats: { acceptedRunCount: 12 } } });
  });
});

describe('when a maker sends several messages on one listing at the same moment', () => {
  async function listingOf(ownerId: number) {
    const { Listing } = await import('../../server/models/listing.model.ts');
    return Listing.create({
      ownerId,
      partId: (await createPart()).id,
      kind: 'offering',
      quantity: 1,
      condition: 'salvaged-tested',
      priceKind: 'free',
      region: 'Utrecht',
      notes: 'Concurrency.',
    });
  }
  const send = (as: Who, listingId: number, i: number) =>
    call('message', `/api/listings/${listingId}/messages`, { method: 'POST', as, json: { body: `Message ${i}` } });

  test('then every message is stored in one thread, for a new conversation and for an existing one', async () => {
    const { Message, MessageThread } = await import('../../server/models/message.model.ts');
    const owner = await createUser();
    const maker = await createUser();
    const as = await sessionOf(maker.login);
    const listing = await listingOf(owner.id);
    const first = await Promise.all([0, 1, 2, 3, 4].map((i) => send(as, listing.id, i)));
    expect(first.map((r) => r.status)).toEqual([201, 201, 201, 201, 201]);
    const again = await Promise.all([5, 6, 7, 8, 9, 10, 11, 12].map((i) => send(as, listing.id, i)));
    expect(again.map((r) => r.status)).toEqual(again.map(() => 201));
    const threads = await MessageThread.findAll({ where: { listingId: listing.id } });
    expect(threads).toHaveLength(1);
    expect(await Message.count({ where: { threadId: threads[0].id } })).toBe(13);
  });
});
