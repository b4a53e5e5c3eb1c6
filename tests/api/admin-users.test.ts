import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn } from '../support/login.ts';
import { createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('GET /api/admin/users', () => {
  test('when a visitor asks, then 401', async () => {
    const res = await request(t.app).get('/api/admin/users');
    expect(res.status).toBe(401);
    expect(res.body).toMatchObject({ error: { code: 'unauthorized' } });
  });

  test.each(['maker', 'moderator'] as const)('when a %s asks, then 403', async (role) => {
    const u = await createUser({ role });
    const agent = await signIn(t, u.login);
    const res = await agent.get('/api/admin/users');
    expect(res.status).toBe(403);
    expect(res.body).toMatchObject({ error: { code: 'forbidden' } });
  });

  test('when an admin asks, then 200 with a page of users, searchable', async () => {
    const admin = await createUser({ role: 'admin' });
    const other = await createUser();
    const agent = await signIn(t, admin.login);
    const res = await agent.get(`/api/admin/users?q=${other.login}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ total: 1, page: 1, items: [{ id: other.id, login: other.login, role: 'maker', suspended: false }] });
    expect(res.body.items[0]).not.toHaveProperty('email');
  });

  test('when a query parameter is bad, then 400 with field details', async () => {
    const admin = await createUser({ role: 'admin' });
    const agent = await signIn(t, admin.login);
    const res = await agent.get('/api/admin/users?pageSize=5000');
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ error: { code: 'validation_failed', details: [{ path: 'pageSize' }] } });
  });
});

describe('PATCH /api/admin/users/:userId/role', () => {
  test('when an admin grants moderator, then the user becomes a moderator', async () => {
    const admin = await createUser({ role: 'admin' });
    const target = await createUser();
    const agent = await signIn(t, admin.login);
    const res = await agent.patch(`/api/admin/users/${target.id}/role`).set('X-CSRF-Token', agent.csrf).send({ role: 'moderator' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ id: target.id, role: 'moderator' });
    const asTarget = await signIn(t, target.login);
    expect((await asTarget.get('/api/session')).body.user.role).toBe('moderator');
    const revoke = await agent.patch(`/api/admin/users/${target.id}/role`).set('X-CSRF-Token', agent.csrf).send({ role: 'maker' });
    expect(revoke.body.role).toBe('maker');
  });

  test('when a maker tries, then 403 and nothing changes', async () => {
    const maker = await createUser();
    const target = await createUser();
    const agent = await signIn(t, maker.login);
    const res = await agent.patch(`/api/admin/users/${target.id}/role`).set('X-CSRF-Token', agent.csrf).send({ role: 'admin' });
    expectError(res, 403, 'forbidden');
    await target.reload();
    expect(target.role).toBe('maker');
  });

  test('when an admin changes their own role, then 403', async () => {
    const admin = await createUser({ role: 'admin' });
    const agent = await signIn(t, admin.login);
    const res = await agent.patch(`/api/admin/users/${admin.id}/role`).set('X-CSRF-Token', agent.csrf).send({ role: 'maker' });
    expectError(res, 403, 'forbidden');
  });

  test('when the role is unknown or extra fields are sent, then 400', async () => {
    const admin = await createUser({ role: 'admin' });
    const target = await createUser();
    const agent = await signIn(t, admin.login);
    // An unknown key is an issue of the whole body (path '').
    for (const [body, field] of [
      [{ role: 'overlord' }, 'role'],
      [{ role: 'maker', extra: 1 }, ''],
      [{}, 'role'],
    ] as const) {
      const res = await agent.patch(`/api/admin/users/${target.id}/role`).set('X-CSRF-Token', agent.csrf).send(body);
      expectError(res, 400, 'validation_failed', field);
    }
  });

  test('when the user does not exist, then 404', async () => {
    const admin = await createUser({ role: 'admin' });
    const agent = await signIn(t, admin.login);
    const res = await agent.patch('/api/admin/users/999999999/role').set('X-CSRF-Token', agent.csrf).send({ role: 'maker' });
    expectError(res, 404, 'not_found');
  });
});

describe('PATCH /api/admin/users/:userId/suspension', () => {
  test('when an admin suspends a signed-in maker, then the maker is signed out and cannot sign back in', async () => {
    const admin = await createUser({ role: 'admin' });
    const target = await createUser();
    const targetAgent = await signIn(t, target.login);
    const agent = await signIn(t, admin.login);
    const res = await agent.patch(`/api/admin/users/${target.id}/suspension`).set('X-CSRF-Token', agent.csrf).send({ suspended: true });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ suspended: true });

    expect((await targetAgent.get('/api/session')).body.user).toBeNull();
    const write = await targetAgent.post('/auth/logout').set('X-CSRF-Token', targetAgent.csrf);
    expectError(write, 403, 'csrf_failed');

    const again = request.agent(t.app);
    const start = await again.get(`/auth/github?login=${target.login}`).expect(302);
    const provider = await fetch(start.headers.location, { redirect: 'manual' });
    const cb = new URL(provider.headers.get('location')!);
    const done = await again.get(cb.pathname + cb.search);
    expect(done.headers.location).toBe('/?signin=suspended');
    expect((await again.get('/api/session')).body.user).toBeNull();
  });

  test('when an admin reinstates, then the person can sign in again', async () => {
    const admin = await createUser({ role: 'admin' });
    const target = await createUser({ suspendedAt: new Date() });
    const agent = await signIn(t, admin.login);
    await agent.patch(`/api/admin/users/${target.id}/suspension`).set('X-CSRF-Token', agent.csrf).send({ suspended: false }).expect(200);
    const back = await signIn(t, target.login);
    expect((await back.get('/api/session')).body.user.login).toBe(target.login);
  });

  test('when a moderator tries, then 403', async () => {
    const mod = await createUser({ role: 'moderator' });
    const target = await createUser();
    const agent = await signIn(t, mod.login);
    const res = await agent.patch(`/api/admin/users/${target.id}/suspension`).set('X-CSRF-Token', agent.csrf).send({ suspended: true });
    expectError(res, 403, 'forbidden');
  });
});
