import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, visitor, type Agent } from '../support/login.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { standInEmail } from '../../server/dev/demo-accounts.ts';
import { Part } from '../../server/models/part.model.ts';
import { AuditEntry } from '../../server/models/audit-entry.model.ts';
import { Build } from '../../server/models/build.model.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';

let t: TestApp;
let mod: Agent;
let modId: number;
beforeAll(async () => {
  t = await startTestApp();
  const m = await createUser({ role: 'moderator' });
  modId = m.id;
  mod = await signIn(t, m.login);
});
afterAll(async () => {
  await t.close();
});

const post = (a: Agent, path: string, body: object) => a.post(path).set('X-CSRF-Token', a.csrf).send(body);

/** Type-7 quartiles computed independently here by sorting and interpolating by hand. */
function type7(values: number[], p: number) {
  const s = values.slice().sort((a, b) => a - b);
  const h = (s.length - 1) * p;
  return s[Math.floor(h)]! + (h - Math.floor(h)) * (s[Math.ceil(h)]! - s[Math.floor(h)]!);
}

// The decision routes (visitor 401, maker 403, moderator and admin allowed) are in the authorization matrix.
describe('role matrix for the review desk', () => {
  const routes: Array<[string, string, object]> = [
    ['get', '/api/review/queue', {}],
    ['get', '/api/review/audit', {}],
  ];
  test.each(routes)('%s %s: visitor 401, maker 403, moderator and admin not refused', async (method, path, body) => {
    const v = await visitor(t);
    const maker = await signIn(t, (await createUser()).login);
    const admin = await signIn(t, (await createUser({ role: 'admin' })).login);
    const call = (a: Agent) => (method === 'get' ? a.get(path) : post(a, path, body));
    expectError(await call(v), 401, 'unauthorized');
    expectError(await call(maker), 403, 'forbidden');
    for (const a of [mod, admin]) expect([200, 404, 409]).toContain((await call(a)).status);
  });
});

describe('POST /api/review/builds/:id/decision', () => {
  test('when a moderator publishes a submitted build, then it is published, audited and the author is e-mailed with a link', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id, { status: 'submitted' });
    const queue = await mod.get('/api/review/queue');
    expect(queue.status).toBe(200);
    expect(queue.body.builds.find((x: { id: number }) => x.id === b.id)).toMatchObject({ author: { login: owner.login }, title: b.title });
    const res = await post(mod, `/api/review/builds/${b.id}/decision`, { decision: 'publish' });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ id: b.id, status: 'published' });
    expect((await request(t.app).get(`/api/builds/${b.id}`)).status).toBe(200);
    const audit = await AuditEntry.findOne({ where: { targetType: 'build', targetId: b.id } });
    expect(audit).toMatchObject({ actorId: modId, action: 'build.publish' });
    const mail = await t.mail.waitFor((m) => m.to.includes(standInEmail(owner.login)) && m.subject.includes('published'));
    expect(mail.text).toContain(`${t.config.publicUrl}/builds/${b.id}`);
    expect(mail.html).toContain(`/builds/${b.id}`);
  });

  test('when returning without a note, then 400; with a note, then returned and the owner sees the note and can edit', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id, { status: 'submitted' });
    expectError(await post(mod, `/api/review/builds/${b.id}/decision`, { decision: 'return' }), 400, 'validation_failed', 'note');
    expectError(
      await post(mod, `/api/review/builds/${b.id}/decision`, { decision: 'decline', note: '  ' }),
      400,
      'validation_failed',
      'note',
    );
    const res = await post(mod, `/api/review/builds/${b.id}/decision`, { decision: 'return', note: 'Add a photo of the head.' });
    expect(res.body.status).toBe('returned');
    const a = await signIn(t, owner.login);
    const page = await a.get(`/api/builds/${b.id}`);
    expect(page.body).toMatchObject({
      status: 'returned',
      reviewNote: 'Add a photo of the head.',
      abilities: { edit: true, submit: true },
    });
    await t.mail.waitFor(
      (m) => m.to.includes(standInEmail(owner.login)) && m.subject.includes('returned') && m.text.includes('Add a photo of the head.'),
    );
  });

  test.each(['draft', 'published', 'returned', 'declined'])('when the build is %s, then a decision is 409 not_waiting', async (status) => {
    const b = await createBuildRow((await createUser()).id, { status });
    const res = await post(mod, `/api/review/builds/${b.id}/decision`, { decision: 'publish' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('not_waiting');
  });

  test('when a published build was edited since review, then it is on the desk and publish clears the flag', async () => {
    const b = await createBuildRow((await createUser()).id, { status: 'published' });
    await b.update({ editedSinceReview: true });
    expect((await mod.get('/api/review/queue')).body.edited.map((x: { id: number }) => x.id)).toContain(b.id);
    expect((await post(mod, `/api/review/builds/${b.id}/decision`, { decision: 'publish' })).status).toBe(200);
    await b.reload();
    expect(b).toMatchObject({ status: 'published', editedSinceReview: false });
  });

  test('when the unknown build is decided, then 404', async () => {
    expectError(await post(mod, '/api/review/builds/999999999/decision', { decision: 'publish' }), 404, 'not_found');
  });
});

describe('POST /api/review/runs/:id/decision', () => {
  test('when runs are accepted and rejected, then part stats equal an independent type-7 computation over accepted runs', async () => {
    const owner = await createUser();
    const part = await createPart();
    const b1 = await createBuildRow(owner.id, { status: 'published' });
    const b2 = await createBuildRow(owner.id, { status: 'published' });
    const gains = [90, 110, 100, 130, 95];
    const runs = [];
    for (const [i, g] of gains.entries())
      runs.push(await createRunRow({ buildId: i < 3 ? b1.id : b2.id, partId: part.id, ownerId: owner.id, gainNmPerV: g }));
    for (const r of runs.slice(0, 4))
      expect((await post(mod, `/api/review/runs/${r.id}/decision`, { decision: 'accept' })).status).toBe(200);
    expect((await post(mod, `/api/review/runs/${runs[4]!.id}/decision`, { decision: 'reject', note: 'Indicator slipped.' })).status).toBe(
      200,
    );
    await part.reload();
    const acceptedGains = runs.slice(0, 4).map((r) => Math.abs(r.gainNmPerV));
    expect(part.acceptedRunCount).toBe(4);
    expect(part.buildCount).toBe(2);
    expect(part.gainMedianNmPerV).toBeCloseTo(type7(acceptedGains, 0.5), 9);
    expect(part.gainP25NmPerV).toBeCloseTo(type7(acceptedGains, 0.25), 9);
    expect(part.gainP75NmPerV).toBeCloseTo(type7(acceptedGains, 0.75), 9);
    expect(part.gainMinNmPerV).toBeCloseTo(Math.min(...acceptedGains), 9);
    expect(part.gainMaxNmPerV).toBeCloseTo(Math.max(...acceptedGains), 9);
    expect(part.hysteresisMedianPct).toBeCloseTo(
      type7(
        runs.slice(0, 4).map((r) => r.hysteresisPctFs!),
        0.5,
      ),
      9,
    );
    expectError(await post(mod, `/api/review/runs/${runs[0]!.id}/decision`, { decision: 'reject', note: 'again' }), 409, 'not_waiting');
    expect(await AuditEntry.count({ where: { targetType: 'run', targetId: runs.map((r) => r.id) } })).toBe(5);
  });

  test('when rejecting without a note, then 400 and nothing changes', async () => {
    const owner = await createUser();
    const part = await createPart();
    const b = await createBuildRow(owner.id, { status: 'published' });
    const run = await createRunRow({ buildId: b.id, partId: part.id, ownerId: owner.id, gainNmPerV: 100 });
    expectError(await post(mod, `/api/review/runs/${run.id}/decision`, { decision: 'reject' }), 400, 'validation_failed', 'note');
    await run.reload();
    expect(run.status).toBe('pending');
  });

  test('when a pending run is on the desk, then it carries the part figures and the plausibility flags', async () => {
    const owner = await createUser();
    const part = await createPart();
    const b = await createBuildRow(owner.id, { status: 'published' });
    for (const g of [100, 102, 98])
      await createRunRow({ buildId: b.id, partId: part.id, ownerId: owner.id, gainNmPerV: g, status: 'accepted' });
    const slip = await createRunRow({ buildId: b.id, partId: part.id, ownerId: owner.id, gainNmPerV: 100 * 25.4 });
    const q = await mod.get('/api/review/queue');
    const item = q.body.runs.find((r: { id: number }) => r.id === slip.id);
    expect(item).toMatchObject({ part: { id: part.id, name: part.name }, author: { login: owner.login }, buildTitle: b.title });
    expect(item.flags.map((f: { code: string }) => f.code)).toContain('unit-slip');
    expect(item.points.length).toBeGreaterThan(3);
  });

  test('when the audit insert fails inside a decision, then the run, the stats and the audit trail are all unchanged', async () => {
    const owner = await createUser();
    const part = await createPart();
    const b = await createBuildRow(owner.id, { status: 'published' });
    const run = await createRunRow({ buildId: b.id, partId: part.id, ownerId: owner.id, gainNmPerV: 100 });
    const sq = t.handle.sequelize;
    // A real database fault: a trigger refuses audit rows carrying this note.
    await sq.query(
      "CREATE TRIGGER fail_audit BEFORE INSERT ON audit_entries FOR EACH ROW BEGIN IF NEW.note = 'INJECT-FAULT' THEN SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'injected'; END IF; END",
    );
    try {
      const res = await post(mod, `/api/review/runs/${run.id}/decision`, { decision: 'accept', note: 'INJECT-FAULT' });
      expect(res.status).toBe(500);
      expect(res.body.error.code).toBe('internal_error');
    } finally {
      await sq.query('DROP TRIGGER fail_audit');
    }
    await run.reload();
    await part.reload();
    expect(run.status).toBe('pending');
    expect(part.acceptedRunCount).toBe(0);
    expect(await AuditEntry.count({ where: { targetType: 'run', targetId: run.id } })).toBe(0);
    expect((await post(mod, `/api/review/runs/${run.id}/decision`, { decision: 'accept' })).status).toBe(200);
  });
});

describe('parts and reports', () => {
  test('when a proposed part is accepted, then it is listed and the proposer e-mailed; deciding again 409', async () => {
    const proposer = await createUser();
    const part = await createPart({ status: 'proposed', proposedById: proposer.id });
    expect((await post(mod, `/api/review/parts/${part.id}/decision`, { decision: 'accept' })).body.status).toBe('accepted');
    expect((await request(t.app).get(`/api/parts/${part.id}`)).status).toBe(200);
    await t.mail.waitFor((m) => m.to.includes(standInEmail(proposer.login)) && m.subject.includes('Part accepted'));
    expectError(await post(mod, `/api/review/parts/${part.id}/decision`, { decision: 'reject', note: 'no' }), 409, 'not_waiting');
  });

  test('when a maker reports a build and a moderator resolves it, then the reporter hears back and the audit trail shows it', async () => {
    const reporter = await createUser();
    const b = await createBuildRow((await createUser()).id, { status: 'published' });
    const a = await signIn(t, reporter.login);
    const created = await post(a, '/api/reports', { targetType: 'build', targetId: b.id, reason: 'unsafe', note: 'No bleeder resistor.' });
    expect(created.status).toBe(201);
    const q = await mod.get('/api/review/queue');
    expect(q.body.reports.find((r: { id: number }) => r.id === created.body.id)).toMatchObject({
      targetLabel: b.title,
      reason: 'unsafe',
      reporter: { login: reporter.login },
    });
    expectError(
      await post(mod, `/api/review/reports/${created.body.id}/decision`, { decision: 'resolve' }),
      400,
      'validation_failed',
      'note',
    );
    expect(
      (
        await post(mod, `/api/review/reports/${created.body.id}/decision`, {
          decision: 'resolve',
          note: 'Asked the author to add a caution.',
        })
      ).body.status,
    ).toBe('resolved');
    await t.mail.waitFor((m) => m.to.includes(standInEmail(reporter.login)) && m.subject.includes('resolved'));
    const audit = await mod.get(`/api/review/audit?actorId=${modId}&targetType=report&targetId=${created.body.id}`);
    expect(audit.body).toMatchObject({
      total: 1,
      items: [{ action: 'report.resolve', actor: { id: modId }, note: 'Asked the author to add a caution.' }],
    });
  });

  // A visitor's 401 is in the authorization matrix.
  test('when reporting something invisible or unknown, then 404; bad reason 400', async () => {
    const a = await signIn(t, (await createUser()).login);
    const draft = await createBuildRow((await createUser()).id);
    expectError(await post(a, '/api/reports', { targetType: 'build', targetId: draft.id, reason: 'spam' }), 404, 'not_found');
    expectError(await post(a, '/api/reports', { targetType: 'part', targetId: 999999999, reason: 'spam' }), 404, 'not_found');
    expectError(
      await post(a, '/api/reports', { targetType: 'build', targetId: draft.id, reason: 'boring' }),
      400,
      'validation_failed',
      'reason',
    );
  });

  test('when a maker opts out of non-essential mail, then run decisions send nothing but build decisions still do', async () => {
    const owner = await createUser();
    const a = await signIn(t, owner.login);
    expect((await a.patch('/api/account/settings').set('X-CSRF-Token', a.csrf).send({ mailOptOut: true })).body.mailOptOut).toBe(true);
    const part = await createPart();
    const b = await createBuildRow(owner.id, { status: 'submitted' });
    const run = await createRunRow({ buildId: b.id, partId: part.id, ownerId: owner.id, gainNmPerV: 100 });
    await post(mod, `/api/review/runs/${run.id}/decision`, { decision: 'accept' });
    await post(mod, `/api/review/builds/${b.id}/decision`, { decision: 'publish' });
    await t.mail.waitFor((m) => m.to.includes(standInEmail(owner.login)) && m.subject.includes('Build published'));
    expect(t.mail.messages.filter((m) => m.to.includes(standInEmail(owner.login)) && m.subject.includes('Calibration run'))).toHaveLength(
      0,
    );
  });
});

describe('audit filters', () => {
  test('when filtering by date, then entries outside the range are left out; bad dates 400', async () => {
    const today = new Date().toISOString().slice(0, 10);
    const res = await mod.get(`/api/review/audit?from=${today}&to=${today}&actorId=${modId}`);
    expect(res.status).toBe(200);
    expect(res.body.total).toBeGreaterThan(0);
    expect((await mod.get(`/api/review/audit?from=2000-01-01&to=2000-01-02&actorId=${modId}`)).body.total).toBe(0);
    expectError(await mod.get('/api/review/audit?from=yesterday'), 400, 'validation_failed', 'from');
  });
});

void Build;
void CalibrationRun;
void Part;
