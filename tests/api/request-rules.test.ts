// Rules every request meets whatever its route: private answers are never cached, paths are matched the way
// the router matches them, CSRF tokens are compared as bytes, missing files are plain 404s, and the large-body
// limit counts a compressed body by what it inflates to.
import { brotliCompressSync, constants as zlibConstants, gzipSync } from 'node:zlib';
import { afterAll, describe, expect, test } from 'vitest';
import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn } from '../support/login.ts';
import { createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { listRoutes } from '../support/route-table.ts';
import { makeToken } from '../support/rig.ts';

const uploadsDir = mkdtempSync(join(tmpdir(), 'scanwright-rules-up-'));
const clientDist = mkdtempSync(join(tmpdir(), 'scanwright-rules-dist-'));
mkdirSync(join(clientDist, 'assets'));
writeFileSync(join(clientDist, 'index.html'), '<!doctype html><title>Scanwright</title>');
writeFileSync(join(clientDist, 'assets', 'app.js'), 'console.log(1)');
// A larger asset precompressed as the build does it (Brotli quality 11, gzip level 9), to check which one is served.
const big = Buffer.from(Array.from({ length: 4000 }, (_, i) => `export const v${i} = ${i};`).join('\n'));
writeFileSync(join(clientDist, 'assets', 'big.js'), big);
writeFileSync(join(clientDist, 'assets', 'big.js.br'), brotliCompressSync(big, { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 11 } }));
writeFileSync(join(clientDist, 'assets', 'big.js.gz'), gzipSync(big, { level: 9 }));
const t = await startTestApp({ uploadsDir, clientDist });
afterAll(async () => {
  await t.close();
  rmSync(uploadsDir, { recursive: true, force: true });
  rmSync(clientDist, { recursive: true, force: true });
});

/** GET routes whose answer is the same for everyone (so they may be cached), or which answer before sessions exist. */
const SAME_FOR_ALL = new Set([
  'GET /api/health',
  'GET /api/ready',
  'GET /api/openapi.json',
  'GET /api/registry/dataset/README.md',
  'GET /api/registry/dataset/parts.csv',
  'GET /api/registry/dataset/runs.csv',
  'GET /api/registry/dataset/points.csv',
  'GET /api/registry/dataset/dataset.json',
]);

describe('Cache-Control: no-store on answers that depend on who asks', () => {
  const gets = listRoutes(t.app).filter((r) => r.method === 'GET' && /^\/(api|auth)\//.test(r.path) && !SAME_FOR_ALL.has(r.key));

  test('when the route table is read, then the per-person routes are among the routes checked', () => {
    const keys = gets.map((r) => r.key);
    for (const key of [
      'GET /api/session',
      'GET /api/account/tokens',
      'GET /api/inbox',
      'GET /api/inbox/:threadId',
      'GET /api/builds/mine',
      'GET /api/listings/mine',
    ])
      expect(keys).toContain(key);
  });

  test.each(gets)('when a signed-in admin sends $key, then the answer is no-store and varies by cookie', async (route) => {
    const admin = await signIn(t, (await createUser({ role: 'admin' })).login);
    const res = await admin.get(route.path.replace(/:\w+/g, '1'));
    expect(res.headers['cache-control'], `${route.key} → ${res.status}`).toBe('no-store');
    expect(res.headers.vary ?? '').toMatch(/Cookie/i);
  });

  test.each(['/api/session', '/api/account/tokens', '/api/inbox', '/api/builds/mine', '/api/listings/mine', '/api/account/data-licence'])(
    'when a visitor asks %s, then that answer is no-store too',
    async (path) => {
      const res = await request(t.app).get(path);
      expect(res.headers['cache-control'], `${path} → ${res.status}`).toBe('no-store');
    },
  );

  test('when a rig token reads a per-person route, then no-store; a visitor’s public read keeps its own caching', async () => {
    const maker = await signIn(t, (await createUser()).login);
    const { secret } = await makeToken(maker, ['read']);
    const mine = await request(t.app).get('/api/builds/mine').set('Authorization', `Bearer ${secret}`);
    expect(mine.status).toBe(200);
    expect(mine.headers['cache-control']).toBe('no-store');
    const parts = await request(t.app).get('/api/parts');
    expect(parts.status).toBe(200);
    expect(parts.headers['cache-control']).not.toBe('no-store');
    expect((await request(t.app).get('/api/registry/dataset/README.md')).headers['cache-control']).toBe('public, max-age=300');
  });
});

describe('paths are matched the way the router matches them', () => {
  test.each(['/API/session', '/api/session/', '/Api/Session/', '/API/SESSION'])(
    'when a visitor sends GET %s, then 200 with a CSRF token, never 500',
    async (path) => {
      const res = await request(t.app).get(path);
      expect(res.status, res.text).toBe(200);
      expect(res.body).toMatchObject({ user: null, csrfToken: expect.stringMatching(/^[\w-]{32}$/) });
    },
  );

  test.each(['/AUTH/github?login=someone', '/auth/github/?login=someone', '/Auth/GitHub?login=someone'])(
    'when a visitor starts sign-in at %s, then a redirect to the provider, never 500',
    async (path) => {
      const res = await request(t.app).get(path);
      expect(res.status, res.text).toBe(302);
    },
  );

  test('when a token’s scopes are checked, then /API/Account/Tokens is as closed to a token as /api/account/tokens', async () => {
    const maker = await signIn(t, (await createUser()).login);
    const { secret } = await makeToken(maker, ['read']);
    for (const path of ['/api/account/tokens', '/API/Account/Tokens', '/api/account/tokens/'])
      expectError(await request(t.app).get(path).set('Authorization', `Bearer ${secret}`), 403, 'token_scope');
  });
});

describe('CSRF tokens', () => {
  test('when the token has the right length but other bytes (ASCII or not), then 403 csrf_failed, never 500', async () => {
    const maker = await signIn(t, (await createUser()).login);
    const n = maker.csrf.length;
    for (const wrong of ['x'.repeat(n), 'é'.repeat(n), `${maker.csrf.slice(0, -1)}ÿ`]) {
      expectError(await maker.post('/api/builds').set('X-CSRF-Token', wrong).send({ title: 'x' }), 403, 'csrf_failed');
    }
    expect(
      (
        await maker
          .post('/api/builds')
          .set('X-CSRF-Token', maker.csrf)
          .send({ title: 'A tube STM', instrumentKind: 'tunnelling-microscope', summary: 'A tube-scanner STM.' })
      ).status,
    ).toBe(201);
  });
});

describe('missing static files and uploads', () => {
  test.each(['/uploads/missing.webp', '/uploads/a/b/c.webp', '/assets/missing.js', '/assets/'])(
    'when %s is asked for, then 404 not_found in the error shape with no file-system path',
    async (path) => {
      const res = await request(t.app).get(path);
      expectError(res, 404, 'not_found');
      for (const leak of [uploadsDir, clientDist, 'ENOENT', '/tmp', process.cwd()]) expect(res.text).not.toContain(leak);
    },
  );

  test('when a path climbs out of the uploads folder, then 403 forbidden in the error shape, no path either', async () => {
    const res = expectError(await request(t.app).get('/uploads/%2e%2e/secret'), 403, 'forbidden');
    for (const leak of [uploadsDir, '/tmp']) expect(res.text).not.toContain(leak);
  });

  test('when a file that exists is asked for, then it is served', async () => {
    expect((await request(t.app).get('/assets/app.js')).status).toBe(200);
  });

  test('when an asset has precompressed files, then the best encoding the client accepts is sent as stored, for a year', async () => {
    // supertest decodes the body; the stored file is recognised by its length on the wire.
    const br = await request(t.app).get('/assets/big.js').set('Accept-Encoding', 'gzip, br');
    expect(br.headers['content-encoding']).toBe('br');
    expect(Number(br.headers['content-length'])).toBe(
      brotliCompressSync(big, { params: { [zlibConstants.BROTLI_PARAM_QUALITY]: 11 } }).length,
    );
    expect(br.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(br.headers['vary']).toMatch(/Accept-Encoding/i);
    expect(br.headers['content-type']).toMatch(/javascript/);
    expect(br.text).toBe(big.toString());
    const gz = await request(t.app).get('/assets/big.js').set('Accept-Encoding', 'gzip');
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(Number(gz.headers['content-length'])).toBe(gzipSync(big, { level: 9 }).length);
    expect(gz.text).toBe(big.toString());
    expect(Number(br.headers['content-length'])).toBeLessThan(Number(gz.headers['content-length']));
  });
});

/** A fit posted as these gzip bytes, sent as they are. */
const gzipped = (app: TestApp, bytes: Buffer) =>
  request(app.app)
    .post('/api/workbench/fit')
    .set('Content-Type', 'application/json')
    .set('Content-Encoding', 'gzip')
    .serialize((b: unknown) => b as string)
    .send(bytes as unknown as string);

describe('the large-body limit of the workbench', () => {
  test('when gzip bodies of a few kB inflate past 1 MB, then they count as large: the 11th in a minute is 429', async () => {
    const limited = await startTestApp({ rateLimits: true, uploadsDir });
    try {
      // A small valid fit padded with 1.2 MB of JSON whitespace: about 1 kB gzipped.
      const json = `{"displacementUnit":"nm","points":[${[0, 1, 2, 3, 4, 5].map((v) => `{"volts":${v},"displacement":${2 * v}}`).join(',')}]${' '.repeat(1_200_000)}}`;
      const gz = gzipSync(json);
      expect(gz.length).toBeLessThan(10_000);
      const post = () => gzipped(limited, gz);
      for (let i = 0; i < 10; i++) {
        const ok = await post();
        expect(ok.status, ok.text).toBe(200);
        expect(ok.body.gainNmPerV).toBeCloseTo(2, 9);
      }
      expectError(await post(), 429, 'rate_limited');
      // Small gzip bodies are not large, and plain small ones go on too.
      const small = gzipSync(
        JSON.stringify({ displacementUnit: 'nm', points: [0, 1, 2, 3].map((v) => ({ volts: v, displacement: 2 * v })) }),
      );
      expect((await gzipped(limited, small)).status).toBe(200);
    } finally {
      await limited.close();
      t.rebind();
    }
  });
});
