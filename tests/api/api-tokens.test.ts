import { createHash } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn } from '../support/login.ts';
import { createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { actuatorOf, makerWithActuator, makeToken, rigRun } from '../support/rig.ts';
import { ApiToken } from '../../server/models/api-token.model.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { setUserSuspended, toActor } from '../../server/services/user.service.ts';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t?.close();
});

const bearer = (secret: string) => ({ Authorization: `Bearer ${secret}` });
const suspend = async (userId: number, suspended: boolean) =>
  setUserSuspended(toActor(await createUser({ role: 'admin' })), userId, { suspended });

describe('POST /api/account/tokens', () => {
  test('when a maker creates a token, then 201 with the secret once; the list and the database never hold it', async () => {
    const { agent, user } = await makerWithActuator(t);
    const res = await agent
      .post('/api/account/tokens')
      .set('X-CSRF-Token', agent.csrf)
      .send({ name: 'Capacitive rig', scopes: ['read', 'runs:write'] });
    expect(res.status, res.text).toBe(201);
    expect(res.headers['cache-control']).toBe('no-store');
    expect(res.body).toEqual({
      id: expect.any(Number),
      name: 'Capacitive rig',
      scopes: ['runs:write', 'read'],
      token: expect.stringMatching(/^swt_[A-Za-z0-9_-]{43}$/),
      createdAt: expect.any(String),
    });
    const secret: string = res.body.token;

    const list = await agent.get('/api/account/tokens').expect(200);
    expect(list.body).toEqual([
      { id: res.body.id, name: 'Capacitive rig', scopes: ['runs:write', 'read'], createdAt: res.body.createdAt, lastUsedAt: null },
    ]);
    expect(list.text).not.toContain(secret.slice(4));

    // Only the SHA-256 of the secret is stored [S: FIPS 180-4 via node:crypto].
    const [rows] = await t.handle.sequelize.query('SELECT * FROM api_tokens WHERE user_id = ?', { replacements: [user.id] });
    expect(rows).toHaveLength(1);
    expect((rows as Array<{ token_hash: string }>)[0]!.token_hash).toBe(createHash('sha256').update(secret).digest('hex'));
    expect(JSON.stringify(rows)).not.toContain(secret.slice(4));
  });

  test.each([
    ['an empty name', { name: '  ', scopes: ['read'] }, 'name'],
    ['no scopes', { name: 'rig', scopes: [] }, 'scopes'],
    ['an unknown scope', { name: 'rig', scopes: ['admin'] }, 'scopes.0'],
    ['a name over 80 characters', { name: 'x'.repeat(81), scopes: ['read'] }, 'name'],
  ])('when the body has %s, then 400 on %s', async (_n, body, field) => {
    const user = await createUser();
    const agent = await signIn(t, user.login);
    expectError(await agent.post('/api/account/tokens').set('X-CSRF-Token', agent.csrf).send(body), 400, 'validation_failed', field);
  });

  test('when a visitor asks for the list or a new token, then 401', async () => {
    expectError(await request(t.app).get('/api/account/tokens'), 401, 'unauthorized');
  });
});

describe('DELETE /api/account/tokens/:tokenId', () => {
  test("when the owner revokes a token, then 204, it leaves the list and stops working; another maker's revoke is 404", async () => {
    const { agent, actuator } = await makerWithActuator(t);
    const { secret, id } = await makeToken(agent, ['runs:write']);
    const other = await signIn(t, (await createUser()).login);
    expectError(await other.delete(`/api/account/tokens/${id}`).set('X-CSRF-Token', other.csrf), 404, 'not_found');
    await request(t.app).post(`/api/actuators/${actuator.id}/runs`).set(bearer(secret)).send(rigRun()).expect(201);

    await agent.delete(`/api/account/tokens/${id}`).set('X-CSRF-Token', agent.csrf).expect(204);
    expect((await agent.get('/api/account/tokens').expect(200)).body).toEqual([]);
    expectError(await request(t.app).post(`/api/actuators/${actuator.id}/runs`).set(bearer(secret)).send(rigRun()), 401, 'invalid_token');
    expectError(await agent.delete(`/api/account/tokens/${id}`).set('X-CSRF-Token', agent.csrf), 404, 'not_found');
  });
});

describe('requests with Authorization: Bearer', () => {
  test('when a runs:write token posts a run without cookie or CSRF token, then 201, the run is the owner’s and lastUsedAt is set', async () => {
    const { agent, user, actuator } = await makerWithActuator(t);
    const { secret, id } = await makeToken(agent, ['runs:write']);
    const res = await request(t.app).post(`/api/actuators/${actuator.id}/runs`).set(bearer(secret)).send(rigRun());
    expect(res.status, res.text).toBe(201);
    expect(res.headers['set-cookie']).toBeUndefined();
    const run = await CalibrationRun.findByPk(res.body.id);
    expect({ owner: run?.ownerId, actuator: run?.actuatorId, status: run?.status }).toEqual({
      owner: user.id,
      actuator: actuator.id,
      status: 'pending',
    });
    // 4.2 nm/V by construction of the points [calc].
    expect(run!.gainNmPerV).toBeCloseTo(4.2, 9);
    const listed = (await agent.get('/api/account/tokens').expect(200)).body.find((x: { id: number }) => x.id === id);
    expect(Date.parse(listed.lastUsedAt)).toBeGreaterThan(Date.now() - 60_000);
  });

  test('when a runs:write token corrects one of its owner’s runs (PATCH), then 200 and the run is refitted', async () => {
    const { agent, actuator } = await makerWithActuator(t);
    const { secret } = await makeToken(agent, ['runs:write']);
    const created = await request(t.app).post(`/api/actuators/${actuator.id}/runs`).set(bearer(secret)).send(rigRun()).expect(201);
    const res = await request(t.app)
      .patch(`/api/runs/${created.body.id}`)
      .set(bearer(secret))
      .send({ points: rigRun(5).points });
    expect(res.status, res.text).toBe(200);
    // 5 nm/V by construction of the corrected points [calc].
    expect((await CalibrationRun.findByPk(created.body.id))!.gainNmPerV).toBeCloseTo(5, 9);
  });

  test('when a runs:write token is sent to any other route, then 403 token_scope and nothing changes', async () => {
    const { agent, actuator, build } = await makerWithActuator(t);
    const { secret } = await makeToken(agent, ['runs:write']);
    expectError(await request(t.app).post('/api/builds').set(bearer(secret)).send({ title: 'x' }), 403, 'token_scope');
    expectError(await request(t.app).get(`/api/builds/${build.id}`).set(bearer(secret)), 403, 'token_scope');
    expectError(await request(t.app).delete(`/api/actuators/${actuator.id}`).set(bearer(secret)), 403, 'token_scope');
    expectError(await request(t.app).patch('/api/account/settings').set(bearer(secret)).send({ mailOptOut: true }), 403, 'token_scope');
    expectError(await request(t.app).post('/api/workbench/convert').set(bearer(secret)).send({}), 403, 'token_scope');
    expectError(await request(t.app).post('/auth/logout').set(bearer(secret)), 403, 'token_scope');
    expect(await CalibrationRun.count({ where: { actuatorId: actuator.id } })).toBe(0);
  });

  test("when a runs:write token posts to another maker's actuator, then the run service's answer (404 for a draft it cannot see)", async () => {
    const { agent } = await makerWithActuator(t);
    const { secret } = await makeToken(agent, ['runs:write']);
    const { actuator } = await actuatorOf((await createUser()).id);
    expectError(await request(t.app).post(`/api/actuators/${actuator.id}/runs`).set(bearer(secret)).send(rigRun()), 404, 'not_found');
    expect(await CalibrationRun.count({ where: { actuatorId: actuator.id } })).toBe(0);
  });

  test('when a read token GETs as its owner, then 200 (a draft only the owner sees); its POSTs are 403 token_scope', async () => {
    const { agent, build, actuator } = await makerWithActuator(t);
    const { secret } = await makeToken(agent, ['read']);
    const res = await request(t.app).get(`/api/builds/${build.id}`).set(bearer(secret));
    expect(res.status, res.text).toBe(200);
    expect(res.body).toMatchObject({ id: build.id, status: 'draft' });
    expect((await request(t.app).get('/api/account/settings').set(bearer(secret)).expect(200)).body).toHaveProperty('mailOptOut', false);
    expectError(await request(t.app).post(`/api/actuators/${actuator.id}/runs`).set(bearer(secret)).send(rigRun()), 403, 'token_scope');
    expectError(await request(t.app).get('/api/session').set(bearer(secret)), 403, 'token_scope');
  });

  test('when a token tries to create, list or revoke tokens, then 403 token_scope', async () => {
    const { agent } = await makerWithActuator(t);
    const { secret, id } = await makeToken(agent, ['read', 'runs:write']);
    expectError(await request(t.app).get('/api/account/tokens').set(bearer(secret)), 403, 'token_scope');
    expectError(await request(t.app).get('/api/account/tokens/').set(bearer(secret)), 403, 'token_scope');
    expectError(
      await request(t.app)
        .post('/api/account/tokens')
        .set(bearer(secret))
        .send({ name: 'more', scopes: ['read'] }),
      403,
      'token_scope',
    );
    expectError(await request(t.app).delete(`/api/account/tokens/${id}`).set(bearer(secret)), 403, 'token_scope');
    // Even riding along a signed-in browser session, the token decides.
    expectError(await agent.get('/api/account/tokens').set(bearer(secret)), 403, 'token_scope');
    expect((await agent.get('/api/account/tokens').expect(200)).body).toHaveLength(1);
  });

  test.each([
    ['an unknown token', `Bearer swt_${'A'.repeat(43)}`],
    ['a malformed token', 'Bearer not-a-token'],
    ['an empty bearer', 'Bearer '],
    ['another scheme', 'Basic dXNlcjpwYXNz'],
  ])('when the request carries %s, then 401 invalid_token, even on a public read', async (_n, header) => {
    const res = await request(t.app).get('/api/parts').set('Authorization', header);
    expectError(res, 401, 'invalid_token');
    expect(res.headers['www-authenticate']).toBe('Bearer error="invalid_token"');
  });

  test("when the token's owner is suspended, then 401 invalid_token; reinstated, the token works again", async () => {
    const { agent, user, actuator } = await makerWithActuator(t);
    const { secret } = await makeToken(agent, ['runs:write', 'read']);
    await suspend(user.id, true);
    expectError(await request(t.app).post(`/api/actuators/${actuator.id}/runs`).set(bearer(secret)).send(rigRun()), 401, 'invalid_token');
    expectError(await request(t.app).get('/api/parts').set(bearer(secret)), 401, 'invalid_token');
    await suspend(user.id, false);
    await request(t.app).post(`/api/actuators/${actuator.id}/runs`).set(bearer(secret)).send(rigRun()).expect(201);
  });

  test('when lastUsedAt was set less than a minute ago, then a new request does not write it again', async () => {
    const { agent, actuator } = await makerWithActuator(t);
    const { secret, id } = await makeToken(agent, ['runs:write']);
    await request(t.app).post(`/api/actuators/${actuator.id}/runs`).set(bearer(secret)).send(rigRun()).expect(201);
    const first = (await ApiToken.findByPk(id))!.lastUsedAt!;
    await request(t.app).post(`/api/actuators/${actuator.id}/runs`).set(bearer(secret)).send(rigRun(5)).expect(201);
    expect((await ApiToken.findByPk(id))!.lastUsedAt!.getTime()).toBe(first.getTime());
  });
});

describe('the per-token rate limit', () => {
  let limited: TestApp;
  beforeAll(async () => {
    limited = await startTestApp({ rateLimits: true });
  });
  afterAll(async () => {
    await limited?.close();
    t.rebind();
  });

  test('when a token sends more than 120 requests in a minute, then 429 rate_limited; another token of the same owner still passes', async () => {
    const user = await createUser();
    const agent = await signIn(limited, user.login);
    const { build } = await actuatorOf(user.id);
    const [one, two] = [await makeToken(agent, ['read']), await makeToken(agent, ['read'])];
    for (let i = 0; i < 120; i++) await request(limited.app).get(`/api/builds/${build.id}`).set(bearer(one.secret)).expect(200);
    expectError(await request(limited.app).get(`/api/builds/${build.id}`).set(bearer(one.secret)), 429, 'rate_limited');
    await request(limited.app).get(`/api/builds/${build.id}`).set(bearer(two.secret)).expect(200);
  });
});
