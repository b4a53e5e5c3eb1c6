// Photo files in an S3-compatible bucket (s3rver, a local stand-in, on loopback): the store's put/read/remove and
// the app's upload → serve → delete, so several app instances can share one set of photo files.
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import { ListObjectsV2Command, type S3Client } from '@aws-sdk/client-s3';
import request from 'supertest';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Config } from '../../server/config.ts';
import { createPhotoStore } from '../../server/storage/create-photo-store.ts';
import type { PhotoStore } from '../../server/storage/photo-store.ts';
import { startS3StandIn, S3RVER_KEY as KEY, type S3StandIn } from '../support/s3-stand-in.ts';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn } from '../support/login.ts';
import { createUser } from '../support/factories.ts';
import * as img from '../support/images.ts';
import { Build } from '../../server/models/build.model.ts';

const BUCKET = 'scanwright-photos';

let work: string;
let s3: S3StandIn;
let settings: NonNullable<Config['s3']>;
let client: S3Client;
let store: PhotoStore;
let t: TestApp;

beforeAll(async () => {
  work = mkdtempSync(join(tmpdir(), 'scanwright-photo-s3-'));
  s3 = await startS3StandIn(work, BUCKET);
  settings = { bucket: BUCKET, endpoint: s3.endpoint, region: 'us-east-1', accessKeyId: KEY, secretAccessKey: KEY, prefix: 'photos/' };
  client = s3.client;
  store = await createPhotoStore({ uploadsDir: join(work, 'unused'), s3: settings });
  // The app's own uploads folder must stay empty: every file goes to the bucket.
  t = await startTestApp({ uploadsDir: join(work, 'uploads'), s3: settings });
}, 60_000);

afterAll(async () => {
  await t?.close();
  await store?.close();
  await s3?.close();
  rmSync(work, { recursive: true, force: true });
});

const keys = async () => ((await client.send(new ListObjectsV2Command({ Bucket: BUCKET }))).Contents ?? []).map((o) => o.Key!).sort();
const name = (seed: string, thumb = false) => `${createHash('sha256').update(seed).digest('hex')}${thumb ? '-t' : ''}.webp`;

describe('S3PhotoStore against s3rver', () => {
  test('when files are put, then they are read back byte for byte under the prefix, and a second put of the same names creates nothing', async () => {
    const a = name('a');
    const b = name('a', true);
    const files = new Map([
      [a, Buffer.from('display bytes')],
      [b, Buffer.from('thumb bytes')],
    ]);
    expect(store.kind).toBe('s3');
    expect((await store.putMissing(files)).sort()).toEqual([a, b].sort());
    expect(await store.putMissing(files)).toEqual([]);
    expect((await store.read(a))?.toString()).toBe('display bytes');
    expect((await store.read(b))?.toString()).toBe('thumb bytes');
    expect(await keys()).toEqual(expect.arrayContaining([`photos/${a}`, `photos/${b}`]));
    expect(await store.check(0)).toMatchObject({ ok: true, bucket: BUCKET });
  });

  test('when files are removed, then they are gone; a missing file or a name that is not a stored variant is no error', async () => {
    const c = name('c');
    await store.putMissing(new Map([[c, Buffer.from('c')]]));
    await store.remove([c, name('never stored'), '../../etc/passwd', 'photos']);
    expect(await store.read(c)).toBeNull();
    expect(await keys()).not.toContain(`photos/${c}`);
    expect(await store.read('not-a-stored-name.webp')).toBeNull();
  });

  test('when the bucket does not exist, then the readiness check fails with the reason', async () => {
    const missing = await createPhotoStore({ uploadsDir: work, s3: { ...settings, bucket: 'no-such-bucket' } });
    try {
      await expect(missing.check(0)).rejects.toThrow();
    } finally {
      await missing.close();
    }
  });
});

describe('the app with S3_BUCKET set', () => {
  test('when a maker uploads a photo, then it is served from the bucket with the photo cache headers, and deleting it removes its objects', async () => {
    const user = await createUser();
    const agent = await signIn(t, user.login);
    const build = await Build.create({
      ownerId: user.id,
      title: 'Bucket STM',
      instrumentKind: 'profilometer',
      summary: 'x',
      body: '',
      status: 'draft',
    });
    const before = await keys();
    const res = await agent
      .post(`/api/builds/${build.id}/photos`)
      .set('X-CSRF-Token', agent.csrf)
      .field('alt', 'The scan head')
      .attach('photos', await img.jpeg(640, 480), { filename: 'head.jpg', contentType: 'image/jpeg' });
    expect(res.status).toBe(201);
    const photo = res.body.photos[0] as { id: number; url: string; thumbUrl: string };
    const added = (await keys()).filter((k) => !before.includes(k));
    expect(added.sort()).toEqual([`photos/${basename(photo.url)}`, `photos/${basename(photo.thumbUrl)}`].sort());

    const served = await request(t.app)
      .get(photo.url)
      .buffer(true)
      .parse((r, done) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => done(null, Buffer.concat(chunks)));
      });
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/webp');
    expect(served.headers['cache-control']).toBe('public, max-age=2592000, immutable');
    const bytes = served.body as Buffer;
    // Content-hash names: the served display variant hashes to its own name.
    expect(createHash('sha256').update(bytes).digest('hex')).toBe(basename(photo.url, '.webp'));
    expect(await sharp(bytes).metadata()).toMatchObject({ format: 'webp', width: 640, height: 480 });
    const again = await request(t.app).get(photo.url).set('If-None-Match', served.headers.etag!);
    expect(again.status).toBe(304);

    const del = await agent.delete(`/api/builds/${build.id}/photos/${photo.id}`).set('X-CSRF-Token', agent.csrf);
    expect(del.status).toBe(204);
    expect(await keys()).toEqual(before);
    expect(existsSync(join(work, 'uploads'))).toBe(false);
    const gone = await request(t.app).get(photo.url);
    expect(gone.status).toBe(404);
    expect(gone.body).toMatchObject({ error: { code: 'not_found' } });
  });

  test('when a name is not a stored variant, then 404 in the error shape, and readiness reports the bucket', async () => {
    expect((await request(t.app).get('/uploads/..%2f..%2fetc%2fpasswd')).status).toBe(404);
    expect((await request(t.app).get('/uploads/x.webp')).body).toMatchObject({ error: { code: 'not_found' } });
    const ready = await request(t.app).get('/api/ready');
    const checks = ready.body.checks ?? ready.body.error.details.checks;
    expect(checks.uploads).toMatchObject({ ok: true, bucket: BUCKET });
  });
});
