import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { randomBytes } from 'node:crypto';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { readPool } from '../../server/db/read-pool.ts';
import { invalidatePublicReads } from '../../server/services/public-read-cache.ts';
import { Actuator } from '../../server/models/actuator.model.ts';
import { Build } from '../../server/models/build.model.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { Listing } from '../../server/models/listing.model.ts';
import { ListingPhoto } from '../../server/models/listing-photo.model.ts';
import { LogEntry } from '../../server/models/log-entry.model.ts';
import { Photo } from '../../server/models/photo.model.ts';
import { Report } from '../../server/models/report.model.ts';

/**
 * Most SQL statements one page may issue with a cold cache (Sequelize and the plain read pool together). A bound
 * holds for small and large pages alike: each test builds two sizes and expects the same count.
 */
const BOUNDS = {
  buildsIndex: 6, // count + page, then owners, photos, actuators with parts, headline runs
  buildPage: 6, // the build, then owner, photos, entries, actuators with parts, runs
  partPage: 5, // the part, then runs with builds and makers, listings with owners, proposer, photos
  exchangeIndex: 5, // count + page, then parts, owners, photos
  listingPage: 4, // the listing, then its part, owner, photos
  reviewQueue: 25, // session + user (3), five lists with counts (10), authors, four grouped counts, four run lookups, three report targets
};

/** The mail outbox worker polls on its own timer; its statements belong to no request. */
const OUTBOX_POLL = /\bmail_outbox\b/;

let t: TestApp;
let statements: string[] = [];
let ownerId: number;
let mod: Agent;
/** Sequelize reads `options.logging` at every query; its typings leave `options` out. */
const options = () => (t.handle.sequelize as unknown as { options: { logging: false | ((sql: string) => void) } }).options;

beforeAll(async () => {
  t = await startTestApp();
  const sequelize = t.handle.sequelize;
  options().logging = (sql: string) => void statements.push(sql);
  const pool = readPool(sequelize);
  const query = pool.query.bind(pool);
  pool.query = ((sql: unknown, values?: unknown) => {
    statements.push(String(typeof sql === 'object' && sql ? (sql as { sql: string }).sql : sql));
    return query(sql as string, values);
  }) as typeof pool.query;
  ownerId = (await createUser()).id;
  const m = await createUser({ role: 'moderator' });
  mod = await signIn(t, m.login);
});
afterAll(async () => {
  options().logging = false;
  await t.close();
});

/** Statements issued while serving one GET from a cold cache (as a visitor unless an agent is given). */
async function countGet(path: string, agent?: Agent): Promise<number> {
  invalidatePublicReads();
  statements = [];
  await (agent ?? request(t.app)).get(path).expect(200);
  const n = statements.filter((sql) => !OUTBOX_POLL.test(sql)).length;
  if (process.env.SHOW_QUERY_COUNTS) process.stdout.write(`${n} statements: GET ${path}\n`);
  return n;
}

/** A published build with `actuators` actuators × `runs` runs each, `extras` photos and entries, tagged for search. */
async function buildOfSize(tag: string, actuators: number, runs: number, extras: number) {
  const part = await createPart({ proposedById: ownerId });
  const build = await createBuildRow(ownerId, { status: 'published', title: `${tag} build` });
  for (let a = 0; a < actuators; a++) {
    const first = await createRunRow({ buildId: build.id, partId: part.id, ownerId, gainNmPerV: 100 + a, status: 'accepted' });
    for (let r = 1; r < runs; r++) {
      const run = await createRunRow({
        buildId: build.id,
        partId: part.id,
        ownerId,
        gainNmPerV: 100 + r,
        status: r % 2 ? 'pending' : 'accepted',
      });
      await CalibrationRun.update({ actuatorId: first.actuatorId }, { where: { id: run.id } });
      await Actuator.destroy({ where: { id: run.actuatorId } });
    }
  }
  for (let i = 0; i < extras; i++) {
    const entry = await LogEntry.create({ buildId: build.id, entryDate: '2026-11-01', title: `Entry ${i}`, body: 'Notes.' });
    const hash = randomBytes(8).toString('hex');
    await Photo.create({
      buildId: build.id,
      entryId: i % 2 ? entry.id : null,
      ownerId,
      contentHash: hash,
      displayFile: `${hash}.webp`,
      thumbFile: `${hash}-thumb.webp`,
      width: 800,
      height: 600,
      alt: `Photo ${i}`,
      position: i,
    });
  }
  return { build, part };
}

/** `n` open listings of a part, each with `photos` photos. */
async function listingsOf(partId: number, n: number, photos: number): Promise<Listing[]> {
  const rows: Listing[] = [];
  for (let i = 0; i < n; i++) {
    const l = await Listing.create({
      ownerId,
      partId,
      kind: 'offering',
      quantity: 1 + i,
      condition: 'salvaged-tested',
      priceKind: 'free',
      priceAmount: null,
      currency: null,
      region: 'Test region',
      shipsTo: null,
      notes: null,
    });
    for (let p = 0; p < photos; p++) {
      const hash = randomBytes(8).toString('hex');
      await ListingPhoto.create({
        listingId: l.id,
        ownerId,
        contentHash: hash,
        displayFile: `${hash}.webp`,
        thumbFile: `${hash}-thumb.webp`,
        width: 800,
        height: 600,
        alt: `Photo ${p}`,
        position: p,
      });
    }
    rows.push(l);
  }
  return rows;
}

describe('queries per public page', () => {
  let small: Awaited<ReturnType<typeof buildOfSize>>;
  let large: Awaited<ReturnType<typeof buildOfSize>>;
  const smallTag = `qc-small-${randomBytes(3).toString('hex')}`;
  const largeTag = `qc-large-${randomBytes(3).toString('hex')}`;
  beforeAll(async () => {
    small = await buildOfSize(smallTag, 1, 1, 1);
    large = await buildOfSize(largeTag, 3, 3, 3);
    for (let i = 0; i < 2; i++) await buildOfSize(largeTag, 3, 3, 3);
  });

  test('when the builds index lists one small build or three large ones, then it issues the same few statements', async () => {
    const one = await countGet(`/api/builds?q=${smallTag}`);
    const three = await countGet(`/api/builds?q=${largeTag}`);
    expect(three).toBe(one);
    expect(three).toBeLessThanOrEqual(BOUNDS.buildsIndex);
  });

  test('when a build has 3 actuators × 3 runs, photos and entries, then its page issues as many statements as a build with one of each', async () => {
    const one = await countGet(`/api/builds/${small.build.id}`);
    const many = await countGet(`/api/builds/${large.build.id}`);
    expect(many).toBe(one);
    expect(many).toBeLessThanOrEqual(BOUNDS.buildPage);
  });

  test('when a part has many runs and listings, then its page issues as many statements as a part with one of each', async () => {
    await listingsOf(small.part.id, 1, 0);
    await listingsOf(large.part.id, 4, 2);
    const one = await countGet(`/api/parts/${small.part.id}`);
    const many = await countGet(`/api/parts/${large.part.id}`);
    expect(many).toBe(one);
    expect(many).toBeLessThanOrEqual(BOUNDS.partPage);
  });

  test('when the exchange shows one listing or five with photos, then it issues the same few statements', async () => {
    const a = await createPart({ proposedById: ownerId });
    const b = await createPart({ proposedById: ownerId });
    await listingsOf(a.id, 1, 0);
    await listingsOf(b.id, 5, 2);
    const one = await countGet(`/api/listings?partId=${a.id}`);
    const five = await countGet(`/api/listings?partId=${b.id}`);
    expect(five).toBe(one);
    expect(five).toBeLessThanOrEqual(BOUNDS.exchangeIndex);
  });

  test('when a listing has photos, then its page issues as many statements as one without', async () => {
    const part = await createPart({ proposedById: ownerId });
    const [bare] = await listingsOf(part.id, 1, 0);
    const [rich] = await listingsOf(part.id, 1, 3);
    const one = await countGet(`/api/listings/${bare!.id}`);
    const many = await countGet(`/api/listings/${rich!.id}`);
    expect(many).toBe(one);
    expect(many).toBeLessThanOrEqual(BOUNDS.listingPage);
  });

  test('when a page is read twice within the cache window, then the second read issues fewer statements', async () => {
    const cold = await countGet(`/api/parts/${large.part.id}`);
    statements = [];
    await request(t.app).get(`/api/parts/${large.part.id}`).expect(200);
    expect(statements.filter((sql) => !OUTBOX_POLL.test(sql)).length).toBeLessThan(cold);
  });
});

describe('queries for the review queue', () => {
  /** One of everything the desk shows: submitted and edited builds, a pending run, a proposed part, reports of each kind. */
  async function addDeskWork() {
    await createPart({ status: 'proposed', proposedById: ownerId });
    const listed = await createPart();
    const submitted = await createBuildRow(ownerId, { status: 'submitted' });
    await Build.update({ submittedAt: new Date() }, { where: { id: submitted.id } });
    const edited = await createBuildRow(ownerId, { status: 'published' });
    await Build.update({ editedSinceReview: true }, { where: { id: edited.id } });
    const run = await createRunRow({ buildId: edited.id, partId: listed.id, ownerId, gainNmPerV: 120, status: 'pending' });
    await createRunRow({ buildId: submitted.id, partId: listed.id, ownerId, gainNmPerV: 90, status: 'pending' });
    const [listing] = await listingsOf(listed.id, 1, 0);
    const targets: Array<[Report['targetType'], number]> = [
      ['build', edited.id],
      ['part', listed.id],
      ['run', run.id],
      ['listing', listing!.id],
    ];
    for (const [targetType, targetId] of targets)
      await Report.create({ reporterId: ownerId, targetType, targetId, reason: 'spam', note: null });
  }

  test('when more builds, runs, parts and reports wait, then the queue issues the same statements as before', async () => {
    await addDeskWork();
    const before = await countGet('/api/review/queue', mod);
    await addDeskWork();
    await addDeskWork();
    const after = await countGet('/api/review/queue', mod);
    expect(after).toBe(before);
    expect(after).toBeLessThanOrEqual(BOUNDS.reviewQueue);
  });
});
