// The desk's build tools: a build's pending runs with flags, the combined decision (publish + accept the
// unflagged runs, one transaction), a run's raw points page by page, and accepting a run with a note.
// Visitor 401 and CSRF for the POST are in the authorization matrix.
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, visitor, type Agent } from '../support/login.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { standInEmail } from '../../server/dev/demo-accounts.ts';
import { AuditEntry } from '../../server/models/audit-entry.model.ts';
import { Build } from '../../server/models/build.model.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { Part } from '../../server/models/part.model.ts';

let t: TestApp;
let mod: Agent;
let modId: number;
let maker: Agent;
beforeAll(async () => {
  t = await startTestApp();
  const m = await createUser({ role: 'moderator' });
  modId = m.id;
  mod = await signIn(t, m.login);
  maker = await signIn(t, (await createUser()).login);
});
afterAll(async () => {
  await t.close();
});

const post = (a: Agent, path: string, body: object) => a.post(path).set('X-CSRF-Token', a.csrf).send(body);

/** A submitted build with two clean runs and one with a wide loop (the large-hysteresis flag), each on its own part. */
async function submittedBuildWithRuns(ownerId: number) {
  const build = await createBuildRow(ownerId, { status: 'submitted' });
  const clean1 = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId, gainNmPerV: 40 });
  const clean2 = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId, gainNmPerV: 38 });
  const loopy = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId, gainNmPerV: 39, hysteresis: 0.5 });
  return { build, clean1, clean2, loopy };
}

describe('GET /api/review/builds/:buildId/runs', () => {
  test('when a moderator opens a submitted build, then its pending runs come with flags and the plan accepts only the unflagged ones', async () => {
    const owner = await createUser();
    const { build, clean1, clean2, loopy } = await submittedBuildWithRuns(owner.id);
    const res = await mod.get(`/api/review/builds/${build.id}/runs`);
    expect(res.status).toBe(200);
    expect(res.body.runs.map((r: { id: number }) => r.id)).toEqual([clean1.id, clean2.id, loopy.id]);
    expect(res.body.runs[2].flags.map((f: { code: string }) => f.code)).toContain('large-hysteresis');
    expect(res.body.plan).toEqual({
      accept: [clean1.id, clean2.id],
      stayPending: [{ id: loopy.id, flags: expect.arrayContaining(['large-hysteresis']) }],
    });
  });

  test('when a visitor or a maker asks, then 401 / 403; an unknown build 404; a malformed id 400', async () => {
    const b = await createBuildRow((await createUser()).id, { status: 'submitted' });
    expectError(await (await visitor(t)).get(`/api/review/builds/${b.id}/runs`), 401, 'unauthorized');
    expectError(await maker.get(`/api/review/builds/${b.id}/runs`), 403, 'forbidden');
    expectError(await mod.get('/api/review/builds/999999/runs'), 404, 'not_found');
    expectError(await mod.get('/api/review/builds/abc/runs'), 400, 'validation_failed', 'buildId');
  });
});

describe('POST /api/review/builds/:buildId/publish-with-runs', () => {
  test('when a moderator confirms the plan, then the build is published, the clean runs accepted, the flagged one pending, figures, audit and one mail', async () => {
    const owner = await createUser();
    const { build, clean1, clean2, loopy } = await submittedBuildWithRuns(owner.id);
    const res = await post(mod, `/api/review/builds/${build.id}/publish-with-runs`, {
      acceptRunIds: [clean2.id, clean1.id],
      note: 'Tidy write-up.',
    });
    expect(res.status, res.text).toBe(200);
    expect(res.body).toMatchObject({
      id: build.id,
      status: 'published',
      accepted: [{ id: clean1.id }, { id: clean2.id }],
      stayPending: [{ id: loopy.id, flags: expect.arrayContaining(['large-hysteresis']) }],
    });
    expect(res.body.accepted[0].name).toMatch(/± .* nm\/V \(95 %\)/);
    expect((await Build.findByPk(build.id))?.status).toBe('published');
    const statuses = await CalibrationRun.findAll({ where: { buildId: build.id }, order: [['id', 'ASC']] });
    expect(statuses.map((r) => [r.id, r.status, r.reviewedById])).toEqual([
      [clean1.id, 'accepted', modId],
      [clean2.id, 'accepted', modId],
      [loopy.id, 'pending', null],
    ]);
    // The parts' figures were recomputed in the same transaction: each clean part now counts its one run.
    const part1 = await Part.findByPk(clean1.partId);
    expect(part1?.acceptedRunCount).toBe(1);
    expect(part1?.gainMedianNmPerV).toBeCloseTo(Math.abs(clean1.gainNmPerV), 9);
    expect((await Part.findByPk(loopy.partId))?.acceptedRunCount).toBe(0);
    const audit = await AuditEntry.findAll({ where: { actorId: modId }, order: [['id', 'ASC']] });
    expect(
      audit.filter((a) => (a.targetType === 'build' && a.targetId === build.id) || [clean1.id, clean2.id, loopy.id].includes(a.targetId)),
    ).toEqual([
      expect.objectContaining({ action: 'run.accept', targetId: clean1.id }),
      expect.objectContaining({ action: 'run.accept', targetId: clean2.id }),
      expect.objectContaining({ action: 'build.publish', targetId: build.id, note: 'Tidy write-up.' }),
    ]);
    const mail = await t.mail.waitFor((m) => m.to.includes(standInEmail(owner.login)) && m.subject.includes('published'));
    expect(mail.text).toContain('Accepted with it:');
    expect(mail.text).toContain('Still waiting for a closer look:');
    expect(mail.text).toContain('Tidy write-up.');
  });

  test('when the unflagged runs differ from the preview, then 409 plan_changed and nothing changes', async () => {
    const owner = await createUser();
    const { build, clean1, loopy } = await submittedBuildWithRuns(owner.id);
    expectError(await post(mod, `/api/review/builds/${build.id}/publish-with-runs`, { acceptRunIds: [clean1.id] }), 409, 'plan_changed');
    expectError(
      await post(mod, `/api/review/builds/${build.id}/publish-with-runs`, { acceptRunIds: [clean1.id, loopy.id] }),
      409,
      'plan_changed',
    );
    expect((await Build.findByPk(build.id))?.status).toBe('submitted');
    expect(await CalibrationRun.count({ where: { buildId: build.id, status: 'accepted' } })).toBe(0);
    expect(await AuditEntry.count({ where: { targetType: 'build', targetId: build.id } })).toBe(0);
  });

  test('when a run decision races the combined decision, then one wins and the other is refused with a 409, never a 500', async () => {
    const other = await signIn(t, (await createUser({ role: 'moderator' })).login);
    for (let i = 0; i < 5; i++) {
      const owner = await createUser();
      const { build, clean1, clean2 } = await submittedBuildWithRuns(owner.id);
      const [combined, single] = await Promise.all([
        post(mod, `/api/review/builds/${build.id}/publish-with-runs`, { acceptRunIds: [clean1.id, clean2.id] }),
        post(other, `/api/review/runs/${clean1.id}/decision`, { decision: 'reject', note: 'Indicator slipped.' }),
      ]);
      const statuses = [combined.status, single.status].sort();
      expect(statuses, `${combined.text} ${single.text}`).toEqual([200, 409]);
      const codes = [combined, single].filter((r) => r.status === 409).map((r) => r.body.error.code);
      expect(codes[0]).toBe(combined.status === 409 ? 'plan_changed' : 'not_waiting');
      const run1 = await CalibrationRun.findByPk(clean1.id);
      expect(run1?.status).toBe(combined.status === 200 ? 'accepted' : 'rejected');
    }
  });

  test('when the moderator made the build or one of its runs, then 403 own_work (four eyes)', async () => {
    const own = await createBuildRow(modId, { status: 'submitted' });
    expectError(await post(mod, `/api/review/builds/${own.id}/publish-with-runs`, { acceptRunIds: [] }), 403, 'own_work');
    const owner = await createUser();
    const build = await createBuildRow(owner.id, { status: 'submitted' });
    const theirs = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId: modId, gainNmPerV: 40 });
    expectError(await post(mod, `/api/review/builds/${build.id}/publish-with-runs`, { acceptRunIds: [theirs.id] }), 403, 'own_work');
    expect((await CalibrationRun.findByPk(theirs.id))?.status).toBe('pending');
  });

  test('when the build is not waiting, unknown, or the body is bad, then 409 not_waiting, 404, 400', async () => {
    const draft = await createBuildRow((await createUser()).id, { status: 'draft' });
    expectError(await post(mod, `/api/review/builds/${draft.id}/publish-with-runs`, { acceptRunIds: [] }), 409, 'not_waiting');
    expectError(await post(mod, '/api/review/builds/999999/publish-with-runs', { acceptRunIds: [] }), 404, 'not_found');
    const b = await createBuildRow((await createUser()).id, { status: 'submitted' });
    expectError(await post(mod, `/api/review/builds/${b.id}/publish-with-runs`, {}), 400, 'validation_failed', 'acceptRunIds');
    expectError(
      await post(mod, `/api/review/builds/${b.id}/publish-with-runs`, { acceptRunIds: [], notePublic: true }),
      400,
      'validation_failed',
      'notePublic',
    );
    expectError(await post(maker, `/api/review/builds/${b.id}/publish-with-runs`, { acceptRunIds: [] }), 403, 'forbidden');
    expect((await Build.findByPk(b.id))?.status).toBe('submitted');
  });
});

describe('GET /api/review/runs/:runId/points', () => {
  test('when a moderator pages through a run, then the pages hold the recorded rows in order in the export columns', async () => {
    const owner = await createUser();
    const build = await createBuildRow(owner.id, { status: 'submitted' });
    const run = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId: owner.id, gainNmPerV: 40 });
    const stored = JSON.parse((await CalibrationRun.findByPk(run.id))!.pointsJson) as Array<{ volts: number; displacement: number }>;
    const first = await mod.get(`/api/review/runs/${run.id}/points?page=1&pageSize=5`);
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({
      runId: run.id,
      kind: 'points',
      columns: ['volts_V', 'displacement_nm', 'sweep'],
      total: stored.length,
    });
    expect(first.body.rows).toHaveLength(5);
    const last = Math.ceil(stored.length / 5);
    const end = await mod.get(`/api/review/runs/${run.id}/points?page=${last}&pageSize=5`);
    expect(end.status).toBe(200);
    expect(end.body.rows.map((r: unknown[]) => r.slice(0, 2))).toEqual(stored.slice((last - 1) * 5).map((p) => [p.volts, p.displacement]));
    expectError(await mod.get(`/api/review/runs/${run.id}/points?page=${last + 1}&pageSize=5`), 404, 'page_out_of_range');
  });

  test('when paging is malformed, the run unknown, or the caller not a moderator, then 400 / 404 / 401 / 403', async () => {
    const owner = await createUser();
    const build = await createBuildRow(owner.id, { status: 'submitted' });
    const run = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId: owner.id, gainNmPerV: 40 });
    expectError(await mod.get(`/api/review/runs/${run.id}/points?page=0`), 400, 'validation_failed', 'page');
    expectError(await mod.get(`/api/review/runs/${run.id}/points?pageSize=501`), 400, 'validation_failed', 'pageSize');
    expectError(await mod.get(`/api/review/runs/${run.id}/points?pageSize=ten`), 400, 'validation_failed', 'pageSize');
    expectError(await mod.get(`/api/review/runs/${run.id}/points?rows=5`), 400, 'validation_failed');
    expectError(await mod.get('/api/review/runs/999999/points'), 404, 'not_found');
    expectError(await (await visitor(t)).get(`/api/review/runs/${run.id}/points`), 401, 'unauthorized');
    expectError(await (await signIn(t, owner.login)).get(`/api/review/runs/${run.id}/points`), 403, 'forbidden');
  });
});

describe('accept with note', () => {
  test('when a moderator accepts a run with a note, then it is kept, shown to the maker, in the mail and the audit trail', async () => {
    const owner = await createUser();
    const build = await createBuildRow(owner.id, { status: 'published' });
    const run = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId: owner.id, gainNmPerV: 40 });
    const note = 'Accepted; next time record the down sweep too.';
    const res = await post(mod, `/api/review/runs/${run.id}/decision`, { decision: 'accept', note });
    expect(res.body).toEqual({ id: run.id, status: 'accepted' });
    const seen = await (await signIn(t, owner.login)).get(`/api/runs/${run.id}`);
    expect(seen.body).toMatchObject({ status: 'accepted', reviewNote: note });
    expect(await AuditEntry.findOne({ where: { targetType: 'run', targetId: run.id } })).toMatchObject({ action: 'run.accept', note });
    const mail = await t.mail.waitFor((m) => m.to.includes(standInEmail(owner.login)) && m.subject.includes('accepted'));
    expect(mail.text).toContain(note);
  });
});

describe('GET /api/review/builds/:buildId/history', () => {
  test('when a returned build comes back changed, then the history shows the note and the write-up and run list diffs since that review', async () => {
    const owner = await createUser();
    const build = await createBuildRow(owner.id, { status: 'submitted' });
    await build.update({ body: 'Tube scanner on a brass base. Coarse approach by screw.' });
    const kept = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId: owner.id, gainNmPerV: 40 });
    const dropped = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId: owner.id, gainNmPerV: 41 });
    const before = await mod.get(`/api/review/builds/${build.id}/history`);
    expect(before.body).toEqual({ buildId: build.id, decisions: [], lastReview: null, writeUp: null, runs: null });

    const note = 'Say how the screw is geared.';
    expect((await post(mod, `/api/review/builds/${build.id}/decision`, { decision: 'return', note })).status).toBe(200);
    // The maker rewrites a sentence, removes one run, adds another, and submits again.
    await build.reload();
    await build.update({ status: 'submitted', body: 'Tube scanner on a brass base. Coarse approach by a 100:1 worm gear.' });
    await CalibrationRun.destroy({ where: { id: dropped.id } });
    const added = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId: owner.id, gainNmPerV: 39 });

    const res = await mod.get(`/api/review/builds/${build.id}/history`);
    expect(res.status).toBe(200);
    expect(res.body.decisions).toEqual([
      expect.objectContaining({ action: 'build.return', targetType: 'build', note, moderator: expect.any(String) }),
    ]);
    expect(res.body.lastReview).toMatchObject({ decision: 'return' });
    expect(res.body.writeUp.changed).toBe(true);
    const pieces = (kind: string) =>
      res.body.writeUp.changes
        .filter((c: { change: string }) => c.change === kind)
        .map((c: { value: string }) => c.value)
        .join('');
    expect(pieces('removed')).toContain('screw');
    expect(pieces('added')).toContain('worm gear');
    expect(pieces('same')).toContain('Tube scanner on a brass base.');
    expect(res.body.runs.map((r: { id: number; change: string }) => [r.id, r.change])).toEqual([
      [kept.id, 'same'],
      [added.id, 'added'],
      [dropped.id, 'removed'],
    ]);
    expect(res.body.runs[0].after.gain).toMatch(/nm\/V \(95 %\)$/);
  });

  test('when a published build is edited since review, then the history diffs the edit against what was published', async () => {
    const owner = await createUser();
    const build = await createBuildRow(owner.id, { status: 'submitted' });
    await build.update({ body: 'First write-up.' });
    const run = await createRunRow({ buildId: build.id, partId: (await createPart()).id, ownerId: owner.id, gainNmPerV: 40 });
    expect((await post(mod, `/api/review/builds/${build.id}/publish-with-runs`, { acceptRunIds: [run.id] })).status).toBe(200);
    await build.reload();
    await build.update({ body: 'First write-up, with the noise floor measured.', editedSinceReview: true });
    const res = await mod.get(`/api/review/builds/${build.id}/history`);
    expect(res.body.lastReview).toMatchObject({ decision: 'publish' });
    expect(
      res.body.writeUp.changes
        .filter((c: { change: string }) => c.change === 'added')
        .map((c: { value: string }) => c.value)
        .join(''),
    ).toContain('noise floor');
    expect(res.body.runs).toEqual([
      expect.objectContaining({ id: run.id, change: 'same', after: expect.objectContaining({ status: 'accepted' }) }),
    ]);
    expect(res.body.decisions.map((d: { action: string }) => d.action)).toEqual(['build.publish', 'run.accept']);
  });

  test('when a visitor or maker asks, the build is unknown or the id malformed, then 401 / 403 / 404 / 400', async () => {
    const b = await createBuildRow((await createUser()).id, { status: 'submitted' });
    expectError(await (await visitor(t)).get(`/api/review/builds/${b.id}/history`), 401, 'unauthorized');
    expectError(await maker.get(`/api/review/builds/${b.id}/history`), 403, 'forbidden');
    expectError(await mod.get('/api/review/builds/999999/history'), 404, 'not_found');
    expectError(await mod.get('/api/review/builds/0/history'), 400, 'validation_failed', 'buildId');
  });
});
