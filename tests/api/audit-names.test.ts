// Admin actions on the audit trail (role changes, suspensions, reinstatements, token revocations), and
// every entry naming its target in words: a run by its actuator, date and gain with its ±, in the mail too.
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { randomBytes } from 'node:crypto';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createActuatorRow, createBuildRow, createListingRow, createPart, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { makeToken } from '../support/rig.ts';
import { standInEmail } from '../../server/dev/demo-accounts.ts';
import { ApiToken } from '../../server/models/api-token.model.ts';
import { User } from '../../server/models/user.model.ts';

let t: TestApp;
let admin: Agent;
let adminId: number;
let mod: Agent;
beforeAll(async () => {
  t = await startTestApp();
  const a = await createUser({ role: 'admin' });
  adminId = a.id;
  admin = await signIn(t, a.login);
  mod = await signIn(t, (await createUser({ role: 'moderator' })).login);
});
afterAll(async () => {
  await t.close();
});

const send = (a: Agent, method: 'post' | 'patch' | 'delete', path: string, body?: object) =>
  a[method](path).set('X-CSRF-Token', a.csrf).send(body);

/** The audit entries about one thing, newest first, as a moderator reads them. */
async function trail(targetType: string, targetId: number) {
  const res = await mod.get(`/api/review/audit?targetType=${targetType}&targetId=${targetId}`);
  expect(res.status).toBe(200);
  return res.body.items as Array<{ action: string; actor: { id: number }; targetLabel: string | null; note: string | null }>;
}

describe('admin actions on the audit trail', () => {
  test('when an admin changes a role, suspends and reinstates, then each is an entry naming the account by handle and name', async () => {
    const target = await createUser();
    await User.update({ name: 'Ada Bench' }, { where: { id: target.id } });
    expect((await send(admin, 'patch', `/api/admin/users/${target.id}/role`, { role: 'moderator' })).status).toBe(200);
    expect((await send(admin, 'patch', `/api/admin/users/${target.id}/suspension`, { suspended: true })).status).toBe(200);
    expect((await send(admin, 'patch', `/api/admin/users/${target.id}/suspension`, { suspended: false })).status).toBe(200);
    const entries = await trail('user', target.id);
    expect(entries.map((e) => [e.action, e.actor.id, e.targetLabel])).toEqual([
      ['user.reinstate', adminId, `@${target.login} (Ada Bench)`],
      ['user.suspend', adminId, `@${target.login} (Ada Bench)`],
      ['user.set-role', adminId, `@${target.login} (Ada Bench)`],
    ]);
    expect(entries[2]!.note).toBe('Role: maker → moderator');
  });

  test('when a refused admin action is tried (own role), then 403 and no entry is written', async () => {
    expectError(await send(admin, 'patch', `/api/admin/users/${adminId}/role`, { role: 'maker' }), 403, 'forbidden');
    expect(await trail('user', adminId)).toEqual([]);
  });
});

describe('GET and DELETE /api/admin/users/:userId/tokens', () => {
  test('when an admin lists and revokes a maker’s token, then it stops working and the trail names the token and its owner', async () => {
    const owner = await createUser();
    const ownerAgent = await signIn(t, owner.login);
    const { secret } = await makeToken(ownerAgent, ['read'], 'shed rig');
    const list = await admin.get(`/api/admin/users/${owner.id}/tokens`);
    expect(list.status).toBe(200);
    expect(list.body).toEqual([expect.objectContaining({ name: 'shed rig', scopes: ['read'] })]);
    expect(JSON.stringify(list.body)).not.toContain(secret);
    const tokenId = list.body[0].id as number;
    expect((await request(t.app).get('/api/builds/mine').set('Authorization', `Bearer ${secret}`)).status).toBe(200);
    expect((await send(admin, 'delete', `/api/admin/users/${owner.id}/tokens/${tokenId}`)).status).toBe(204);
    expectError(await request(t.app).get('/api/builds/mine').set('Authorization', `Bearer ${secret}`), 401, 'invalid_token');
    const [entry] = await trail('user', owner.id);
    expect(entry).toMatchObject({
      action: 'token.revoke',
      actor: { id: adminId },
      targetLabel: `token “shed rig” #${tokenId} of @${owner.login}`,
    });
  });

  test('when the token belongs to someone else or does not exist, then 404 not_found and nothing is removed', async () => {
    const [a, b] = [await createUser(), await createUser()];
    const token = await ApiToken.create({ userId: b.id, name: 'other rig', scopes: ['read'], tokenHash: randomBytes(32).toString('hex') });
    expectError(await send(admin, 'delete', `/api/admin/users/${a.id}/tokens/${token.id}`), 404, 'not_found');
    expectError(await send(admin, 'delete', `/api/admin/users/999999999/tokens/${token.id}`), 404, 'not_found');
    expectError(await admin.get('/api/admin/users/999999999/tokens'), 404, 'not_found');
    expect(await ApiToken.findByPk(token.id)).not.toBeNull();
  });

  test('when a moderator or maker asks, then 403; a visitor 401; an admin’s read token cannot reach them', async () => {
    const owner = await createUser();
    for (const role of ['maker', 'moderator'] as const) {
      const agent = await signIn(t, (await createUser({ role })).login);
      expectError(await agent.get(`/api/admin/users/${owner.id}/tokens`), 403, 'forbidden');
    }
    expectError(await request(t.app).get(`/api/admin/users/${owner.id}/tokens`), 401, 'unauthorized');
    const { secret: adminToken } = await makeToken(admin, ['read'], 'admin reader');
    expectError(
      await request(t.app).get(`/api/admin/users/${owner.id}/tokens`).set('Authorization', `Bearer ${adminToken}`),
      403,
      'token_scope',
    );
  });
});

describe('decisions name their target on the trail and in the mail', () => {
  test('when a run is accepted, then the entry and the mail name it by actuator, measured date and gain ± (95 %)', async () => {
    const owner = await createUser();
    const build = await createBuildRow(owner.id, { status: 'published' });
    const part = await createPart({ name: `Cartridge bar ${randomBytes(2).toString('hex')}` });
    const actuator = await createActuatorRow({ buildId: build.id, partId: part.id });
    const ownerAgent = await signIn(t, owner.login);
    await ownerAgent.patch(`/api/actuators/${actuator.id}`).set('X-CSRF-Token', ownerAgent.csrf).send({ label: 'X bender' });
    const points = [0, 5, 10, 15, 20, 25, 30].map((v, i) => ({
      volts: v,
      displacement: 102.7 * v + [0.4, -0.3, 0.2, -0.5, 0.3, 0.1, -0.2][i]!,
    }));
    const created = await send(ownerAgent, 'post', `/api/actuators/${actuator.id}/runs`, {
      points,
      displacementUnit: 'nm',
      method: 'capacitive',
      measuredOn: '2026-11-12',
    });
    expect(created.status).toBe(201);
    const runId = created.body.id as number;
    const [lo, hi] = created.body.fit.gainCi95NmPerV as [number, number];
    expect(hi - lo).toBeGreaterThan(0);
    expect((await send(mod, 'post', `/api/review/runs/${runId}/decision`, { decision: 'accept' })).status).toBe(200);
    const [entry] = await trail('run', runId);
    // "X bender · run of 12 Nov 2026 · 102.70 ± 0.04 nm/V (95 %)": the gain rounded to the ± (two significant figures, GUM 7.2.6).
    expect(entry!.targetLabel).toMatch(/^X bender · run of 12 Nov 2026 · 102\.\d+ ± 0\.\d+ nm\/V \(95 %\)$/);
    expect(entry!.targetLabel).not.toMatch(/#\d/);
    const mail = await t.mail.waitFor((m) => m.to.includes(standInEmail(owner.login)) && m.subject.includes('accepted'));
    expect(mail.subject).toBe(`Calibration run accepted: ${entry!.targetLabel}`);
    expect(mail.text).toContain(entry!.targetLabel!);
  });

  test('when a build is published, a part rejected and a listing hidden, then each entry names the thing', async () => {
    const owner = await createUser();
    const build = await createBuildRow(owner.id, { status: 'submitted', title: 'Shed STM mark II' });
    const part = await createPart({ status: 'proposed', name: 'Buzzer disc 27 mm' });
    const listing = await createListingRow(owner.id);
    expect((await send(mod, 'post', `/api/review/builds/${build.id}/decision`, { decision: 'publish' })).status).toBe(200);
    expect((await send(mod, 'post', `/api/review/parts/${part.id}/decision`, { decision: 'reject', note: 'A duplicate.' })).status).toBe(
      200,
    );
    expect((await send(mod, 'post', `/api/listings/${listing.id}/visibility`, { hidden: true, note: 'No cautions.' })).status).toBe(200);
    expect((await trail('build', build.id))[0]!.targetLabel).toBe('“Shed STM mark II”');
    expect((await trail('part', part.id))[0]!.targetLabel).toBe('Buzzer disc 27 mm');
    expect((await trail('listing', listing.id))[0]!.targetLabel).toMatch(new RegExp(`^offering · Test bar \\w+ by @${owner.login}$`));
  });
});
