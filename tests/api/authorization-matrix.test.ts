// Every state-changing route × every kind of actor, generated from the app's own router stack.
// A route without a row below fails, and so does a row whose route is gone.
// Also per route: a visitor gets 401 (the table's first column), and a signed-in actor who may act
// gets 403 csrf_failed without the session's CSRF token (the last describe). Per-resource tests
// leave both cases to this file.
import { afterAll, describe, expect, test } from 'vitest';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { startTestApp } from '../support/test-app.ts';
import { signIn, visitor } from '../support/login.ts';
import { createUser } from '../support/factories.ts';
import { isWorkbench, SIGNED_LINK_ROUTES, stateChangingRoutes, type RouteEntry } from '../support/route-table.ts';
import { actorPool, armed, fixtures, send, type Acting } from '../support/matrix-fixtures.ts';
import { setUserSuspended, toActor } from '../../server/services/user.service.ts';

const uploadsDir = mkdtempSync(join(tmpdir(), 'scanwright-matrix-'));
const t = await startTestApp({ uploadsDir });
afterAll(async () => {
  await t.close();
  rmSync(uploadsDir, { recursive: true, force: true });
});

const ACTORS = ['visitor', 'owner', 'other', 'suspended', 'moderator', 'admin'] as const;
type ActorKind = (typeof ACTORS)[number];
type Row = readonly [visitor: number, owner: number, other: number, suspended: number, moderator: number, admin: number];

// "owner" is the maker whose rows the route acts on (for account and admin routes: the account
// itself); "other" is another maker. Builds here are drafts, so another maker gets 404 (drafts are
// invisible to them) while moderators, who can see drafts, get 403.
// A suspended maker's sessions are deleted at suspension, so their stale cookie and CSRF token
// match nothing: 403 csrf_failed on every write (the client then fetches a new token and gets 401).
const expected: Record<string, Row> = {
  //                                                visitor owner other susp.  mod  admin
  'POST /auth/logout': [200, 200, 200, 403, 200, 200],
  'PATCH /api/admin/users/:userId/role': [401, 403, 403, 403, 403, 200],
  'PATCH /api/admin/users/:userId/suspension': [401, 403, 403, 403, 403, 200],
  'POST /api/admin/outbox/:mailId/requeue': [401, 403, 403, 403, 403, 200],
  'DELETE /api/admin/users/:userId/tokens/:tokenId': [401, 403, 403, 403, 403, 204],

  'POST /api/workbench/fit': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/peak-to-peak': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/creep': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/expected-gain': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/mixing': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/mixing-fit': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/scan-plan': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/resonance': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/drive-current': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/tunnelling': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/convert': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/loaded-gain': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/tube': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/drive-limits': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/noise-floor': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/sine-fit': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/linearise': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/lattice': [200, 200, 200, 200, 200, 200],
  'POST /api/workbench/image-heights': [200, 200, 200, 200, 200, 200],

  'POST /api/builds/:buildId/photos': [401, 201, 404, 403, 403, 403],
  'PUT /api/builds/:buildId/photos/order': [401, 200, 404, 403, 403, 403],
  'PATCH /api/builds/:buildId/photos/:photoId': [401, 200, 404, 403, 403, 403],
  'DELETE /api/builds/:buildId/photos/:photoId': [401, 204, 404, 403, 403, 403],
  'POST /api/builds/:buildId/photos/:photoId/cover': [401, 200, 404, 403, 403, 403],

  'POST /api/builds': [401, 201, 201, 403, 201, 201],
  'PATCH /api/builds/:buildId': [401, 200, 404, 403, 403, 403],
  'DELETE /api/builds/:buildId': [401, 204, 404, 403, 403, 403],
  'POST /api/builds/:buildId/submit': [401, 200, 404, 403, 403, 403],
  'POST /api/builds/:buildId/withdraw': [401, 200, 404, 403, 403, 403],
  'POST /api/builds/:buildId/entries': [401, 201, 404, 403, 403, 403],
  'PATCH /api/builds/:buildId/entries/:entryId': [401, 200, 404, 403, 403, 403],
  'DELETE /api/builds/:buildId/entries/:entryId': [401, 204, 404, 403, 403, 403],

  'POST /api/builds/:buildId/actuators': [401, 201, 404, 403, 403, 403],
  'PATCH /api/actuators/:actuatorId': [401, 200, 404, 403, 403, 403],
  'DELETE /api/actuators/:actuatorId': [401, 204, 404, 403, 403, 403],
  'PUT /api/actuators/:actuatorId/drive-matrix': [401, 201, 404, 403, 403, 403],
  'DELETE /api/actuators/:actuatorId/drive-matrix': [401, 204, 404, 403, 403, 403],
  'PUT /api/actuators/:actuatorId/linearisation': [401, 201, 404, 403, 403, 403],
  'DELETE /api/actuators/:actuatorId/linearisation': [401, 204, 404, 403, 403, 403],
  'POST /api/actuators/:actuatorId/runs': [401, 201, 404, 403, 403, 403],
  'PATCH /api/runs/:runId': [401, 200, 404, 403, 403, 403],
  'DELETE /api/runs/:runId': [401, 204, 404, 403, 403, 403],

  'POST /api/parts': [401, 201, 201, 403, 201, 201],
  'POST /api/parts/:partId/merge': [401, 403, 403, 403, 200, 200],
  'POST /api/parts/:partId/photos': [401, 201, 403, 403, 201, 201],
  'PUT /api/parts/:partId/photos/order': [401, 200, 403, 403, 200, 200],
  'PATCH /api/parts/:partId/photos/:photoId': [401, 200, 403, 403, 200, 200],
  'DELETE /api/parts/:partId/photos/:photoId': [401, 204, 403, 403, 204, 204],

  'POST /api/review/builds/:id/decision': [401, 403, 403, 403, 200, 200],
  'POST /api/review/builds/:buildId/publish-with-runs': [401, 403, 403, 403, 200, 200],
  'POST /api/review/runs/:id/decision': [401, 403, 403, 403, 200, 200],
  'POST /api/review/parts/:id/decision': [401, 403, 403, 403, 200, 200],
  'POST /api/review/reports/:id/decision': [401, 403, 403, 403, 200, 200],
  'POST /api/reports': [401, 201, 201, 403, 201, 201],
  'PATCH /api/account/settings': [401, 200, 200, 403, 200, 200],
  'POST /api/account/data-licence': [401, 200, 200, 403, 200, 200],
  'POST /api/account/tokens': [401, 201, 201, 403, 201, 201],
  'DELETE /api/account/tokens/:tokenId': [401, 204, 404, 403, 404, 404],

  'POST /api/listings': [401, 201, 201, 403, 201, 201],
  'PATCH /api/listings/:listingId': [401, 200, 403, 403, 403, 403],
  'POST /api/listings/:listingId/photos': [401, 201, 403, 403, 403, 403],
  'PUT /api/listings/:listingId/photos/order': [401, 200, 403, 403, 403, 403],
  'PATCH /api/listings/:listingId/photos/:photoId': [401, 200, 403, 403, 403, 403],
  'DELETE /api/listings/:listingId/photos/:photoId': [401, 204, 403, 403, 403, 403],
  'POST /api/listings/:listingId/visibility': [401, 403, 403, 403, 200, 200],
  'POST /api/listings/:listingId/messages': [401, 403, 201, 403, 201, 201],
  'POST /api/builds/:buildId/comments': [401, 201, 201, 403, 201, 201],
  'POST /api/comments/:commentId/hide': [401, 403, 403, 403, 204, 204],
  'POST /api/inbox/:threadId/messages': [401, 201, 404, 403, 404, 404],
  'POST /api/inbox/:threadId/read': [401, 204, 404, 403, 404, 404],

  // A returned build's review thread: its maker and moderators (another maker: 404, the build is not theirs to see).
  'POST /api/builds/:buildId/review-thread': [401, 201, 404, 403, 201, 201],
  'PUT /api/follows/:targetType/:targetId': [401, 200, 200, 403, 200, 200],
  'DELETE /api/follows/:targetType/:targetId': [401, 204, 204, 403, 204, 204],
  'POST /api/notifications/read': [401, 200, 200, 403, 200, 200],
  // The signed link is the credential, whoever sends it (a mail provider's server, with no session).
  'POST /api/mail/unsubscribe/:userId/:kind/:token': [200, 200, 200, 200, 200, 200],
};

const routes = stateChangingRoutes(t.app);

/** The error code each refusal carries; a suspended maker's refusal is the CSRF check's. */
function codeFor(status: number, actor: ActorKind): string {
  if (status === 403) return actor === 'suspended' ? 'csrf_failed' : 'forbidden';
  return { 401: 'unauthorized', 404: 'not_found' }[status] ?? 'unexpected';
}

type User = Awaited<ReturnType<typeof createUser>>;
const suspend = async (user: User) => setUserSuspended(toActor(await createUser({ role: 'admin' })), user.id, { suspended: true });

async function signedIn(role: 'maker' | 'moderator' | 'admin', then?: (user: User) => Promise<unknown>): Promise<Acting> {
  const user = await createUser({ role });
  const agent = await signIn(t, user.login);
  await then?.(user);
  return { user, agent };
}
const once = <T>(make: () => Promise<T>) => {
  let made: Promise<T> | undefined;
  return () => (made ??= make());
};
const fresh: Record<ActorKind, () => Promise<Acting>> = {
  visitor: async () => ({ user: null, agent: await visitor(t) }),
  owner: () => signedIn('maker'),
  other: () => signedIn('maker'),
  suspended: () => signedIn('maker', suspend),
  moderator: () => signedIn('moderator'),
  admin: () => signedIn('admin'),
};
// Signing in is the slow part, so actors are shared across routes; every case still gets its own rows.
const shared = Object.fromEntries(ACTORS.map((kind) => [kind, once(fresh[kind])])) as Record<ActorKind, () => Promise<Acting>>;

/** The owner of the case's rows and the actor sending the request. */
async function cast(route: RouteEntry, kind: ActorKind): Promise<{ owner: User; actor: Acting }> {
  const fixture = fixtures[route.key]!;
  if (fixture.endsSession || fixture.changesOwner) {
    if (kind === 'owner' || kind === 'suspended') {
      const actor = await fresh[kind]();
      return { owner: actor.user!, actor };
    }
    return { owner: await createUser(), actor: await (fixture.endsSession ? fresh : shared)[kind]() };
  }
  const actor = await shared[kind]();
  const owner = kind === 'owner' || kind === 'suspended' ? actor.user! : (await shared.owner()).user!;
  return { owner, actor };
}

async function runCase(route: RouteEntry, kind: ActorKind, status: number) {
  const { owner, actor } = await cast(route, kind);
  const target = await fixtures[route.key]!.make({ t, owner, actor });
  const before = await target.state();
  const res = await send(route, target, actor.agent);
  expect(res.status, `${route.key} as ${kind}: ${res.text}`).toBe(status);
  if (status < 300) return target.changed(res);
  expect(res.body).toEqual({ error: { code: codeFor(status, kind), message: expect.any(String) } });
  expect(await target.state()).toEqual(before);
}

describe('the expectation table', () => {
  test('when the app is walked, then every state-changing route has a row (and a fixture)', () => {
    const missing = routes.filter((r) => !(r.key in expected)).map((r) => r.key);
    expect(missing).toEqual([]);
    expect(routes.filter((r) => !(r.key in fixtures)).map((r) => r.key)).toEqual([]);
  });

  test('when a row or fixture names a route, then the app still has it', () => {
    const keys = new Set(routes.map((r) => r.key));
    expect(Object.keys(expected).filter((k) => !keys.has(k))).toEqual([]);
    expect(Object.keys(fixtures).filter((k) => !keys.has(k))).toEqual([]);
  });

  test('when a route is a workbench calculation, then anyone gets 200', () => {
    const calcs = routes.filter((r) => isWorkbench(r.key));
    expect(calcs.length).toBeGreaterThan(0);
    for (const r of calcs) expect(expected[r.key]).toEqual([200, 200, 200, 200, 200, 200]);
  });
});

describe.concurrent.each(routes.filter((r) => r.key in expected && r.key in fixtures))('$key', (route) => {
  test.each(ACTORS.map((kind, i) => [kind, expected[route.key]![i]] as const))('when a %s sends it, then %i', async (kind, status) => {
    await runCase(route, kind, status);
  });
});

// The workbench calculations store nothing and need no token (tests/api/workbench-calculators.test.ts sends them without one).
const pool = actorPool(t);
describe("without the session's CSRF token", () => {
  test.concurrent.each(routes.filter((r) => !isWorkbench(r.key) && !SIGNED_LINK_ROUTES.has(r.key) && r.key in fixtures))(
    "when $key is sent by an actor who may, but without a token, with a wrong one, a cut one or another session's, then 403 csrf_failed and nothing changes",
    async (route) => {
      const { target, actor } = await armed(t, pool, route);
      const before = await target.state();
      const stranger = await visitor(t);
      const token = actor.agent.csrf;
      for (const csrf of [null, '', 'x'.repeat(token.length), token.slice(0, -1), stranger.csrf]) {
        const res = await send(route, target, actor.agent, { csrf });
        expect(res.status, `${route.key} with ${JSON.stringify(csrf)}: ${res.text}`).toBe(403);
        expect(res.body).toEqual({ error: { code: 'csrf_failed', message: expect.any(String) } });
      }
      expect(await target.state()).toEqual(before);
    },
  );
});
