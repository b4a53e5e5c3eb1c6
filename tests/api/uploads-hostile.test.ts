// Hostile uploads that tests/api/photos.test.ts does not already cover: polyglots, disguised
// scripts, hostile file names and multipart tricks. A polyglot is accepted only because what we
// store is a fresh WebP re-encode: the payload never reaches the disk. Every refusal leaves no
// file (not even a temp file) and no row.
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { createHash, randomBytes } from 'node:crypto';
import { existsSync } from 'node:fs';
import { mkdtemp, readdir, readFile, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { basename, join, resolve } from 'node:path';
import request from 'supertest';
import sharp from 'sharp';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createBuildRow, createUser } from '../support/factories.ts';
import { jpeg, png } from '../support/images.ts';
import { expectError } from '../support/expect-error.ts';
import { Photo } from '../../server/models/photo.model.ts';

let t: TestApp;
let uploadsDir: string;
let agent: Agent;
let ownerId: number;
beforeAll(async () => {
  uploadsDir = await mkdtemp(join(tmpdir(), 'scanwright-uploads-hostile-'));
  t = await startTestApp({ uploadsDir });
  const owner = await createUser();
  ownerId = owner.id;
  agent = await signIn(t, owner.login);
});
afterAll(async () => {
  await t.close();
  await rm(uploadsDir, { recursive: true, force: true });
});

const STORED = /^[a-f0-9]{64}(-t)?\.webp$/;
const files = async () => (await readdir(uploadsDir)).sort();
const newBuild = async () => (await createBuildRow(ownerId)).id;

interface Part {
  name: string;
  value?: string;
  /** Written into Content-Disposition byte for byte (quotes and all), so NULs and backslashes arrive as sent. */
  filenameHeader?: string;
  contentType?: string;
  data?: Buffer;
}

/** A multipart body built by hand, so nothing between us and the server tidies the file name. */
function multipart(parts: Part[], opts: { truncate?: boolean } = {}) {
  const boundary = `----scanwright${randomBytes(8).toString('hex')}`;
  const chunks: Buffer[] = [];
  for (const p of parts) {
    const disposition = `form-data; name="${p.name}"${p.filenameHeader !== undefined ? `; ${p.filenameHeader}` : ''}`;
    const head = `--${boundary}\r\nContent-Disposition: ${disposition}\r\n${p.contentType ? `Content-Type: ${p.contentType}\r\n` : ''}\r\n`;
    chunks.push(Buffer.from(head, 'utf8'), p.data ?? Buffer.from(p.value ?? '', 'utf8'), Buffer.from('\r\n'));
  }
  if (!opts.truncate) chunks.push(Buffer.from(`--${boundary}--\r\n`));
  return { body: Buffer.concat(chunks), contentType: `multipart/form-data; boundary=${boundary}` };
}

function upload(buildId: number, parts: Part[], opts: { truncate?: boolean } = {}) {
  const { body, contentType } = multipart(parts, opts);
  return agent
    .post(`/api/builds/${buildId}/photos`)
    .set('X-CSRF-Token', agent.csrf)
    .set('Content-Type', contentType)
    .serialize((b: unknown) => b as string)
    .send(body as unknown as string);
}
const photo = (data: Buffer, filenameHeader = 'filename="photo.jpg"', contentType = 'image/jpeg'): Part => ({
  name: 'photos',
  filenameHeader,
  contentType,
  data,
});
const alt: Part = { name: 'alt', value: 'The scan head' };

/** The request left the uploads dir and the build's rows exactly as they were. */
async function expectNothingStored(buildId: number, attempt: () => Promise<request.Response>) {
  const before = await files();
  const res = await attempt();
  expect(res.status, res.text).toBeGreaterThanOrEqual(400);
  expect(res.status).toBeLessThan(500);
  expect(res.body).toEqual({ error: expect.objectContaining({ code: expect.any(String), message: expect.any(String) }) });
  expect(await files()).toEqual(before);
  expect(await Photo.count({ where: { buildId } })).toBe(0);
  return res;
}

/** The upload was stored only as content-hash WebP files inside the uploads dir, none carrying `marker`. */
async function expectCleanStore(res: request.Response, marker?: string) {
  expect(res.status, res.text).toBe(201);
  const [stored] = res.body.photos as Array<{ url: string; thumbUrl: string }>;
  for (const url of [stored!.url, stored!.thumbUrl]) {
    const name = basename(url);
    expect(url).toBe(`/uploads/${name}`);
    expect(name).toMatch(STORED);
    const bytes = await readFile(join(uploadsDir, name));
    expect((await sharp(bytes).metadata()).format).toBe('webp');
    if (marker) expect(bytes.includes(marker)).toBe(false);
    const served = await request(t.app).get(url);
    expect(served.headers['content-type']).toBe('image/webp');
    expect(served.headers['x-content-type-options']).toBe('nosniff');
    if (marker) expect(Buffer.from(served.body as Buffer).includes(marker)).toBe(false);
  }
  expect(basename(stored!.url, '.webp')).toBe(
    createHash('sha256')
      .update(await readFile(join(uploadsDir, basename(stored!.url))))
      .digest('hex'),
  );
  expect((await files()).filter((f) => !STORED.test(f))).toEqual([]);
}

/** A JPEG with a COM (comment) segment right after SOI. */
function withJpegComment(jpg: Buffer, text: string): Buffer {
  const com = Buffer.from(text);
  return Buffer.concat([
    jpg.subarray(0, 2),
    Buffer.from([0xff, 0xfe, (com.length + 2) >> 8, (com.length + 2) & 0xff]),
    com,
    jpg.subarray(2),
  ]);
}
const zipWith = (text: string) =>
  Buffer.concat([
    Buffer.from([0x50, 0x4b, 0x03, 0x04]),
    Buffer.from(`evil.js ${text}`),
    Buffer.from([0x50, 0x4b, 0x05, 0x06]),
    Buffer.alloc(18),
  ]);

describe('POST /api/builds/:buildId/photos with a polyglot', () => {
  test.each([
    ['a ZIP appended to a JPEG', async (m: string) => Buffer.concat([await jpeg(64, 48), zipWith(m)])],
    [
      'an HTML page with a script appended to a JPEG',
      async (m: string) => Buffer.concat([await jpeg(64, 48), Buffer.from(`<html><script>alert("${m}")</script></html>`)]),
    ],
    [
      'a PHP script appended to a JPEG',
      async (m: string) => Buffer.concat([await jpeg(64, 48), Buffer.from(`<?php /* ${m} */ system($_GET['c']); ?>`)]),
    ],
    ['a script in a JPEG comment segment', async (m: string) => withJpegComment(await jpeg(64, 48), `<script>${m}</script>`)],
    ['an HTML page appended to a PNG', async (m: string) => Buffer.concat([await png(64, 48), Buffer.from(`<script>${m}</script>`)])],
  ])('when %s is uploaded, then it is stored only as a clean WebP re-encode without the payload', async (_what, make) => {
    const marker = `MARKER-${randomBytes(6).toString('hex')}`;
    const bytes = await make(marker);
    expect(bytes.includes(marker)).toBe(true);
    const res = await upload(await newBuild(), [alt, photo(bytes)]);
    await expectCleanStore(res, marker);
  });
});

describe('POST /api/builds/:buildId/photos with a disguised non-image', () => {
  const svg =
    '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10" onload="alert(1)"><script>alert(document.cookie)</script></svg>';
  test.each<[string, number, string, () => Buffer, string?]>([
    ['an SVG with a script is sent as photo.jpg with image/jpeg', 415, 'unsupported_media_type', () => Buffer.from(svg)],
    [
      'an SVG behind a byte-order mark and blank lines is named .webp',
      415,
      'unsupported_media_type',
      () => Buffer.from(`\ufeff\n\n  ${svg}`),
      'filename="tip.webp"',
    ],
    [
      'an HTML page starts with the JPEG magic bytes',
      400,
      'unreadable_image',
      () => Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.from('<html><script>alert(1)</script></html>')]),
    ],
    [
      'an HTML page is UTF-16 encoded and named .png',
      415,
      'unsupported_media_type',
      () => Buffer.from('\ufeff<html><script>alert(1)</script></html>', 'utf16le'),
      'filename="x.png"',
    ],
    [
      'a GIF carries a script after its header',
      415,
      'unsupported_media_type',
      () => Buffer.concat([Buffer.from('GIF89a'), Buffer.from([1, 0, 1, 0, 0, 0, 0]), Buffer.from('<script>alert(1)</script>')]),
    ],
    ['a ZIP is named .jpg', 415, 'unsupported_media_type', () => zipWith('payload')],
    ['a PDF is named .jpg', 415, 'unsupported_media_type', () => Buffer.from('%PDF-1.4\n1 0 obj<</JS(app.alert(1))>>endobj\n%%EOF')],
  ])('when %s, then %i %s and nothing is stored', async (_what, status, code, make, filenameHeader) => {
    const buildId = await newBuild();
    const res = await expectNothingStored(buildId, () => upload(buildId, [alt, photo(make(), filenameHeader)]));
    expect(res.status).toBe(status);
    expect(res.body.error.code).toBe(code);
  });
});

describe('POST /api/builds/:buildId/photos with a hostile file name', () => {
  const outside = (name: string) => [
    resolve(uploadsDir, name),
    resolve(uploadsDir, name.replaceAll('\\', '/')),
    resolve(process.cwd(), name.replaceAll('\\', '/')),
  ];
  test.each([
    ['../../etc/passwd.jpg', 'filename="../../etc/passwd.jpg"'],
    ['an absolute path', 'filename="/tmp/scanwright-escape.jpg"'],
    ['backslashes', 'filename="..\\..\\..\\windows\\escape.jpg"'],
    ['an RFC 5987 encoded traversal', "filename*=UTF-8''..%2F..%2F..%2Fescape-5987.jpg"],
    ['a right-to-left override', 'filename="photo\u202egpj.php"'],
    ['a 2000-character name', `filename="${'a'.repeat(2000)}.jpg"`],
    ['.htaccess', 'filename=".htaccess"'],
  ])('when the name has %s, then the file is stored only under its content hash inside the uploads dir', async (_what, header) => {
    const name = header.replace(/^filename\*?=("|UTF-8'')?/, '').replace(/"$/, '');
    const existedBefore = outside(decodeURIComponent(name)).map(existsSync);
    const buildId = await newBuild();
    const res = await upload(buildId, [alt, photo(await jpeg(32, 24), header)]);
    await expectCleanStore(res);
    expect((await Photo.findAll({ where: { buildId } })).map((p) => [p.displayFile, p.thumbFile].every((f) => STORED.test(f)))).toEqual([
      true,
    ]);
    expect(outside(decodeURIComponent(name)).map(existsSync)).toEqual(existedBefore);
  });
});

describe('POST /api/builds/:buildId/photos with multipart tricks', () => {
  test('when the file name carries a NUL byte, then the part header is refused as malformed and nothing is stored', async () => {
    const buildId = await newBuild();
    const res = await expectNothingStored(buildId, async () =>
      upload(buildId, [alt, photo(await jpeg(32, 24), 'filename="escape.php\u0000.jpg"')]),
    );
    expect(res.body.error.code).toBe('malformed_multipart');
  });

  test('when text fields are named __proto__[polluted] or constructor[prototype][polluted], then 400 validation_failed, nothing stored and Object.prototype stays clean', async () => {
    const buildId = await newBuild();
    const res = await expectNothingStored(buildId, async () =>
      upload(buildId, [
        alt,
        { name: '__proto__[polluted]', value: 'yes' },
        { name: 'constructor[prototype][polluted]', value: 'yes' },
        photo(await jpeg(32, 24)),
      ]),
    );
    expect(res.body.error.code).toBe('validation_failed');
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  test('when the body stops before its closing boundary, then 400 malformed_multipart and nothing is stored', async () => {
    const buildId = await newBuild();
    const res = await expectNothingStored(buildId, async () => upload(buildId, [alt, photo(await jpeg(32, 24))], { truncate: true }));
    expect(res.body.error.code).toBe('malformed_multipart');
  });

  test('when the file comes in another field, then 400 and nothing is stored', async () => {
    const buildId = await newBuild();
    const res = await expectNothingStored(buildId, async () => upload(buildId, [alt, { ...photo(await jpeg(32, 24)), name: 'avatar' }]));
    expect(res.body).toMatchObject({ error: { code: 'validation_failed', details: [{ path: 'avatar' }] } });
  });

  test('when a text field is longer than 4 KB, then 400 and nothing is stored', async () => {
    const buildId = await newBuild();
    const res = await expectNothingStored(buildId, async () =>
      upload(buildId, [{ name: 'alt', value: 'x'.repeat(5000) }, photo(await jpeg(32, 24))]),
    );
    expectError(res, 400, 'validation_failed');
  });
});
