import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn } from '../support/login.ts';
import { createUser, uniqueLogin } from '../support/factories.ts';
import { waitFor } from '../support/wait-for.ts';
import { User } from '../../server/models/user.model.ts';
import { OutboxMail } from '../../server/models/outbox-mail.model.ts';
import { standInEmail } from '../../server/dev/demo-accounts.ts';

describe('sign-in through the OAuth stand-in', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(async () => {
    await t.close();
  });

  test.each(['maker', 'moderator', 'admin'] as const)('when a %s signs in, then the session shows that role', async (role) => {
    const u = await createUser({ role });
    const agent = await signIn(t, u.login);
    expect((await agent.get('/api/session')).body.user).toMatchObject({ login: u.login, role });
  });

  test('when a new handle signs in, then a maker account is created and a welcome mail goes to its address', async () => {
    const login = uniqueLogin('newcomer');
    await signIn(t, login);
    const user = await User.findOne({ where: { login } });
    expect(user?.role).toBe('maker');
    const mail = await t.mail.waitFor((m) => m.to.includes(standInEmail(login)));
    expect(mail.subject).toBe('Welcome to Scanwright');
    expect(mail.listUnsubscribePost).toBe('List-Unsubscribe=One-Click'); // RFC 8058, kind `account`
    expect(mail.listUnsubscribe).toMatch(/\/api\/mail\/unsubscribe\/\d+\/account\//);
    expect(mail.text).toContain(login);
    expect(mail.html).toContain('Scanwright');
  });

  test('when the same person signs in twice, then no second welcome mail is sent', async () => {
    const login = uniqueLogin('twice');
    await signIn(t, login);
    await t.mail.waitFor((m) => m.to.includes(standInEmail(login)));
    await signIn(t, login);
    // A welcome mail is queued inside the sign-in request, so a second one would be in the outbox by now.
    const to = standInEmail(login);
    expect(await OutboxMail.count({ where: { toAddress: to } })).toBe(1);
    await waitFor(async () => (await OutboxMail.count({ where: { toAddress: to, sentAt: null } })) === 0, { what: 'the outbox to drain' });
    expect(t.mail.messages.filter((m) => m.to.includes(to))).toHaveLength(1);
  });

  test('when a handle is in ADMIN_LOGINS, then it becomes admin at sign-in', async () => {
    const login = uniqueLogin('boss');
    const t2 = await startTestApp({ adminLogins: [login] });
    try {
      const agent = await signIn(t2, login);
      expect((await agent.get('/api/session')).body.user.role).toBe('admin');
    } finally {
      await t2.close();
      t.rebind();
    }
  });

  test('when signing in, then the session id changes', async () => {
    const u = await createUser();
    const agent = request.agent(t.app);
    const before = await agent.get('/api/session');
    const sidBefore = String(before.headers['set-cookie']).match(/scanwright\.sid=([^;]+)/)![1];
    const start = await agent.get(`/auth/github?login=${u.login}`).expect(302);
    const provider = await fetch(start.headers.location, { redirect: 'manual' });
    const cb = new URL(provider.headers.get('location')!);
    const done = await agent.get(cb.pathname + cb.search).expect(302);
    const sidAfter = String(done.headers['set-cookie']).match(/scanwright\.sid=([^;]+)/)![1];
    expect(sidAfter).not.toBe(sidBefore);
  });

  test('when a returnTo path is given, then sign-in comes back to it; an off-site one is ignored', async () => {
    const u = await createUser();
    for (const [returnTo, expected] of [
      ['/workbench/fit', '/workbench/fit'],
      ['//evil.example', '/'],
    ]) {
      const agent = request.agent(t.app);
      const start = await agent.get(`/auth/github?login=${u.login}&returnTo=${encodeURIComponent(returnTo)}`).expect(302);
      const provider = await fetch(start.headers.location, { redirect: 'manual' });
      const cb = new URL(provider.headers.get('location')!);
      const done = await agent.get(cb.pathname + cb.search).expect(302);
      expect(done.headers.location).toBe(expected);
    }
  });

  test('when the callback carries a forged state, then sign-in fails without a session', async () => {
    const agent = request.agent(t.app);
    await agent.get('/auth/github?login=someone').expect(302);
    const res = await agent.get('/auth/github/callback?code=abc&state=forged');
    expect(res.status).toBe(302);
    expect(res.headers.location).toBe('/?signin=failed');
    expect((await agent.get('/api/session')).body.user).toBeNull();
  });
});
