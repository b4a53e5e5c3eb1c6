// A run counts only while its build is published: part figures, the part page, the registry search and its
// exports, the dataset's parts.csv and the histogram leave out accepted runs of drafts, submitted, returned and
// declined builds; a run of a build not on the desk cannot be decided (409); a build decision or withdrawal
// recomputes its parts' figures in the same transaction.
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import Papa from 'papaparse';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { Part } from '../../server/models/part.model.ts';
import { Build } from '../../server/models/build.model.ts';

let t: TestApp;
let mod: Agent;
beforeAll(async () => {
  t = await startTestApp();
  mod = await signIn(t, (await createUser({ role: 'moderator' })).login);
});
afterAll(async () => {
  await t.close();
});

const post = (a: Agent, path: string, body?: object) => a.post(path).set('X-CSRF-Token', a.csrf).send(body);
const decideRun = (runId: number, decision = 'accept') => post(mod, `/api/review/runs/${runId}/decision`, { decision, note: 'ok' });

/** A listed part with one run accepted through the desk in a published build (40 nm/V) and one accepted run in a build of `status` (299 960 nm/V). */
async function partWithRuns(status: 'draft' | 'submitted' | 'returned' | 'declined') {
  const owner = await createUser();
  const part = await createPart();
  const published = await createBuildRow(owner.id, { status: 'published' });
  const other = await createBuildRow(owner.id, { status });
  const hidden = await createRunRow({ buildId: other.id, partId: part.id, ownerId: owner.id, gainNmPerV: 299_960, status: 'accepted' });
  const counted = await createRunRow({ buildId: published.id, partId: part.id, ownerId: owner.id, gainNmPerV: 40 });
  expect((await decideRun(counted.id)).status).toBe(200);
  return { owner, part, published, other, hidden, counted };
}

describe('figures count only runs of published builds', () => {
  test.each(['draft', 'submitted', 'returned', 'declined'] as const)(
    'when a part has an accepted run in a %s build, then no registry figure, list or export counts it',
    async (status) => {
      const { part, hidden, counted } = await partWithRuns(status);
      const row = await Part.findByPk(part.id);
      expect(row).toMatchObject({ acceptedRunCount: 1, buildCount: 1 });
      expect(row!.gainMedianNmPerV).toBeCloseTo(40, 0);
      expect(row!.gainMaxNmPerV).toBeLessThan(1000);

      const page = (await request(t.app).get(`/api/parts/${part.id}`).expect(200)).body;
      expect(page.runs.map((r: { id: number }) => r.id)).toEqual([counted.id]);
      expect(page.stats).toMatchObject({ acceptedRunCount: 1 });

      const search = (
        await request(t.app)
          .get(`/api/parts?q=${encodeURIComponent(part.name)}`)
          .expect(200)
      ).body;
      expect(search.items).toEqual([expect.objectContaining({ id: part.id, acceptedRunCount: 1 })]);
      const exported = (
        await request(t.app)
          .get(`/api/parts?q=${encodeURIComponent(part.name)}&format=json`)
          .expect(200)
      ).body;
      expect(exported[0].gainMaxNmPerV).toBeLessThan(1000);

      const partsCsv = Papa.parse<Record<string, string>>((await request(t.app).get('/api/registry/dataset/parts.csv').expect(200)).text, {
        header: true,
        skipEmptyLines: true,
      });
      const csvRow = partsCsv.data.find((r) => Number(r.part_id) === part.id)!;
      expect(csvRow).toBeDefined();
      expect(Object.values(csvRow)).toContain('1');
      expect(Object.values(csvRow).join(' ')).not.toMatch(/299|3\.0e5|300000/);
      const runsCsv = Papa.parse<Record<string, string>>((await request(t.app).get('/api/registry/dataset/runs.csv').expect(200)).text, {
        header: true,
        skipEmptyLines: true,
      });
      const runIds = runsCsv.data.map((r) => Number(r.run_id));
      expect(runIds).toContain(counted.id);
      expect(runIds).not.toContain(hidden.id);

      // Counted, the median of 40 and 299 960 would sit near 150 000 nm/V: no histogram bin holds it.
      const histogram = (await request(t.app).get('/api/parts/histogram').expect(200)).body;
      const at = (g: number) => histogram.bins.find((b: { fromNmPerV: number; toNmPerV: number }) => b.fromNmPerV <= g && g < b.toNmPerV);
      expect(at(150_000)).toBeUndefined();
    },
  );
});

describe('POST /api/review/runs/:id/decision on a build not on the desk', () => {
  test.each(['draft', 'returned', 'declined'] as const)(
    'when the run is in a %s build, then 409 build_not_submitted and it stays pending',
    async (status) => {
      const owner = await createUser();
      const build = await createBuildRow(owner.id, { status });
      const run = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId: owner.id, gainNmPerV: 12 });
      expectError(await decideRun(run.id), 409, 'build_not_submitted');
      expectError(await decideRun(run.id, 'reject'), 409, 'build_not_submitted');
      expect((await CalibrationRun.findByPk(run.id))?.status).toBe('pending');
    },
  );

  test('when the run is in a submitted build, then it may be accepted, and counts once the build is published', async () => {
    const owner = await createUser();
    const part = await createPart();
    const build = await createBuildRow(owner.id, { status: 'submitted' });
    const run = await createRunRow({ buildId: build.id, partId: part.id, ownerId: owner.id, gainNmPerV: 25 });
    expect((await decideRun(run.id)).status).toBe(200);
    expect(await Part.findByPk(part.id)).toMatchObject({ acceptedRunCount: 0, gainMedianNmPerV: null });
    expect((await post(mod, `/api/review/builds/${build.id}/decision`, { decision: 'publish' })).status).toBe(200);
    const after = await Part.findByPk(part.id);
    expect(after).toMatchObject({ acceptedRunCount: 1, buildCount: 1 });
    expect(after!.gainMedianNmPerV).toBeCloseTo(25, 0);
  });
});

describe('build decisions and withdrawal recompute the figures', () => {
  test.each(['decline', 'return'] as const)(
    'when an edited published build gets the decision %s, then its runs stop counting at once',
    async (decision) => {
      const { part, published } = await partWithRuns('draft');
      await Build.update({ editedSinceReview: true }, { where: { id: published.id } });
      expect((await Part.findByPk(part.id))?.acceptedRunCount).toBe(1);
      expect((await post(mod, `/api/review/builds/${published.id}/decision`, { decision, note: 'The sweep is clipped.' })).status).toBe(
        200,
      );
      expect(await Part.findByPk(part.id)).toMatchObject({ acceptedRunCount: 0, buildCount: 0, gainMedianNmPerV: null });
      expect((await request(t.app).get(`/api/parts/${part.id}`).expect(200)).body.runs).toEqual([]);
    },
  );

  test('when a submitted build with an accepted run is withdrawn, then the figures are recomputed and still leave it out', async () => {
    const { owner, part, other } = await partWithRuns('submitted');
    // A stale figure, as an older rule would have left it: the withdrawal recomputes from the runs.
    await Part.update({ acceptedRunCount: 2 }, { where: { id: part.id } });
    const agent = await signIn(t, owner.login);
    expect((await post(agent, `/api/builds/${other.id}/withdraw`)).status).toBe(200);
    expect((await Part.findByPk(part.id))?.acceptedRunCount).toBe(1);
  });
});
