import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { randomBytes } from 'node:crypto';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { Part } from '../../server/models/part.model.ts';
import { Actuator } from '../../server/models/actuator.model.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { Listing } from '../../server/models/listing.model.ts';
import { PartPhoto } from '../../server/models/part-photo.model.ts';
import { recomputePartStats } from '../../server/services/part-stats.service.ts';

let t: TestApp;
const tag = `zq${randomBytes(4).toString('hex')}`;
interface Seeded {
  id: number;
  name: string;
  category: string;
  median: number | null;
  runs: number;
  safeVolts: number | null;
  createdAt: number;
}
const seeded: Seeded[] = [];

/** Deterministic pseudo-random parts: some without runs, various categories, gains and voltage ratings. */
beforeAll(async () => {
  t = await startTestApp();
  const cats = ['bimorph', 'buzzer-disc', 'stack', 'tube'];
  for (let i = 0; i < 23; i++) {
    const runs = i % 5 === 0 ? 0 : (i % 4) + 1;
    const median = runs ? Math.round(((i * 37) % 180) + 5) : null;
    const p = await Part.create(
      {
        category: cats[i % 4] as 'bimorph',
        name: `${tag} part ${String(i).padStart(2, '0')}`,
        salvageSource: 'test',
        material: null,
        lengthMm: null,
        widthMm: null,
        thicknessMm: null,
        outerDiameterMm: null,
        wallMm: null,
        layers: null,
        capacitanceNf: null,
        safeVolts: i % 3 === 0 ? null : 20 + i * 5,
        notes: null,
        status: 'accepted',
        proposedById: null,
        gainMedianNmPerV: median,
        acceptedRunCount: runs,
        createdAt: new Date(Date.UTC(2026, 0, 1 + i)),
        updatedAt: new Date(),
      },
      { silent: true },
    );
    seeded.push({ id: p.id, name: p.name, category: p.category, median, runs, safeVolts: p.safeVolts, createdAt: p.createdAt.getTime() });
  }
  await Part.create({
    category: 'bimorph',
    name: `${tag} proposed`,
    salvageSource: null,
    material: null,
    lengthMm: null,
    widthMm: null,
    thicknessMm: null,
    outerDiameterMm: null,
    wallMm: null,
    layers: null,
    capacitanceNf: null,
    safeVolts: null,
    notes: null,
    status: 'proposed',
    proposedById: null,
  });
});
afterAll(async () => {
  await t.close();
});

/** The independent computation: filter and sort the seeded rows in plain JS. */
interface Filters {
  category?: string;
  gainMin?: number;
  gainMax?: number;
  minRuns?: number;
  minVolts?: number;
  maxVolts?: number;
  unrated?: 'include';
  sort?: string;
}

/** The seeded parts a search matches but for their voltage rating. */
const otherFilters = (f: Filters) =>
  seeded.filter(
    (p) =>
      (!f.category || p.category === f.category) &&
      (f.gainMin === undefined || (p.median !== null && p.median >= f.gainMin)) &&
      (f.gainMax === undefined || (p.median !== null && p.median <= f.gainMax)) &&
      (f.minRuns === undefined || p.runs >= f.minRuns),
  );

/** The independent rating check: inside [minVolts, maxVolts]; no stated rating only when asked for. */
const rated = (f: Filters, v: number | null) =>
  (f.minVolts === undefined && f.maxVolts === undefined) ||
  (v === null ? f.unrated === 'include' : (f.minVolts === undefined || v >= f.minVolts) && (f.maxVolts === undefined || v <= f.maxVolts));

function expected(f: Filters) {
  let rows = otherFilters(f).filter((p) => rated(f, p.safeVolts));
  const by = (key: (p: Seeded) => number | string, dir: 1 | -1) => (a: Seeded, b: Seeded) => {
    const ka = key(a);
    const kb = key(b);
    if (ka === kb) return dir * (a.id - b.id);
    return dir * (ka < kb ? -1 : 1);
  };
  const nullsLow = (p: Seeded) => p.median ?? -Infinity;
  const sorts: Record<string, (a: Seeded, b: Seeded) => number> = {
    gain: by(nullsLow, 1),
    '-gain': by(nullsLow, -1),
    runs: by((p) => p.runs, 1),
    '-runs': by((p) => p.runs, -1),
    newest: by((p) => p.createdAt, -1),
    name: by((p) => p.name, 1),
  };
  rows = rows.slice().sort(sorts[f.sort ?? 'name']);
  return rows.map((r) => r.id);
}

async function search(params: Record<string, string | number>) {
  const qs = new URLSearchParams({
    q: tag,
    pageSize: '100',
    ...Object.fromEntries(Object.entries(params).map(([k, v]) => [k, String(v)])),
  });
  return request(t.app).get(`/api/parts?${qs}`);
}

describe('GET /api/parts', () => {
  test.each([
    [{}],
    [{ category: 'stack' }],
    [{ gainMin: 50 }],
    [{ gainMax: 40 }],
    [{ gainMin: 20, gainMax: 120 }],
    [{ minRuns: 3 }],
    [{ maxVolts: 80 }],
    [{ minVolts: 60 }],
    [{ minVolts: 60, maxVolts: 100 }],
    [{ minVolts: 60, unrated: 'include' }],
    [{ maxVolts: 80, unrated: 'include', sort: '-gain' }],
    [{ unrated: 'include' }],
    [{ category: 'bimorph', gainMin: 10, minRuns: 1, maxVolts: 200 }],
    [{ sort: 'gain' }],
    [{ sort: '-gain' }],
    [{ sort: 'runs' }],
    [{ sort: '-runs' }],
    [{ sort: 'newest' }],
    [{ sort: 'name' }],
    [{ gainMin: 0, sort: '-gain' }],
  ])('when searching with %o, then the ids equal an independent filter-and-sort of the seeded parts', async (f) => {
    const res = await search(f as Record<string, string | number>);
    expect(res.status).toBe(200);
    const ids = expected(f as never);
    expect(res.body.total).toBe(ids.length);
    expect(res.body.items.map((p: { id: number }) => p.id)).toEqual(ids);
  });

  test.each([[{ minVolts: 60 }], [{ maxVolts: 80, category: 'stack' }], [{ minVolts: 60, unrated: 'include' }], [{}]] as [Filters][])(
    'when searching with %o, then unratedHidden counts the matches a voltage filter hides for want of a rating',
    async (f) => {
      const res = await search(f as Record<string, string | number>);
      expect(res.status).toBe(200);
      const hidden = otherFilters(f).filter((p) => p.safeVolts === null && !rated(f, null)).length;
      expect(res.body.unratedHidden).toBe(hidden);
      if (f.minVolts !== undefined && !f.unrated) expect(hidden).toBeGreaterThan(0);
    },
  );

  test('when a gain range is given, then parts without accepted runs are left out even at gainMin=0', async () => {
    const res = await search({ gainMin: 0 });
    expect(res.body.items.every((p: { gainMedianNmPerV: number | null }) => p.gainMedianNmPerV !== null)).toBe(true);
    expect(res.body.items.some((p: { name: string }) => p.name.includes('proposed'))).toBe(false);
  });

  test('when paging, then pages partition the result and the last page is short; past the end is empty', async () => {
    const ids = expected({ sort: 'gain' });
    const pages = [];
    for (let page = 1; page <= 3; page++)
      pages.push(...(await search({ sort: 'gain', pageSize: 10, page })).body.items.map((p: { id: number }) => p.id));
    expect(pages).toEqual(ids);
    const past = await search({ sort: 'gain', pageSize: 10, page: 4 });
    expect(past.body).toMatchObject({ items: [], total: ids.length, page: 4, pageSize: 10 });
  });

  test('when an item is listed, then it carries the headline figures', async () => {
    const res = await search({ minRuns: 1, pageSize: 1 });
    expect(res.body.items[0]).toMatchObject({
      id: expect.any(Number),
      name: expect.any(String),
      category: expect.any(String),
      gainMedianNmPerV: expect.any(Number),
      acceptedRunCount: expect.any(Number),
      buildCount: expect.any(Number),
    });
    expect(res.body.items[0]).toHaveProperty('gainP25NmPerV');
    expect(res.body.items[0]).toHaveProperty('gainP75NmPerV');
  });

  test.each([
    'gainMin=abc',
    'gainMin=-1',
    'gainMin=50&gainMax=10',
    'minRuns=1.5',
    'sort=loudest',
    'category=crystal',
    'page=0',
    'pageSize=101',
    'maxVolts=NaN',
    'minVolts=-5',
    'minVolts=100&maxVolts=60',
    'unrated=yes',
    'gainMax=Infinity',
    'unknown=1',
    'format=xml',
  ])('when the query is %s, then 400 with the error shape', async (qs) => {
    const res = await request(t.app).get(`/api/parts?${qs}`);
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ error: { code: 'validation_failed', message: expect.any(String) } });
  });

  test('when format=csv, then the whole search comes as CSV with a header row and units in the column names', async () => {
    const res = await search({ format: 'csv', sort: 'gain', minRuns: 1 });
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toMatch(/attachment; filename="?scanwright-parts-\d{4}-\d{2}-\d{2}\.csv"?/);
    const lines = res.text.trim().split(/\r?\n/);
    expect(lines[0]).toBe(
      'id,name,category,salvage_source,material,safe_volts_V,capacitance_nF,gain_median_nm_per_V,gain_p25_nm_per_V,gain_p75_nm_per_V,accepted_runs,builds,created_at',
    );
    expect(lines.slice(1).map((l) => Number(l.split(',')[0]))).toEqual(expected({ sort: 'gain', minRuns: 1 }));
  });

  test('when Accept is text/csv, then CSV; when format=json, then the full array', async () => {
    const csv = await request(t.app).get(`/api/parts?q=${tag}`).set('Accept', 'text/csv');
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    const json = await search({ format: 'json' });
    expect(Array.isArray(json.body)).toBe(true);
    expect(json.body.map((p: { id: number }) => p.id)).toEqual(expected({}));
  });

  test('when a name starts with a formula character, then the CSV cell is escaped', async () => {
    const p = await createPart({ name: `=HYPERLINK("x") ${tag}x` });
    const res = await request(t.app).get(`/api/parts?q=${tag}x&format=csv`);
    expect(res.text).toContain(`"'=HYPERLINK`);
    await p.destroy();
  });

  test('when the histogram is asked for, then bins are log-spaced and counts are positive', async () => {
    const res = await request(t.app).get('/api/parts/histogram');
    expect(res.status).toBe(200);
    expect(res.body.binsPerDecade).toBe(5);
    for (const b of res.body.bins) {
      expect(b.toNmPerV / b.fromNmPerV).toBeCloseTo(10 ** 0.2, 10);
      expect(b.count).toBeGreaterThan(0);
    }
  });
});

describe('POST /api/parts and GET /api/parts/:id', () => {
  test('when a maker proposes a part, then 201 proposed, visible to them and moderators only', async () => {
    const maker = await createUser();
    const a = await signIn(t, maker.login);
    const res = await a
      .post('/api/parts')
      .set('X-CSRF-Token', a.csrf)
      .send({ category: 'shear-plate', name: 'Shear plate 10 × 10 mm', salvageSource: 'old printer', thicknessMm: 0.5, safeVolts: 200 });
    expect(res.status).toBe(201);
    expect(res.body).toEqual({ id: expect.any(Number), status: 'proposed' });
    expect((await a.get(`/api/parts/${res.body.id}`)).status).toBe(200);
    expectError(await request(t.app).get(`/api/parts/${res.body.id}`), 404, 'not_found');
    const other = await signIn(t, (await createUser()).login);
    expectError(await other.get(`/api/parts/${res.body.id}`), 404, 'not_found');
  });

  test.each([
    [{ category: 'crystal', name: 'x y z' }, 'category'],
    [{ category: 'tube', name: 'ab' }, 'name'],
    [{ category: 'tube', name: 'Tube', lengthMm: -1 }, 'lengthMm'],
    [{ category: 'tube', name: 'Tube', layers: 2.5 }, 'layers'],
    [{ category: 'tube', name: 'Tube', status: 'accepted' }, ''],
  ])('when the proposal is %o, then 400 on "%s"', async (body, field) => {
    const a = await signIn(t, (await createUser()).login);
    expectError(await a.post('/api/parts').set('X-CSRF-Token', a.csrf).send(body), 400, 'validation_failed', field);
  });

  test('when a listed part has accepted runs and listings, then its page lists them with build, maker and method', async () => {
    const owner = await createUser();
    const part = await createPart({ lengthMm: 12, thicknessMm: 0.6 });
    const b = await createBuildRow(owner.id, { status: 'published' });
    const run = await createRunRow({ buildId: b.id, partId: part.id, ownerId: owner.id, gainNmPerV: 99, status: 'accepted' });
    await createRunRow({ buildId: b.id, partId: part.id, ownerId: owner.id, gainNmPerV: 300, status: 'pending' });
    await Part.sequelize!.transaction((tx) => recomputePartStats(part.id, tx));
    await Listing.create({
      ownerId: owner.id,
      partId: part.id,
      kind: 'offering',
      quantity: 2,
      condition: 'new',
      priceKind: 'free',
      priceAmount: null,
      currency: null,
      region: 'Here',
      shipsTo: null,
      notes: null,
    });
    const res = await request(t.app).get(`/api/parts/${part.id}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      id: part.id,
      stats: { acceptedRunCount: 1, buildCount: 1 },
      runs: [
        { id: run.id, buildId: b.id, buildTitle: b.title, maker: owner.login, actuator: { label: null, axis: 'X' }, method: 'indicator' },
      ],
      listings: [{ kind: 'offering', quantity: 2, priceLabel: 'Free', owner: owner.login }],
    });
    expect(res.body.expectedGain.gainNmPerV).toBeCloseTo(102.6, 1); // [calc, FIELD.md: 12 × 0.6 mm PZT-5A series bimorph]
  });
});

describe('POST /api/parts/:id/merge', () => {
  let mod: Agent;
  beforeAll(async () => {
    mod = await signIn(t, (await createUser({ role: 'moderator' })).login);
  });

  test('when a moderator merges a duplicate, then runs, actuators, listings and photos move, stats are recomputed and the trail records it', async () => {
    const owner = await createUser();
    const keep = await createPart();
    const dup = await createPart();
    const b = await createBuildRow(owner.id, { status: 'published' });
    const r1 = await createRunRow({ buildId: b.id, partId: keep.id, ownerId: owner.id, gainNmPerV: 100, status: 'accepted' });
    const r2 = await createRunRow({ buildId: b.id, partId: dup.id, ownerId: owner.id, gainNmPerV: 120, status: 'accepted' });
    await Listing.create({
      ownerId: owner.id,
      partId: dup.id,
      kind: 'seeking',
      quantity: 1,
      condition: 'new',
      priceKind: 'swap',
      priceAmount: null,
      currency: null,
      region: 'Here',
      shipsTo: null,
      notes: null,
    });
    const photo = (partId: number, alt: string) =>
      PartPhoto.create({
        partId,
        contentHash: alt.padEnd(64, '0'),
        displayFile: 'a.webp',
        thumbFile: 'a-t.webp',
        width: 4,
        height: 3,
        alt,
      });
    await photo(keep.id, 'kept');
    await photo(dup.id, 'moved');
    const res = await mod
      .post(`/api/parts/${dup.id}/merge`)
      .set('X-CSRF-Token', mod.csrf)
      .send({ intoPartId: keep.id, note: 'Same bar, two names.' });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ id: dup.id, mergedIntoId: keep.id, moved: { actuators: 1, runs: 1, listings: 1, photos: 1 } });
    expect((await request(t.app).get(`/api/parts/${keep.id}`)).body.photos.map((p: { alt: string }) => p.alt)).toEqual(['kept', 'moved']);
    await keep.reload();
    await dup.reload();
    expect(await CalibrationRun.count({ where: { partId: dup.id } })).toBe(0);
    expect(await Actuator.count({ where: { partId: dup.id } })).toBe(0);
    expect(keep.acceptedRunCount).toBe(2);
    expect(keep.gainMedianNmPerV).toBeCloseTo((Math.abs(r1.gainNmPerV) + Math.abs(r2.gainNmPerV)) / 2, 9);
    expect(dup).toMatchObject({ status: 'rejected', mergedIntoId: keep.id, acceptedRunCount: 0 });
    const audit = await mod.get(`/api/review/audit?targetType=part&targetId=${dup.id}`);
    expect(audit.body.items[0]).toMatchObject({ action: 'part.merge' });
    expectError(
      await mod.post(`/api/parts/${dup.id}/merge`).set('X-CSRF-Token', mod.csrf).send({ intoPartId: keep.id, note: 'again' }),
      409,
      'already_merged',
    );
  });

  test('when a maker merges, then 403; into itself, then 400; without a note, then 400', async () => {
    const p = await createPart();
    const q = await createPart();
    const maker = await signIn(t, (await createUser()).login);
    expectError(
      await maker.post(`/api/parts/${p.id}/merge`).set('X-CSRF-Token', maker.csrf).send({ intoPartId: q.id, note: 'x' }),
      403,
      'forbidden',
    );
    expectError(
      await mod.post(`/api/parts/${p.id}/merge`).set('X-CSRF-Token', mod.csrf).send({ intoPartId: p.id, note: 'x' }),
      400,
      'validation_failed',
      'intoPartId',
    );
    expectError(
      await mod.post(`/api/parts/${p.id}/merge`).set('X-CSRF-Token', mod.csrf).send({ intoPartId: q.id }),
      400,
      'validation_failed',
      'note',
    );
  });
});

describe('registry row shape', () => {
  test('when a part is listed, then its row carries every documented field once, flat, with createdAt as the stored instant in ISO 8601', async () => {
    const part = await createPart({ name: `Shape check ${randomBytes(3).toString('hex')}` });
    const res = await request(t.app).get(`/api/parts?q=${encodeURIComponent(part.name)}`);
    expect(res.status).toBe(200);
    const [item] = res.body.items;
    expect(Object.keys(item).sort()).toEqual(
      [
        'id',
        'name',
        'category',
        'status',
        'salvageSource',
        'material',
        'safeVolts',
        'capacitanceNf',
        'acceptedRunCount',
        'buildCount',
        'gainMedianNmPerV',
        'gainP25NmPerV',
        'gainP75NmPerV',
        'gainMinNmPerV',
        'gainMaxNmPerV',
        'hysteresisMedianPct',
        'createdAt',
      ].sort(),
    );
    await part.reload();
    expect(item).toMatchObject({
      id: part.id,
      status: 'accepted',
      safeVolts: 60,
      capacitanceNf: 1,
      acceptedRunCount: 0,
      gainMedianNmPerV: null,
    });
    expect(item.createdAt).toBe(new Date(Math.floor(part.createdAt.getTime() / 1000) * 1000).toISOString());
  });
});
