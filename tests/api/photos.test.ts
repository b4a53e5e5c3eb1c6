import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { createHash } from 'node:crypto';
import { mkdtemp, readdir, readFile, rm } from 'node:fs/promises';
import { existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { basename, dirname, join } from 'node:path';
import request from 'supertest';
import sharp from 'sharp';
import type { BuildStatus } from '@shared/schemas/build-vocabulary.ts';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createUser } from '../support/factories.ts';
import * as img from '../support/images.ts';
import { expectError } from '../support/expect-error.ts';
import { Build } from '../../server/models/build.model.ts';
import { LogEntry } from '../../server/models/log-entry.model.ts';
import { Photo } from '../../server/models/photo.model.ts';
import { listPhotosForBuild } from '../../server/services/photo.service.ts';

let t: TestApp;
let uploadsDir: string;
beforeAll(async () => {
  uploadsDir = await mkdtemp(join(tmpdir(), 'scanwright-photos-'));
  t = await startTestApp({ uploadsDir });
});
afterAll(async () => {
  await t.close();
  await rm(uploadsDir, { recursive: true, force: true });
});

interface Upload {
  bytes: Buffer;
  filename?: string;
  contentType?: string;
}

async function makerWithBuild(status: BuildStatus = 'draft') {
  const user = await createUser();
  const agent = await signIn(t, user.login);
  const build = await Build.create({
    ownerId: user.id,
    title: 'Tube-scanner STM',
    instrumentKind: 'profilometer',
    summary: 'x',
    body: '',
    status,
  });
  return { user, agent, build };
}

function post(
  agent: Agent | request.Agent,
  buildId: number,
  files: Upload[],
  fields: Record<string, string | string[]> = { alt: 'The scan head' },
  csrf?: string,
) {
  let req = agent.post(`/api/builds/${buildId}/photos`);
  if (csrf !== undefined) req = req.set('X-CSRF-Token', csrf);
  for (const [name, value] of Object.entries(fields)) for (const v of [value].flat()) req = req.field(name, v);
  for (const f of files)
    req = req.attach('photos', f.bytes, { filename: f.filename ?? 'photo.jpg', contentType: f.contentType ?? 'image/jpeg' });
  return req;
}
const upload = (agent: Agent, buildId: number, files: Upload[], fields?: Record<string, string | string[]>) =>
  post(agent, buildId, files, fields, agent.csrf);

const storedFiles = async () => (await readdir(uploadsDir)).sort();
const rowsOf = (buildId: number) => Photo.count({ where: { buildId } });
const onDisk = (url: string) => join(uploadsDir, basename(url));

/** Runs a refused upload and checks that it left neither a file nor a row behind. */
async function expectNothingStored(buildId: number, attempt: () => Promise<request.Response>) {
  const filesBefore = await storedFiles();
  const rowsBefore = await rowsOf(buildId);
  const res = await attempt();
  expect(await storedFiles()).toEqual(filesBefore);
  expect(await rowsOf(buildId)).toBe(rowsBefore);
  return res;
}

async function uploadOne(agent: Agent, buildId: number, bytes?: Buffer) {
  const res = await upload(agent, buildId, [{ bytes: bytes ?? (await img.jpeg(320, 240)) }]);
  expect(res.status).toBe(201);
  return res.body.photos[0] as { id: number; url: string; thumbUrl: string; position: number };
}

describe('POST /api/builds/:buildId/photos', () => {
  test('when the owner uploads a JPEG and a PNG, then both are stored as WebP display and thumbnail variants with content-hash names', async () => {
    const { agent, build } = await makerWithBuild();
    const res = await upload(
      agent,
      build.id,
      [{ bytes: await img.jpeg(2400, 1800) }, { bytes: await img.png(640, 480), filename: 'board.png', contentType: 'image/png' }],
      {
        alt: ['The scan head on its tripod', 'The preamp board'],
      },
    );
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      photos: [
        { width: 1600, height: 1200, alt: 'The scan head on its tripod', entryId: null, position: 0 },
        { width: 640, height: 480, alt: 'The preamp board', entryId: null, position: 1 },
      ],
    });
    const [jpegPhoto, pngPhoto] = res.body.photos;
    expect(Object.keys(jpegPhoto).sort()).toEqual(['alt', 'entryId', 'height', 'id', 'position', 'thumbUrl', 'url', 'width']);
    for (const [photo, thumb] of [
      [jpegPhoto, [400, 300]],
      [pngPhoto, [400, 300]],
    ] as const) {
      expect(photo.url).toMatch(/^\/uploads\/[a-f0-9]{64}\.webp$/);
      expect(photo.thumbUrl).toBe(photo.url.replace('.webp', '-t.webp'));
      const display = await readFile(onDisk(photo.url));
      expect(createHash('sha256').update(display).digest('hex')).toBe(basename(photo.url, '.webp'));
      expect(await sharp(display).metadata()).toMatchObject({ format: 'webp', width: photo.width, height: photo.height });
      expect(await sharp(onDisk(photo.thumbUrl)).metadata()).toMatchObject({ format: 'webp', width: thumb[0], height: thumb[1] });
    }
    const served = await request(t.app).get(jpegPhoto.url);
    expect(served.status).toBe(200);
    expect(served.headers['content-type']).toBe('image/webp');
    expect(await listPhotosForBuild(build.id)).toEqual(res.body.photos);
  });

  test('when the JPEG carries EXIF GPS, then neither stored variant has any EXIF, XMP or ICC metadata', async () => {
    const { agent, build } = await makerWithBuild();
    const input = await img.jpeg(800, 600, { gps: true });
    expect(img.readGps((await sharp(input).metadata()).exif)).toMatchObject({ GPSLatitudeRef: 'N', GPSLatitude: '51/1 30/1 0/1' });
    const photo = await uploadOne(agent, build.id, input);
    for (const url of [photo.url, photo.thumbUrl]) {
      const meta = await sharp(onDisk(url)).metadata();
      expect(meta.exif).toBeUndefined();
      expect(meta.xmp).toBeUndefined();
      expect(meta.icc).toBeUndefined();
      expect((await readFile(onDisk(url))).includes('Exif')).toBe(false);
    }
  });

  test('when the JPEG has EXIF Orientation 6, then it is stored upright (portrait, red half on top)', async () => {
    const { agent, build } = await makerWithBuild();
    const input = await img.sidewaysJpeg(300, 200);
    expect(await sharp(input).metadata()).toMatchObject({ width: 300, height: 200, orientation: 6 });
    const res = await upload(agent, build.id, [{ bytes: input }]);
    expect(res.body.photos[0]).toMatchObject({ width: 200, height: 300 });
    const file = onDisk(res.body.photos[0].url);
    expect((await sharp(file).metadata()).orientation).toBeUndefined();
    const pixel = async (left: number, top: number) => [
      ...(await sharp(file).extract({ left, top, width: 1, height: 1 }).removeAlpha().raw().toBuffer()),
    ];
    const [r1, , b1] = await pixel(100, 60);
    const [r2, , b2] = await pixel(100, 240);
    expect(r1).toBeGreaterThan(200);
    expect(b1).toBeLessThan(60);
    expect(b2).toBeGreaterThan(200);
    expect(r2).toBeLessThan(60);
  });

  test('when one alt is sent for several photos, then every photo gets it; when a log entry of the build is named, then they belong to it', async () => {
    const { agent, build } = await makerWithBuild();
    const entry = await LogEntry.create({ buildId: build.id, entryDate: '2026-01-10', title: 'First light', body: 'Saw atoms.' });
    const res = await upload(agent, build.id, [{ bytes: await img.jpeg(200, 100) }, { bytes: await img.jpeg(100, 200) }], {
      alt: 'Early tip',
      entryId: String(entry.id),
    });
    expect(res.status).toBe(201);
    expect(res.body.photos).toMatchObject([
      { alt: 'Early tip', entryId: entry.id, position: 0 },
      { alt: 'Early tip', entryId: entry.id, position: 1 },
    ]);
    const more = await upload(agent, build.id, [{ bytes: await img.jpeg(90, 90) }]);
    expect(more.body.photos[0].position).toBe(2);
  });

  test('when the same picture is uploaded twice, then both photos share one pair of files', async () => {
    const { agent, build } = await makerWithBuild();
    const bytes = await img.jpeg(500, 400);
    const first = await uploadOne(agent, build.id, bytes);
    const files = await storedFiles();
    const second = await uploadOne(agent, build.id, bytes);
    expect(second.id).not.toBe(first.id);
    expect(second.url).toBe(first.url);
    expect(await storedFiles()).toEqual(files);
  });

  test('when the client file name tries path traversal, then it is ignored and the file lands under its content hash', async () => {
    const { agent, build } = await makerWithBuild();
    const res = await upload(agent, build.id, [{ bytes: await img.jpeg(120, 80), filename: '../../../escape.jpg' }]);
    expect(res.status).toBe(201);
    expect(res.body.photos[0].url).toMatch(/^\/uploads\/[a-f0-9]{64}\.webp$/);
    expect(existsSync(join(dirname(uploadsDir), 'escape.jpg'))).toBe(false);
    expect((await storedFiles()).filter((f) => !/^[a-f0-9]{64}(-t)?\.webp$/.test(f))).toEqual([]);
  });

  test('when the build is published, then the upload flags it as edited since review', async () => {
    const { agent, build } = await makerWithBuild('published');
    await uploadOne(agent, build.id);
    await build.reload();
    expect(build.editedSinceReview).toBe(true);
  });

  const svg = '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(document.cookie)</script></svg>';
  const refusals: Array<[string, number, string, () => Promise<Upload> | Upload]> = [
    ['a text file is named .jpg', 415, 'unsupported_media_type', () => ({ bytes: Buffer.from('Notes on the coarse approach screw.\n') })],
    [
      'an SVG carries a script',
      415,
      'unsupported_media_type',
      () => ({ bytes: Buffer.from(svg), filename: 'tip.svg', contentType: 'image/svg+xml' }),
    ],
    [
      'an SVG with an XML prolog is named .png',
      415,
      'unsupported_media_type',
      () => ({ bytes: Buffer.from(`<?xml version="1.0"?>${svg}`), filename: 'tip.png', contentType: 'image/png' }),
    ],
    [
      'an HTML page is named .png',
      415,
      'unsupported_media_type',
      () => ({ bytes: Buffer.from('<!doctype html><html><script>alert(1)</script></html>'), filename: 'x.png', contentType: 'image/png' }),
    ],
    ['a JPEG is truncated', 400, 'unreadable_image', async () => ({ bytes: await img.truncatedJpeg() })],
    [
      'a PNG decodes to 20000×20000 pixels',
      413,
      'image_too_large',
      () => ({ bytes: img.pixelBombPng(20_000), filename: 'bomb.png', contentType: 'image/png' }),
    ],
    ['the file is empty', 400, 'empty_file', () => ({ bytes: Buffer.alloc(0) })],
    ['the file is over 20 MB', 413, 'file_too_large', () => ({ bytes: img.oversizeJpeg(20 * 1024 * 1024 + 1) })],
  ];
  test.each(refusals)('when %s, then it is refused (%i %s) and nothing is stored', async (_what, status, code, make) => {
    const { agent, build } = await makerWithBuild();
    const file = await make();
    const res = await expectNothingStored(build.id, () => upload(agent, build.id, [file]));
    expect(res.status).toBe(status);
    expect(res.body).toMatchObject({ error: { code } });
  });

  test('when one of several files is refused, then none of them is stored', async () => {
    const { agent, build } = await makerWithBuild();
    const files = [{ bytes: await img.jpeg(300, 200) }, { bytes: Buffer.from('not a photo') }];
    const res = await expectNothingStored(build.id, () => upload(agent, build.id, files));
    expect(res.status).toBe(415);
    expect(res.body).toMatchObject({ error: { code: 'unsupported_media_type', details: { index: 1 } } });
  });

  test('when more than 10 files are sent, then 400 too_many_files and nothing is stored', async () => {
    const { agent, build } = await makerWithBuild();
    const one = await img.jpeg(40, 30);
    const res = await expectNothingStored(build.id, () =>
      upload(
        agent,
        build.id,
        Array.from({ length: 11 }, () => ({ bytes: one })),
      ),
    );
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ error: { code: 'too_many_files' } });
  });

  test('when no file is sent, then 400 no_files', async () => {
    const { agent, build } = await makerWithBuild();
    const res = await expectNothingStored(build.id, () => upload(agent, build.id, []));
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ error: { code: 'no_files' } });
  });

  test.each([
    ['alt is missing', {}],
    ['alt is blank', { alt: '   ' }],
    ['there are two alts for three photos', { alt: ['One', 'Two'] }],
    ['alt is longer than 300 characters', { alt: 'x'.repeat(301) }],
  ])('when %s, then 400 validation_failed on alt and nothing is stored', async (_what, fields) => {
    const { agent, build } = await makerWithBuild();
    const files = await Promise.all([1, 2, 3].map(async () => ({ bytes: await img.jpeg(60, 40) })));
    const res = await expectNothingStored(build.id, () => upload(agent, build.id, files, fields));
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ error: { code: 'validation_failed', details: [{ path: expect.stringMatching(/^alt/) }] } });
  });

  test('when the entry belongs to another build, then 400 and the files written for the request are removed again', async () => {
    const { agent, build } = await makerWithBuild();
    const other = await Build.create({ ownerId: build.ownerId, title: 'Other build', instrumentKind: 'other', summary: 'x', body: '' });
    const foreign = await LogEntry.create({ buildId: other.id, entryDate: '2026-02-01', title: 'Elsewhere', body: 'x' });
    const res = await expectNothingStored(build.id, async () =>
      upload(agent, build.id, [{ bytes: await img.jpeg(300, 300) }], { alt: 'A tip', entryId: String(foreign.id) }),
    );
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ error: { code: 'validation_failed', details: [{ path: 'entryId' }] } });
  });

  test('when a refused upload shares content with an existing photo, then that photo keeps its files', async () => {
    const { agent, build } = await makerWithBuild();
    const bytes = await img.jpeg(250, 250);
    const existing = await uploadOne(agent, build.id, bytes);
    const res = await expectNothingStored(build.id, () => upload(agent, build.id, [{ bytes }], { alt: 'Again', entryId: '999999999' }));
    expectError(res, 400, 'validation_failed', 'entryId');
    expect(existsSync(onDisk(existing.url))).toBe(true);
    expect(existsSync(onDisk(existing.thumbUrl))).toBe(true);
  });

  test('when a good and a refused upload of the same picture race, then the good one keeps its files', async () => {
    const { agent, build } = await makerWithBuild();
    const bytes = await img.jpeg(444, 333);
    const [good, bad] = await Promise.all([
      upload(agent, build.id, [{ bytes }]),
      upload(agent, build.id, [{ bytes }], { alt: 'Again', entryId: '999999999' }),
    ]);
    expect([good.status, bad.status]).toEqual([201, 400]);
    expect(existsSync(onDisk(good.body.photos[0].url))).toBe(true);
    expect(existsSync(onDisk(good.body.photos[0].thumbUrl))).toBe(true);
  });

  // A visitor's 401 and a missing CSRF token's 403 are in the authorization matrix (both refused before the upload is read).
  test.each([
    ['draft', 404, 'not_found'],
    ['published', 403, 'forbidden'],
  ] as const)('when another maker uploads to a %s build, then %i', async (status, httpStatus, code) => {
    const { build } = await makerWithBuild(status);
    const stranger = await signIn(t, (await createUser()).login);
    const res = await expectNothingStored(build.id, async () => upload(stranger, build.id, [{ bytes: await img.jpeg(50, 50) }]));
    expect(res.status).toBe(httpStatus);
    expect(res.body).toMatchObject({ error: { code } });
  });

  test('when the build does not exist, then 404', async () => {
    const { agent } = await makerWithBuild();
    const res = await upload(agent, 999_999_999, [{ bytes: await img.jpeg(50, 50) }]);
    expectError(res, 404, 'not_found');
  });
});

describe('PATCH /api/builds/:buildId/photos/:photoId', () => {
  test('when the owner changes alt, entry and position, then the photo has them', async () => {
    const { agent, build } = await makerWithBuild();
    const photo = await uploadOne(agent, build.id);
    const entry = await LogEntry.create({ buildId: build.id, entryDate: '2026-03-01', title: 'Tip etching', body: 'NaOH, 2 V.' });
    const res = await agent
      .patch(`/api/builds/${build.id}/photos/${photo.id}`)
      .set('X-CSRF-Token', agent.csrf)
      .send({ alt: 'Etched tungsten tip', entryId: entry.id, position: 5 });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: photo.id, alt: 'Etched tungsten tip', entryId: entry.id, position: 5, url: photo.url });
    const detach = await agent.patch(`/api/builds/${build.id}/photos/${photo.id}`).set('X-CSRF-Token', agent.csrf).send({ entryId: null });
    expect(detach.body).toMatchObject({ entryId: null, alt: 'Etched tungsten tip' });
  });

  test('when the entry belongs to another build, then 400', async () => {
    const { agent, build } = await makerWithBuild();
    const photo = await uploadOne(agent, build.id);
    const other = await Build.create({ ownerId: build.ownerId, title: 'Other', instrumentKind: 'other', summary: 'x', body: '' });
    const foreign = await LogEntry.create({ buildId: other.id, entryDate: '2026-03-02', title: 'Elsewhere', body: 'x' });
    const res = await agent
      .patch(`/api/builds/${build.id}/photos/${photo.id}`)
      .set('X-CSRF-Token', agent.csrf)
      .send({ entryId: foreign.id });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ error: { code: 'validation_failed', details: [{ path: 'entryId' }] } });
  });

  test('when the photo is in another build or does not exist, then 404', async () => {
    const { agent, build } = await makerWithBuild();
    const other = await Build.create({ ownerId: build.ownerId, title: 'Other', instrumentKind: 'other', summary: 'x', body: '' });
    const elsewhere = await uploadOne(agent, other.id);
    for (const id of [elsewhere.id, 999_999_999]) {
      const res = await agent.patch(`/api/builds/${build.id}/photos/${id}`).set('X-CSRF-Token', agent.csrf).send({ alt: 'Moved?' });
      expect(res.status).toBe(404);
      expect(res.body).toMatchObject({ error: { code: 'not_found' } });
    }
  });

  // A visitor's 401 is in the authorization matrix.
  test('when another maker edits, then 404 and nothing changes', async () => {
    const { agent, build } = await makerWithBuild();
    const photo = await uploadOne(agent, build.id);
    const stranger = await signIn(t, (await createUser()).login);
    expectError(
      await stranger.patch(`/api/builds/${build.id}/photos/${photo.id}`).set('X-CSRF-Token', stranger.csrf).send({ alt: 'Mine now' }),
      404,
      'not_found',
    );
    expect((await Photo.findByPk(photo.id))?.alt).toBe('The scan head');
  });

  test('when the body is empty or has unknown fields, then 400', async () => {
    const { agent, build } = await makerWithBuild();
    const photo = await uploadOne(agent, build.id);
    // An empty or unknown-keyed body is an issue of the whole body (path '').
    for (const [body, field] of [
      [{}, ''],
      [{ alt: '' }, 'alt'],
      [{ url: '/uploads/x.webp' }, ''],
    ] as const) {
      const res = await agent.patch(`/api/builds/${build.id}/photos/${photo.id}`).set('X-CSRF-Token', agent.csrf).send(body);
      expectError(res, 400, 'validation_failed', field);
    }
  });
});

describe('DELETE /api/builds/:buildId/photos/:photoId', () => {
  test('when the owner deletes the cover photo, then the row and its files go and the build has no cover', async () => {
    const { agent, build } = await makerWithBuild();
    const photo = await uploadOne(agent, build.id);
    await build.update({ coverPhotoId: photo.id });
    const res = await agent.delete(`/api/builds/${build.id}/photos/${photo.id}`).set('X-CSRF-Token', agent.csrf);
    expect(res.status).toBe(204);
    expect(await Photo.findByPk(photo.id)).toBeNull();
    expect(existsSync(onDisk(photo.url))).toBe(false);
    expect(existsSync(onDisk(photo.thumbUrl))).toBe(false);
    await build.reload();
    expect(build.coverPhotoId).toBeNull();
    const again = await agent.delete(`/api/builds/${build.id}/photos/${photo.id}`).set('X-CSRF-Token', agent.csrf);
    expectError(again, 404, 'not_found');
  });

  test('when another photo shows the same content, then the files stay until the last one is deleted', async () => {
    const { agent, build } = await makerWithBuild();
    const bytes = await img.jpeg(333, 222);
    const first = await uploadOne(agent, build.id, bytes);
    const second = await uploadOne(agent, build.id, bytes);
    await agent.delete(`/api/builds/${build.id}/photos/${first.id}`).set('X-CSRF-Token', agent.csrf).expect(204);
    expect(existsSync(onDisk(second.url))).toBe(true);
    expect(existsSync(onDisk(second.thumbUrl))).toBe(true);
    await agent.delete(`/api/builds/${build.id}/photos/${second.id}`).set('X-CSRF-Token', agent.csrf).expect(204);
    expect(existsSync(onDisk(second.url))).toBe(false);
  });

  test('when another maker deletes on a published build, then 403 and the photo stays', async () => {
    const { agent, build } = await makerWithBuild('published');
    const photo = await uploadOne(agent, build.id);
    const stranger = await signIn(t, (await createUser()).login);
    const res = await stranger.delete(`/api/builds/${build.id}/photos/${photo.id}`).set('X-CSRF-Token', stranger.csrf);
    expectError(res, 403, 'forbidden');
    expect(await Photo.findByPk(photo.id)).not.toBeNull();
    expect(existsSync(onDisk(photo.url))).toBe(true);
  });
});

describe('PUT /api/builds/:buildId/photos/order', () => {
  test('when the owner sends every photo id in a new order, then positions become 0..n-1 in that order', async () => {
    const { agent, build } = await makerWithBuild();
    const photos = [await uploadOne(agent, build.id), await uploadOne(agent, build.id), await uploadOne(agent, build.id)];
    const ids = photos.map((p) => p.id).reverse();
    const res = await agent.put(`/api/builds/${build.id}/photos/order`).set('X-CSRF-Token', agent.csrf).send({ photoIds: ids });
    expect(res.status).toBe(200);
    expect(res.body.photos.map((p: { id: number; position: number }) => [p.id, p.position])).toEqual(ids.map((id, i) => [id, i]));
    expect((await listPhotosForBuild(build.id)).map((p) => p.id)).toEqual(ids);
  });

  test('when the list misses a photo, repeats one or names a foreign one, then 400 and the order stays', async () => {
    const { agent, build } = await makerWithBuild();
    const [a, b] = [await uploadOne(agent, build.id), await uploadOne(agent, build.id)];
    const other = await Build.create({ ownerId: build.ownerId, title: 'Other', instrumentKind: 'other', summary: 'x', body: '' });
    const foreign = await uploadOne(agent, other.id);
    for (const photoIds of [[b.id], [b.id, b.id], [b.id, foreign.id], [b.id, a.id, foreign.id]]) {
      const res = await agent.put(`/api/builds/${build.id}/photos/order`).set('X-CSRF-Token', agent.csrf).send({ photoIds });
      expect(res.status).toBe(400);
      expect(res.body).toMatchObject({ error: { code: 'validation_failed', details: [{ path: 'photoIds' }] } });
    }
    expect((await listPhotosForBuild(build.id)).map((p) => p.id)).toEqual([a.id, b.id]);
  });

  test('when the build does not exist, then 404', async () => {
    const { agent } = await makerWithBuild();
    const res = await agent
      .put('/api/builds/999999999/photos/order')
      .set('X-CSRF-Token', agent.csrf)
      .send({ photoIds: [1] });
    expectError(res, 404, 'not_found');
  });
});

describe('POST /api/builds/:buildId/photos/:photoId/cover', () => {
  test('when the owner picks a photo, then it becomes the build cover', async () => {
    const { agent, build } = await makerWithBuild();
    await uploadOne(agent, build.id);
    const photo = await uploadOne(agent, build.id);
    const res = await agent.post(`/api/builds/${build.id}/photos/${photo.id}/cover`).set('X-CSRF-Token', agent.csrf);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ cover: { id: photo.id, url: photo.url } });
    await build.reload();
    expect(build.coverPhotoId).toBe(photo.id);
  });

  test('when the photo belongs to another build or does not exist, then 404 and the cover stays', async () => {
    const { agent, build } = await makerWithBuild();
    const other = await Build.create({ ownerId: build.ownerId, title: 'Other', instrumentKind: 'other', summary: 'x', body: '' });
    const foreign = await uploadOne(agent, other.id);
    for (const id of [foreign.id, 999_999_999]) {
      const res = await agent.post(`/api/builds/${build.id}/photos/${id}/cover`).set('X-CSRF-Token', agent.csrf);
      expectError(res, 404, 'not_found');
    }
    await build.reload();
    expect(build.coverPhotoId).toBeNull();
  });
});
