import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn } from '../support/login.ts';
import { createUser } from '../support/factories.ts';

describe('GET /api/session', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(async () => {
    await t.close();
  });

  test('when a visitor asks, then user is null and a CSRF token is issued in an httpOnly SameSite=Lax cookie session', async () => {
    const res = await request(t.app).get('/api/session');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ user: null, csrfToken: expect.stringMatching(/^[\w-]{20,}$/) });
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/);
  });

  test('when signed in, then the user carries id, login, name, avatarUrl and role', async () => {
    const u = await createUser();
    const agent = await signIn(t, u.login);
    const res = await agent.get('/api/session');
    expect(res.body.user).toEqual({ id: u.id, login: u.login, name: u.login, avatarUrl: null, role: 'maker' });
  });
});

// A missing or wrong CSRF token on every state-changing route is checked in tests/api/authorization-matrix.test.ts.
describe('CSRF', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(async () => {
    await t.close();
  });

  test('when logout carries the token, then the answer is a new signed-out session with its own token, and the old one is gone server-side', async () => {
    const u = await createUser();
    const agent = await signIn(t, u.login);
    const cookie = (await agent.get('/api/session')).request.cookies;
    const out = await agent.post('/auth/logout').set('X-CSRF-Token', agent.csrf).expect(200);
    // The answer is the new, empty session: signed out, with a fresh CSRF token that the next read repeats.
    expect(out.body).toEqual({ user: null, csrfToken: expect.any(String) });
    expect(out.body.csrfToken).not.toBe(agent.csrf);
    expect(out.headers['cache-control']).toBe('no-store');
    expect(await agent.get('/api/session').then((r) => r.body)).toEqual({ user: null, csrfToken: out.body.csrfToken });
    // Replaying the old cookie does not bring the session back.
    const replay = await request(t.app).get('/api/session').set('Cookie', cookie);
    expect(replay.body.user).toBeNull();
  });
});
