// With RATE_LIMIT_STORE=mariadb every app instance on one database counts against the same limits (as in
// `npm run cluster`, two instances behind one proxy); with the default memory store each instance counts alone.
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { expectError } from '../support/expect-error.ts';
import { MariaDbRateLimitStore } from '../../server/middleware/rate-limit-store.ts';
import { RateLimitCounter } from '../../server/models/rate-limit-counter.model.ts';

let a: TestApp;
let b: TestApp;
beforeAll(async () => {
  a = await startTestApp({ rateLimits: true, rateLimitStore: 'mariadb' });
  b = await startTestApp({ rateLimits: true, rateLimitStore: 'mariadb' });
  await RateLimitCounter.destroy({ where: {} });
});
afterAll(async () => {
  await a?.close();
  await b?.close();
});

/** The sign-in limit is 20 starts a minute per address (app.ts); supertest always comes from loopback. */
const start = (t: TestApp) => request(t.app).get('/auth/github?login=someone');

describe('a limit shared through MariaDB', () => {
  test('when sign-ins start alternately on two instances, then the 21st in the minute is refused on both', async () => {
    for (let i = 0; i < 20; i++) {
      const res = await start(i % 2 === 0 ? a : b);
      expect(res.status, `attempt ${i + 1}`).toBe(302);
    }
    expectError(await start(a), 429, 'rate_limited');
    expectError(await start(b), 429, 'rate_limited');
    expect((await start(b)).headers['ratelimit']).toMatch(/r=0/);
  });

  test('when each of two instances keeps its own counts (memory store), then 30 alternating starts all pass (15 each, under the 20 of one)', async () => {
    const c = await startTestApp({ rateLimits: true, rateLimitStore: 'memory' });
    const d = await startTestApp({ rateLimits: true, rateLimitStore: 'memory' });
    try {
      for (let i = 0; i < 30; i++) expect((await start(i % 2 === 0 ? c : d)).status).toBe(302);
    } finally {
      await c.close();
      await d.close();
      a.rebind();
    }
  });
});

describe('behind a proxy (TRUST_PROXY=1, as in npm run cluster)', () => {
  test('when visitors arrive through the proxy from two addresses, then each address has its own sign-in limit', async () => {
    const proxied = await startTestApp({ rateLimits: true, rateLimitStore: 'mariadb', trustProxy: 1 });
    try {
      const from = (ip: string) => request(proxied.app).get('/auth/github?login=someone').set('X-Forwarded-For', ip);
      for (let i = 0; i < 20; i++) expect((await from('192.0.2.10')).status).toBe(302);
      expectError(await from('192.0.2.10'), 429, 'rate_limited');
      expect((await from('192.0.2.11')).status).toBe(302);
    } finally {
      await proxied.close();
      a.rebind();
    }
  });
});

describe('MariaDbRateLimitStore', () => {
  test('when a client hits concurrently, then every hit is counted once; after the window it starts again at 1', async () => {
    const store = new MariaDbRateLimitStore('store-test');
    store.init({ windowMs: 400 } as Parameters<MariaDbRateLimitStore['init']>[0]);
    const other = new MariaDbRateLimitStore('another-limiter');
    other.init({ windowMs: 400 } as Parameters<MariaDbRateLimitStore['init']>[0]);
    const hits = await Promise.all(Array.from({ length: 12 }, () => store.increment('10.0.0.1')));
    // Each increment saw a distinct count: 1 … 12 [calc].
    expect(hits.map((h) => h.totalHits).sort((x, y) => x - y)).toEqual(Array.from({ length: 12 }, (_, i) => i + 1));
    expect((await other.increment('10.0.0.1')).totalHits).toBe(1);
    expect(await store.get('10.0.0.1')).toMatchObject({ totalHits: 12 });
    await store.decrement('10.0.0.1');
    expect(await store.get('10.0.0.1')).toMatchObject({ totalHits: 11 });
    await new Promise((resolve) => setTimeout(resolve, 450));
    expect(await store.get('10.0.0.1')).toBeUndefined();
    expect((await store.increment('10.0.0.1')).totalHits).toBe(1);
    await store.resetKey('10.0.0.1');
    expect(await store.get('10.0.0.1')).toBeUndefined();
  });
});
