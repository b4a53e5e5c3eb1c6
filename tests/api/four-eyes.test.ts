// Four eyes: nobody decides on their own build, run, part, listing or report — moderators and admins
// alike get 403 own_work, and another moderator can then decide the same thing.
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createBuildRow, createListingRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { Build } from '../../server/models/build.model.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { Listing } from '../../server/models/listing.model.ts';
import { Part } from '../../server/models/part.model.ts';
import { Report } from '../../server/models/report.model.ts';

let t: TestApp;
let other: Agent;
beforeAll(async () => {
  t = await startTestApp();
  other = await signIn(t, (await createUser({ role: 'moderator' })).login);
});
afterAll(async () => {
  await t.close();
});

const post = (a: Agent, path: string, body: object) => a.post(path).set('X-CSRF-Token', a.csrf).send(body);

/** Something a moderator or admin owns, the decision on it, and a read of its state. */
interface Case {
  make(ownerId: number): Promise<{ path: string; body: object; state(): Promise<unknown> }>;
}

const cases: Record<string, Case> = {
  'their own submitted build': {
    async make(ownerId) {
      const b = await createBuildRow(ownerId, { status: 'submitted' });
      return {
        path: `/api/review/builds/${b.id}/decision`,
        body: { decision: 'publish' },
        state: async () => (await Build.findByPk(b.id))?.status,
      };
    },
  },
  'their own submitted build with its runs (publish with runs)': {
    async make(ownerId) {
      const b = await createBuildRow(ownerId, { status: 'submitted' });
      const run = await createRunRow({ buildId: b.id, partId: (await createPart()).id, ownerId, gainNmPerV: 40 });
      return {
        path: `/api/review/builds/${b.id}/publish-with-runs`,
        body: { acceptRunIds: [run.id] },
        state: async () => [(await Build.findByPk(b.id))?.status, (await CalibrationRun.findByPk(run.id))?.status],
      };
    },
  },
  'a pending run of their own published build': {
    async make(ownerId) {
      const b = await createBuildRow(ownerId, { status: 'published' });
      const run = await createRunRow({ buildId: b.id, partId: (await createPart()).id, ownerId, gainNmPerV: 30 });
      return {
        path: `/api/review/runs/${run.id}/decision`,
        body: { decision: 'accept' },
        state: async () => (await CalibrationRun.findByPk(run.id))?.status,
      };
    },
  },
  'a part they proposed': {
    async make(ownerId) {
      const part = await createPart({ status: 'proposed', proposedById: ownerId });
      return {
        path: `/api/review/parts/${part.id}/decision`,
        body: { decision: 'accept' },
        state: async () => (await Part.findByPk(part.id))?.status,
      };
    },
  },
  'their own listing (hiding it)': {
    async make(ownerId) {
      const listing = await createListingRow(ownerId);
      return {
        path: `/api/listings/${listing.id}/visibility`,
        body: { hidden: true, note: 'Hiding my own listing.' },
        state: async () => (await Listing.findByPk(listing.id))?.hiddenAt,
      };
    },
  },
  'a report they filed': {
    async make(ownerId) {
      const b = await createBuildRow((await createUser()).id, { status: 'published' });
      const report = await Report.create({ reporterId: ownerId, targetType: 'build', targetId: b.id, reason: 'spam', note: null });
      return {
        path: `/api/review/reports/${report.id}/decision`,
        body: { decision: 'resolve', note: 'Removed the spam.' },
        state: async () => (await Report.findByPk(report.id))?.status,
      };
    },
  },
  'a report about their own build': {
    async make(ownerId) {
      const b = await createBuildRow(ownerId, { status: 'published' });
      const report = await Report.create({
        reporterId: (await createUser()).id,
        targetType: 'build',
        targetId: b.id,
        reason: 'spam',
        note: null,
      });
      return {
        path: `/api/review/reports/${report.id}/decision`,
        body: { decision: 'dismiss', note: 'Not spam.' },
        state: async () => (await Report.findByPk(report.id))?.status,
      };
    },
  },
  'a report about a part they proposed': {
    async make(ownerId) {
      const part = await createPart({ proposedById: ownerId });
      const report = await Report.create({
        reporterId: (await createUser()).id,
        targetType: 'part',
        targetId: part.id,
        reason: 'spam',
        note: null,
      });
      return {
        path: `/api/review/reports/${report.id}/decision`,
        body: { decision: 'dismiss', note: 'Not spam.' },
        state: async () => (await Report.findByPk(report.id))?.status,
      };
    },
  },
};

describe('four eyes on every decision route', () => {
  const rows = Object.keys(cases).flatMap((what) => (['moderator', 'admin'] as const).map((role) => [role, what] as const));
  test.each(rows)('when a %s decides on %s, then 403 own_work and nothing changes; another moderator may decide it', async (role, what) => {
    const me = await createUser({ role });
    const agent = await signIn(t, me.login);
    const c = await cases[what]!.make(me.id);
    const before = await c.state();
    const res = expectError(await post(agent, c.path, c.body), 403, 'own_work');
    expect(res.body.error.message).toMatch(/another moderator/i);
    expect(await c.state()).toEqual(before);
    expect((await post(other, c.path, c.body)).status).toBe(200);
    expect(await c.state()).not.toEqual(before);
  });
});
