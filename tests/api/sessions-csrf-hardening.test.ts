// Sessions, cross-origin requests, CORS and rate limits across the whole route table.
// The session id changing at sign-in is checked in tests/api/sign-in.test.ts ("when signing in,
// then the session id changes"); a missing, wrong or foreign CSRF token on every state-changing
// route, and a visitor's 401, in tests/api/authorization-matrix.test.ts.
import { afterAll, describe, expect, test } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createBuildRow, createPart, createUser } from '../support/factories.ts';
import { listRoutes, SIGNED_LINK_ROUTES, stateChangingRoutes, fillPath, type RouteEntry } from '../support/route-table.ts';
import { actorPool, armed, send, sessionCookie, sessionRows, sidOf } from '../support/matrix-fixtures.ts';
import { expectError } from '../support/expect-error.ts';
import { User } from '../../server/models/user.model.ts';
import { Listing } from '../../server/models/listing.model.ts';
import { Message } from '../../server/models/message.model.ts';
import { Report } from '../../server/models/report.model.ts';

const uploadsDir = mkdtempSync(join(tmpdir(), 'scanwright-hardening-'));
const t = await startTestApp({ uploadsDir });
afterAll(async () => {
  await t.close();
  rmSync(uploadsDir, { recursive: true, force: true });
});

const routes = stateChangingRoutes(t.app);
const EVIL = 'http://evil.example';

const pool = actorPool(t);
const signedIn = (role: 'maker' | 'moderator' | 'admin' = 'maker') => pool.fresh(role);
async function armedFor(route: RouteEntry) {
  const { target, actor } = await armed(t, pool, route);
  return { actor, target, before: await target.state() };
}

describe('logout', () => {
  test('when a signed-in maker logs out, then the sessions row is deleted and the old cookie brings nothing back', async () => {
    const { user, agent } = await signedIn();
    const sid = sidOf(agent);
    expect(await sessionRows(t, { sid })).toBe(1);
    const cookie = sessionCookie(agent)!;
    await agent.post('/auth/logout').set('X-CSRF-Token', agent.csrf).expect(200);
    expect(await sessionRows(t, { sid })).toBe(0);
    expect(await sessionRows(t, { userId: user!.id })).toBe(0);
    const replay = await request(t.app).get('/api/session').set('Cookie', cookie);
    expect(replay.body.user).toBeNull();
    expect(await sessionRows(t, { sid })).toBe(0);
  });
});

describe('cross-origin requests', () => {
  // The one-click unsubscribe link is POSTed by mail providers' servers by design: tests/api/conversations.test.ts sends it with a foreign Origin.
  test('when routes are left out as signed links, then each of them exists', () => {
    expect([...SIGNED_LINK_ROUTES].every((k) => routes.some((r) => r.key === k))).toBe(true);
  });
  test.concurrent.each(routes.filter((r) => !SIGNED_LINK_ROUTES.has(r.key)))(
    'when $key comes from another origin (Origin, or Referer without Origin, or Origin null), then 403 cross_origin and nothing changes',
    async (route) => {
      const { actor, target, before } = await armedFor(route);
      const foreign: Array<Record<string, string>> = [
        { Origin: EVIL },
        { Referer: `${EVIL}/page` },
        { Origin: 'null' },
        { Referer: 'not a url' },
        { Origin: EVIL, Referer: `${t.config.publicUrl}/` },
      ];
      for (const headers of foreign) {
        const res = await send(route, target, actor.agent, { headers });
        expect(res.status, `${route.key} ${JSON.stringify(headers)}`).toBe(403);
        expect(res.body).toEqual({ error: { code: 'cross_origin', message: expect.any(String) } });
        expect(res.headers['access-control-allow-origin']).toBeUndefined();
      }
      expect(await target.state()).toEqual(before);
    },
  );

  test('when a write comes from our own origin (Origin or Referer) or names none, then it goes through', async () => {
    const { agent } = await signedIn();
    const body = { title: 'Same-origin build', instrumentKind: 'profilometer', summary: 'x' };
    for (const headers of [{ Origin: t.config.publicUrl }, { Referer: `${t.config.publicUrl}/builds/new` }, {}]) {
      let req = agent.post('/api/builds').set('X-CSRF-Token', agent.csrf);
      for (const [k, v] of Object.entries(headers)) req = req.set(k, v);
      expect((await req.send(body)).status).toBe(201);
    }
  });

  test('when a cross-origin write carries an oversized body, then it is refused as cross-origin before the body is read', async () => {
    const { agent } = await signedIn();
    const res = await agent
      .post('/api/builds')
      .set('X-CSRF-Token', agent.csrf)
      .set('Origin', EVIL)
      .send({ title: 'x'.repeat(2 * 1024 * 1024) });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('cross_origin');
  });
});

describe('CORS', () => {
  const corsHeaders = (res: request.Response) => Object.keys(res.headers).filter((h) => h.startsWith('access-control-'));

  test('when any route gets a CORS preflight from another origin, then no Access-Control-* header comes back', async () => {
    const { agent } = await signedIn();
    for (const route of listRoutes(t.app)) {
      const res = await agent
        .options(fillPath(route.path, new Proxy({}, { get: () => 1 })))
        .set('Origin', EVIL)
        .set('Access-Control-Request-Method', route.method)
        .set('Access-Control-Request-Headers', 'content-type, x-csrf-token');
      expect(corsHeaders(res), `OPTIONS ${route.path}`).toEqual([]);
      expect(res.status).toBeLessThan(500);
    }
  });

  test('when reads, writes and errors are requested with an Origin, then none carries Access-Control-Allow-Origin or -Credentials', async () => {
    const { agent } = await signedIn();
    const answers: Array<[string, request.Response]> = [
      ['GET /api/session', await agent.get('/api/session').set('Origin', EVIL)],
      ['GET /api/builds', await agent.get('/api/builds').set('Origin', EVIL)],
      ['GET /api/nope (404)', await agent.get('/api/nope').set('Origin', EVIL)],
      [
        'POST /api/builds (400)',
        await agent.post('/api/builds').set('Origin', t.config.publicUrl).set('X-CSRF-Token', agent.csrf).send({}),
      ],
      [
        'POST /api/workbench/convert',
        await agent.post('/api/workbench/convert').set('Origin', t.config.publicUrl).send({ value: 1, from: 'nm', to: 'um' }),
      ],
      ['GET /api/health', await request(t.app).get('/api/health').set('Origin', EVIL)],
    ];
    for (const [what, res] of answers) expect(corsHeaders(res), what).toEqual([]);
  });
});

describe('a suspended maker', () => {
  const write = (a: Agent) =>
    a.post('/api/builds').set('X-CSRF-Token', a.csrf).send({ title: 'After suspension', instrumentKind: 'other', summary: 'x' });

  test('when suspended by an admin, then the sessions are deleted, a write with the stale token is 403 csrf_failed, and with a fresh token 401', async () => {
    const { user, agent } = await signedIn();
    const admin = await signedIn('admin');
    await admin.agent
      .patch(`/api/admin/users/${user!.id}/suspension`)
      .set('X-CSRF-Token', admin.agent.csrf)
      .send({ suspended: true })
      .expect(200);
    expect(await sessionRows(t, { userId: user!.id })).toBe(0);
    const stale = await write(agent);
    expect(stale.status).toBe(403);
    expect(stale.body.error.code).toBe('csrf_failed');
    const session = await agent.get('/api/session');
    expect(session.body.user).toBeNull();
    agent.csrf = session.body.csrfToken;
    const fresh = await write(agent);
    expect(fresh.status).toBe(401);
    expect(fresh.body.error.code).toBe('unauthorized');
  });

  test.each([
    [
      "suspended behind the app's back (sessions left in place)",
      (u: User) => User.update({ suspendedAt: new Date() }, { where: { id: u.id } }),
    ],
    ['deleted', (u: User) => User.destroy({ where: { id: u.id } })],
  ])('when %s, then the next request ends the session the same way: row gone, stale token 403 csrf_failed', async (_what, change) => {
    const { user, agent } = await signedIn();
    const sid = sidOf(agent);
    await change(user!);
    expect(await sessionRows(t, { sid })).toBe(1);
    const stale = await write(agent);
    expect(stale.status).toBe(403);
    expect(stale.body.error.code).toBe('csrf_failed');
    expect(await sessionRows(t, { sid })).toBe(0);
    expect((await agent.get('/api/session')).body.user).toBeNull();
  });
});

describe('rate limits', () => {
  async function limitedApp<T>(run: (app: TestApp) => Promise<T>): Promise<T> {
    const limited = await startTestApp({ rateLimits: true, uploadsDir });
    try {
      return await run(limited);
    } finally {
      await limited.close();
      t.rebind();
    }
  }
  const rateLimited = { error: { code: 'rate_limited', message: expect.any(String) } };

  test('when sign-in is started more than 20 times a minute from one address, then 429 in the error shape', async () => {
    await limitedApp(async (limited) => {
      const statuses: number[] = [];
      for (let i = 0; i < 20; i++) statuses.push((await request(limited.app).get('/auth/github?login=someone')).status);
      expect(statuses.every((s) => s === 302)).toBe(true);
      const res = await request(limited.app).get('/auth/github?login=someone');
      expect(res.status).toBe(429);
      expect(res.body).toEqual(rateLimited);
      expect(res.headers.location).toBeUndefined();
    });
  });

  test('when one address sends more than 10 workbench bodies over 1 MB a minute, then 429 before the body is read; small calculations go on', async () => {
    await limitedApp(async (limited) => {
      // 40 000 points of a clean 2 nm/V line: about 2 MB of JSON, a valid fit.
      const big = {
        displacementUnit: 'nm',
        points: Array.from({ length: 40_000 }, (_, i) => ({ volts: i / 100, displacement: (2 * i) / 100 })),
      };
      const small = { displacementUnit: 'nm', points: [0, 1, 2, 3, 4, 5].map((v) => ({ volts: v, displacement: 2 * v })) };
      expect(JSON.stringify(big).length).toBeGreaterThan(1_000_000);
      for (let i = 0; i < 10; i++) {
        const ok = await request(limited.app).post('/api/workbench/fit').send(big);
        expect(ok.status).toBe(200);
        expect(ok.body.gainNmPerV).toBeCloseTo(2, 9);
      }
      const over = await request(limited.app).post('/api/workbench/fit').send(big);
      expect(over.status).toBe(429);
      expect(over.body).toEqual(rateLimited);
      for (let i = 0; i < 15; i++) expect((await request(limited.app).post('/api/workbench/fit').send(small)).status).toBe(200);
    });
  });

  test('when one maker sends 20 messages (listing messages and inbox replies share the budget), then the next is 429 for them only', async () => {
    // The plain 20-then-429 case is in tests/api/exchange.test.ts; this checks the budget is per user and shared by both routes.
    await limitedApp(async (limited) => {
      const owner = await createUser();
      const part = await createPart();
      const listing = await Listing.create({
        ownerId: owner.id,
        partId: part.id,
        kind: 'offering',
        quantity: 1,
        condition: 'new',
        priceKind: 'free',
        priceAmount: null,
        currency: null,
        region: 'Here',
        shipsTo: null,
        notes: null,
      });
      const [a, b] = [await signIn(limited, (await createUser()).login), await signIn(limited, (await createUser()).login)];
      const message = (x: Agent, path: string, body: string) => x.post(path).set('X-CSRF-Token', x.csrf).send({ body });
      const first = await message(a, `/api/listings/${listing.id}/messages`, 'm0');
      expect(first.status).toBe(201);
      for (let i = 1; i < 20; i++) expect((await message(a, `/api/inbox/${first.body.threadId}/messages`, `m${i}`)).status).toBe(201);
      const over = await message(a, `/api/inbox/${first.body.threadId}/messages`, 'one too many');
      expect(over.status).toBe(429);
      expect(over.body).toEqual(rateLimited);
      expectError(await message(a, `/api/listings/${listing.id}/messages`, 'one too many'), 429, 'rate_limited');
      expect(await Message.count({ where: { body: 'one too many' } })).toBe(0);
      expect((await message(b, `/api/listings/${listing.id}/messages`, 'from someone else')).status).toBe(201);
    });
  });

  test('when one maker files 30 reports in an hour, then the 31st is 429 and stored nowhere, while another maker still can', async () => {
    await limitedApp(async (limited) => {
      const build = await createBuildRow((await createUser()).id, { status: 'published' });
      const [a, b] = [await signIn(limited, (await createUser()).login), await signIn(limited, (await createUser()).login)];
      const report = (x: Agent, note: string) =>
        x.post('/api/reports').set('X-CSRF-Token', x.csrf).send({ targetType: 'build', targetId: build.id, reason: 'spam', note });
      for (let i = 0; i < 30; i++) expect((await report(a, `r${i}`)).status).toBe(201);
      const over = await report(a, 'one too many');
      expect(over.status).toBe(429);
      expect(over.body).toEqual(rateLimited);
      expect(await Report.count({ where: { targetId: build.id, note: 'one too many' } })).toBe(0);
      expect((await report(b, 'another reporter')).status).toBe(201);
    });
  });
});
