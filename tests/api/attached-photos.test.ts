// Photos on registry parts (proposer and moderators) and on exchange listings (owner only).
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { mkdtemp, readdir, rm } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { basename, join } from 'node:path';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createPart, createUser } from '../support/factories.ts';
import * as img from '../support/images.ts';
import { expectError } from '../support/expect-error.ts';
import { Listing } from '../../server/models/listing.model.ts';
import { Part } from '../../server/models/part.model.ts';
import { PartPhoto } from '../../server/models/part-photo.model.ts';
import { ListingPhoto } from '../../server/models/listing-photo.model.ts';
import { MAX_ATTACHED_PHOTOS } from '../../server/services/attached-photos.service.ts';

let t: TestApp;
let uploadsDir: string;
let mod: Agent;
beforeAll(async () => {
  uploadsDir = await mkdtemp(join(tmpdir(), 'scanwright-attached-'));
  t = await startTestApp({ uploadsDir });
  mod = await signIn(t, (await createUser({ role: 'moderator' })).login);
});
afterAll(async () => {
  await t.close();
  await rm(uploadsDir, { recursive: true, force: true });
});

const storedFiles = async () => (await readdir(uploadsDir)).filter((f) => !f.startsWith('.')).sort();

function upload(agent: Agent, path: string, files: Buffer[], alt: string | string[] = 'The bar on a ruler') {
  let req = agent.post(path).set('X-CSRF-Token', agent.csrf);
  for (const a of [alt].flat()) req = req.field('alt', a);
  for (const [i, f] of files.entries()) req = req.attach('photos', f, { filename: `p${i}.jpg`, contentType: 'image/jpeg' });
  return req;
}

async function maker() {
  const user = await createUser();
  return { user, agent: await signIn(t, user.login) };
}

async function listingOf(ownerId: number) {
  const part = await createPart();
  return Listing.create({
    ownerId,
    partId: part.id,
    kind: 'offering',
    quantity: 2,
    condition: 'salvaged-tested',
    priceKind: 'free',
    priceAmount: null,
    currency: null,
    region: 'Here',
    shipsTo: null,
    notes: null,
  });
}

describe('part photos', () => {
  test('when the proposer uploads two photos, then both are stored as WebP variants and the part page lists them in order', async () => {
    const { user, agent } = await maker();
    const part = await createPart({ proposedById: user.id, status: 'proposed' });
    const res = await upload(
      agent,
      `/api/parts/${part.id}/photos`,
      [await img.jpeg(64, 48), await img.jpeg(48, 64)],
      ['Front with markings', 'Side, showing the brass shim'],
    );
    expect(res.status).toBe(201);
    expect(res.body.photos.map((p: { alt: string; position: number }) => [p.alt, p.position])).toEqual([
      ['Front with markings', 0],
      ['Side, showing the brass shim', 1],
    ]);
    const files = await storedFiles();
    for (const p of res.body.photos) {
      expect(files).toContain(basename(p.url));
      expect(files).toContain(basename(p.thumbUrl));
      expect(p.url).toMatch(/^\/uploads\/[a-f0-9]{64}\.webp$/);
    }
    const detail = await agent.get(`/api/parts/${part.id}`);
    expect(detail.body.photos.map((p: { alt: string }) => p.alt)).toEqual(['Front with markings', 'Side, showing the brass shim']);
    expect(detail.body.abilities).toEqual({ editPhotos: true });
  });

  test('when another maker or a visitor looks at a listed part, then they see its photos but may not edit them', async () => {
    const { user, agent } = await maker();
    const part = await createPart({ proposedById: user.id });
    expect((await upload(agent, `/api/parts/${part.id}/photos`, [await img.jpeg(40, 30)])).status).toBe(201);
    const other = await maker();
    const seen = await other.agent.get(`/api/parts/${part.id}`);
    expect(seen.body.photos).toHaveLength(1);
    expect(seen.body.abilities).toEqual({ editPhotos: false });
    expect((await request(t.app).get(`/api/parts/${part.id}`)).body.abilities).toEqual({ editPhotos: false });
    expect(await (await mod.get(`/api/parts/${part.id}`)).body.abilities).toEqual({ editPhotos: true });
    const refused = await upload(other.agent, `/api/parts/${part.id}/photos`, [await img.jpeg(40, 30)]);
    expect(refused.status).toBe(403);
    expect(refused.body.error.code).toBe('forbidden');
  });

  test("when another maker tries a proposed part's photos, then 404 (unlisted parts are invisible to them)", async () => {
    const owner = await maker();
    const part = await createPart({ proposedById: owner.user.id, status: 'proposed' });
    const other = await maker();
    expectError(await upload(other.agent, `/api/parts/${part.id}/photos`, [await img.jpeg(40, 30)]), 404, 'not_found');
    expectError(await upload(other.agent, `/api/parts/999999999/photos`, [await img.jpeg(40, 30)]), 404, 'not_found');
  });

  test('when the file is not an image, then 415 and neither a row nor a file is left', async () => {
    const { user, agent } = await maker();
    const part = await createPart({ proposedById: user.id });
    const before = await storedFiles();
    const res = await upload(agent, `/api/parts/${part.id}/photos`, [Buffer.from('<svg xmlns="http://www.w3.org/2000/svg"/>')]);
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('unsupported_media_type');
    expect(await PartPhoto.count({ where: { partId: part.id } })).toBe(0);
    expect(await storedFiles()).toEqual(before);
  });

  test('when alt text is missing, then 400 validation_failed and nothing is stored', async () => {
    const { user, agent } = await maker();
    const part = await createPart({ proposedById: user.id });
    const res = await upload(agent, `/api/parts/${part.id}/photos`, [await img.jpeg(40, 30)], []);
    expectError(res, 400, 'validation_failed', 'alt');
    expect(await PartPhoto.count({ where: { partId: part.id } })).toBe(0);
  });

  test(`when a part would get more than ${MAX_ATTACHED_PHOTOS} photos, then 409 too_many_photos and the new files are removed again`, async () => {
    const { user, agent } = await maker();
    const part = await createPart({ proposedById: user.id });
    for (let i = 0; i < MAX_ATTACHED_PHOTOS - 1; i++) {
      await PartPhoto.create({
        partId: part.id,
        contentHash: `${i}`.padStart(64, 'f'),
        displayFile: 'x.webp',
        thumbFile: 'x-t.webp',
        width: 4,
        height: 3,
        alt: `old ${i}`,
        position: i,
      });
    }
    const before = await storedFiles();
    const res = await upload(agent, `/api/parts/${part.id}/photos`, [await img.jpeg(40, 30), await img.jpeg(30, 40)]);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('too_many_photos');
    expect(await PartPhoto.count({ where: { partId: part.id } })).toBe(MAX_ATTACHED_PHOTOS - 1);
    expect(await storedFiles()).toEqual(before);
    expect((await upload(agent, `/api/parts/${part.id}/photos`, [await img.jpeg(40, 30)])).status).toBe(201);
  });

  test('when a photo is deleted, then its files go, unless another photo shows the same content', async () => {
    const { user, agent } = await maker();
    const part = await createPart({ proposedById: user.id });
    const same = await img.jpeg(40, 30);
    const first = (await upload(agent, `/api/parts/${part.id}/photos`, [same])).body.photos[0];
    const listing = await listingOf(user.id);
    const second = (await upload(agent, `/api/listings/${listing.id}/photos`, [same])).body.photos[0];
    expect(basename(second.url)).toBe(basename(first.url));
    const del = await agent.delete(`/api/parts/${part.id}/photos/${first.id}`).set('X-CSRF-Token', agent.csrf);
    expect(del.status).toBe(204);
    expect(await storedFiles()).toContain(basename(first.url));
    expect((await agent.delete(`/api/listings/${listing.id}/photos/${second.id}`).set('X-CSRF-Token', agent.csrf)).status).toBe(204);
    expect(await storedFiles()).not.toContain(basename(first.url));
    expect(await storedFiles()).not.toContain(basename(first.thumbUrl));
  });

  test('when a photo id belongs to another part, then 404 and it stays', async () => {
    const { user, agent } = await maker();
    const mine = await createPart({ proposedById: user.id });
    const theirs = await createPart();
    const photo = await PartPhoto.create({
      partId: theirs.id,
      contentHash: 'e'.repeat(64),
      displayFile: 'y.webp',
      thumbFile: 'y-t.webp',
      width: 4,
      height: 3,
      alt: 'theirs',
    });
    const res = await agent.delete(`/api/parts/${mine.id}/photos/${photo.id}`).set('X-CSRF-Token', agent.csrf);
    expectError(res, 404, 'not_found');
    expect(await PartPhoto.findByPk(photo.id)).not.toBeNull();
  });

  test('when the part was merged into another, then its photos cannot change (409 already_merged)', async () => {
    const { user, agent } = await maker();
    const into = await createPart();
    const merged = await createPart({ proposedById: user.id });
    await Part.update({ status: 'rejected', mergedIntoId: into.id }, { where: { id: merged.id } });
    const res = await upload(mod, `/api/parts/${merged.id}/photos`, [await img.jpeg(40, 30)]);
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('already_merged');
    expect((await agent.get(`/api/parts/${merged.id}`)).body.abilities).toEqual({ editPhotos: false });
  });
});

describe('listing photos', () => {
  test('when the owner uploads a photo, then the listing, the exchange list and my listings show it', async () => {
    const { user, agent } = await maker();
    const listing = await listingOf(user.id);
    const res = await upload(agent, `/api/listings/${listing.id}/photos`, [await img.jpeg(80, 60)], 'Three discs in an egg box');
    expect(res.status).toBe(201);
    const [photo] = res.body.photos;
    expect((await request(t.app).get(`/api/listings/${listing.id}`)).body.photos).toEqual([photo]);
    const list = await request(t.app).get(`/api/listings?partId=${listing.partId}`);
    expect(list.body.items[0].photos).toEqual([photo]);
    const mine = await agent.get('/api/listings/mine');
    expect(mine.body.items.find((l: { id: number }) => l.id === listing.id).photos).toEqual([photo]);
  });

  // A visitor's 401 is in the authorization matrix.
  test('when a moderator or another maker tries, then 403 and nothing is stored', async () => {
    const { user } = await maker();
    const listing = await listingOf(user.id);
    const other = await maker();
    expectError(await upload(other.agent, `/api/listings/${listing.id}/photos`, [await img.jpeg(40, 30)]), 403, 'forbidden');
    expectError(await upload(mod, `/api/listings/${listing.id}/photos`, [await img.jpeg(40, 30)]), 403, 'forbidden');
    expect(await ListingPhoto.count({ where: { listingId: listing.id } })).toBe(0);
  });

  test("when a listing is hidden, then another maker's attempt answers 404, the owner's still works", async () => {
    const { user, agent } = await maker();
    const listing = await listingOf(user.id);
    await listing.update({ hiddenAt: new Date(), hiddenNote: 'Checking' });
    const other = await maker();
    expectError(await upload(other.agent, `/api/listings/${listing.id}/photos`, [await img.jpeg(40, 30)]), 404, 'not_found');
    expect((await upload(agent, `/api/listings/${listing.id}/photos`, [await img.jpeg(40, 30)])).status).toBe(201);
  });
});

describe('alt text and order', () => {
  test('when the proposer rewrites a description and reverses the order, then the part page shows the new text in the new order', async () => {
    const { user, agent } = await maker();
    const part = await createPart({ proposedById: user.id });
    const [a, b, c] = (
      await upload(
        agent,
        `/api/parts/${part.id}/photos`,
        [await img.jpeg(40, 30), await img.jpeg(30, 40), await img.jpeg(50, 40)],
        ['one', 'two', 'three'],
      )
    ).body.photos;
    const patched = await agent
      .patch(`/api/parts/${part.id}/photos/${b.id}`)
      .set('X-CSRF-Token', agent.csrf)
      .send({ alt: '  The markings, read under a loupe  ' });
    expect(patched.status).toBe(200);
    expect(patched.body).toMatchObject({ id: b.id, alt: 'The markings, read under a loupe', url: b.url });
    const reordered = await agent
      .put(`/api/parts/${part.id}/photos/order`)
      .set('X-CSRF-Token', agent.csrf)
      .send({ photoIds: [c.id, b.id, a.id] });
    expect(reordered.status).toBe(200);
    expect(reordered.body.photos.map((p: { id: number; position: number }) => [p.id, p.position])).toEqual([
      [c.id, 0],
      [b.id, 1],
      [a.id, 2],
    ]);
    const detail = await request(t.app).get(`/api/parts/${part.id}`);
    expect(detail.body.photos.map((p: { alt: string }) => p.alt)).toEqual(['three', 'The markings, read under a loupe', 'one']);
  });

  test('when the order leaves one out, repeats one or names a foreign photo, then 400 photo_ids_mismatch and the order stays', async () => {
    const { user, agent } = await maker();
    const listing = await listingOf(user.id);
    const [a, b] = (
      await upload(agent, `/api/listings/${listing.id}/photos`, [await img.jpeg(40, 30), await img.jpeg(30, 40)], ['first', 'second'])
    ).body.photos;
    const foreign = await ListingPhoto.create({
      listingId: (await listingOf(user.id)).id,
      contentHash: 'd'.repeat(64),
      displayFile: 'z.webp',
      thumbFile: 'z-t.webp',
      width: 4,
      height: 3,
      alt: 'elsewhere',
    });
    for (const photoIds of [[a.id], [a.id, a.id], [a.id, foreign.id], [b.id, a.id, foreign.id]]) {
      const res = await agent.put(`/api/listings/${listing.id}/photos/order`).set('X-CSRF-Token', agent.csrf).send({ photoIds });
      expectError(res, 400, 'validation_failed', 'photoIds');
      expect(res.body.error.details[0].code).toBe('photo_ids_mismatch');
    }
    expect((await request(t.app).get(`/api/listings/${listing.id}`)).body.photos.map((p: { id: number }) => p.id)).toEqual([a.id, b.id]);
  });

  test("when a description is blank or the photo is not this listing's, then 400 and 404, and nothing changes", async () => {
    const { user, agent } = await maker();
    const listing = await listingOf(user.id);
    const [a] = (await upload(agent, `/api/listings/${listing.id}/photos`, [await img.jpeg(40, 30)], 'kept')).body.photos;
    expectError(
      await agent.patch(`/api/listings/${listing.id}/photos/${a.id}`).set('X-CSRF-Token', agent.csrf).send({ alt: '   ' }),
      400,
      'validation_failed',
      'alt',
    );
    const other = await listingOf(user.id);
    expectError(
      await agent.patch(`/api/listings/${other.id}/photos/${a.id}`).set('X-CSRF-Token', agent.csrf).send({ alt: 'moved?' }),
      404,
      'not_found',
    );
    expect((await ListingPhoto.findByPk(a.id))?.alt).toBe('kept');
  });
});
