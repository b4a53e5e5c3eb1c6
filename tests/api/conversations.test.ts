// The conversation around a build and news people asked for: review threads, follows, notifications,
// per-kind mail choices with one-click unsubscribe (RFC 8058), and reports on comments.
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, visitor, type Agent } from '../support/login.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { Notification } from '../../server/models/notification.model.ts';
import { OutboxMail } from '../../server/models/outbox-mail.model.ts';
import { ReviewPost } from '../../server/models/review-post.model.ts';
import { Follow } from '../../server/models/follow.model.ts';
import { User } from '../../server/models/user.model.ts';
import { BuildComment } from '../../server/models/build-comment.model.ts';
import { Report } from '../../server/models/report.model.ts';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

const post = (a: Agent, path: string, body: object = {}) => a.post(path).set('X-CSRF-Token', a.csrf).send(body);
const put = (a: Agent, path: string) => a.put(path).set('X-CSRF-Token', a.csrf).send({});
const del = (a: Agent, path: string) => a.delete(path).set('X-CSRF-Token', a.csrf);

/** A user with an address, signed in. */
async function person(role: 'maker' | 'moderator' = 'maker') {
  const user = await createUser({ role });
  const agent = await signIn(t, user.login); // signing in sets the address the provider gives; ours replaces it
  await user.update({ email: `${user.login}@example.test` });
  return { user, agent };
}
const notificationsOf = (userId: number) => Notification.findAll({ where: { userId }, order: [['id', 'ASC']] });

describe('the review thread of a build', () => {
  test('when the maker answers a return note, then the moderator who returned it is notified and mailed, and the reply reaches the maker', async () => {
    const maker = await person();
    const mod = await person('moderator');
    const build = await createBuildRow(maker.user.id, { status: 'submitted', title: 'Thread bender' });
    expect(
      (await post(mod.agent, `/api/review/builds/${build.id}/decision`, { decision: 'return', note: 'Say where the bar is clamped.' }))
        .status,
    ).toBe(200);

    const asked = await post(maker.agent, `/api/builds/${build.id}/review-thread`, { body: 'Clamped at **3 mm** from the end.' });
    expect(asked.status, asked.text).toBe(201);
    expect(asked.body).toMatchObject({ type: 'post', side: 'maker', author: { login: maker.user.login } });
    const toMod = await t.mail.waitFor(
      (m) => m.to.includes(`${mod.user.login}@example.test`) && m.subject === 'Review thread: Thread bender',
    );
    expect(toMod.text).toContain('Clamped at **3 mm** from the end.');
    expect((await notificationsOf(mod.user.id)).map((n) => [n.kind, n.path])).toEqual([
      ['review-thread', `/builds/${build.id}#review-thread`],
    ]);

    expect((await post(mod.agent, `/api/builds/${build.id}/review-thread`, { body: 'Thanks, resubmit when ready.' })).status).toBe(201);
    await t.mail.waitFor((m) => m.to.includes(`${maker.user.login}@example.test`) && m.subject === 'Review thread: Thread bender');
    const kinds = (await notificationsOf(maker.user.id)).map((n) => n.kind);
    expect(kinds).toEqual(['review', 'review-thread']);

    const thread = await maker.agent.get(`/api/builds/${build.id}/review-thread`);
    expect(thread.status).toBe(200);
    expect(thread.headers['cache-control']).toBe('no-store');
    expect(thread.body.items.map((i: { type: string; side?: string; label?: string }) => i.side ?? i.label)).toEqual([
      'Returned with notes',
      'maker',
      'moderator',
    ]);
    // The maker sees that "a moderator" decided; the moderator sees who.
    expect(thread.body.items[0]).toMatchObject({ type: 'decision', note: 'Say where the bar is clamped.', by: null });
    expect((await mod.agent.get(`/api/builds/${build.id}/review-thread`)).body.items[0].by).toBe(mod.user.login);
  });

  test('when anyone but the maker and the moderators asks, then 404 (and visitors 401), and nothing is stored', async () => {
    const maker = await person();
    const other = await person();
    const build = await createBuildRow(maker.user.id, { status: 'published' });
    expectError(await other.agent.get(`/api/builds/${build.id}/review-thread`), 404, 'not_found');
    expectError(await post(other.agent, `/api/builds/${build.id}/review-thread`, { body: 'Let me in' }), 404, 'not_found');
    expectError(await request(t.app).get(`/api/builds/${build.id}/review-thread`), 401, 'unauthorized');
    expectError(await maker.agent.get('/api/builds/999999999/review-thread'), 404, 'not_found');
    expect(await ReviewPost.count({ where: { buildId: build.id } })).toBe(0);
  });

  test('when a post is empty, too long or has control characters, then 400 naming the body', async () => {
    const maker = await person();
    const build = await createBuildRow(maker.user.id, { status: 'draft' });
    const path = `/api/builds/${build.id}/review-thread`;
    expectError(await post(maker.agent, path, { body: '  ' }), 400, 'validation_failed', 'body');
    expectError(await post(maker.agent, path, { body: 'x'.repeat(4001) }), 400, 'validation_failed', 'body');
    expectError(await post(maker.agent, path, { body: 'bell \u0007' }), 400, 'validation_failed', 'body');
    expectError(await post(maker.agent, path, { body: 'ok', extra: 1 }), 400, 'validation_failed');
    expect(await ReviewPost.count({ where: { buildId: build.id } })).toBe(0);
  });
});

describe('follows and what followers are told', () => {
  test('when a maker follows a published build and a log entry is added, then they are notified and mailed with one-click unsubscribe headers', async () => {
    const owner = await person();
    const fan = await person();
    const build = await createBuildRow(owner.user.id, { status: 'published', title: 'Followed stage' });
    const followed = await put(fan.agent, `/api/follows/build/${build.id}`);
    expect(followed.status, followed.text).toBe(200);
    expect(followed.body).toEqual({ targetType: 'build', targetId: build.id, following: true, followers: 1 });
    expect((await put(fan.agent, `/api/follows/build/${build.id}`)).body.followers).toBe(1); // twice is once

    const entry = await post(owner.agent, `/api/builds/${build.id}/entries`, {
      entryDate: '2026-11-30',
      title: 'New clamp',
      body: 'Milled.',
    });
    expect(entry.status, entry.text).toBe(201);
    const [n] = await notificationsOf(fan.user.id);
    expect(n).toMatchObject({ kind: 'follow-entry', path: `/builds/${build.id}#entry-${entry.body.id}` });
    expect(n!.text).toContain('New clamp');
    expect(await notificationsOf(owner.user.id)).toEqual([]); // not told of one's own entry

    const mail = await t.mail.waitFor(
      (m) => m.to.includes(`${fan.user.login}@example.test`) && m.subject === 'New log entry: Followed stage',
    );
    expect(mail.listUnsubscribePost).toBe('List-Unsubscribe=One-Click');
    expect(mail.listUnsubscribe).toMatch(
      new RegExp(`^<http://127\\.0\\.0\\.1:3999/api/mail/unsubscribe/${fan.user.id}/follows/[A-Za-z0-9_-]+>$`),
    );
    expect(mail.text).toMatch(new RegExp(`/mail/stop/${fan.user.id}/follows/`));

    // One click, as a mail provider sends it: no cookie, no CSRF token, its own Origin, a form body (RFC 8058 §3.1).
    const oneClick = new URL(mail.listUnsubscribe!.slice(1, -1));
    const stopped = await request(t.app)
      .post(oneClick.pathname)
      .set('Origin', 'https://mail.example.net')
      .type('form')
      .send('List-Unsubscribe=One-Click');
    expect(stopped.status, stopped.text).toBe(200);
    expect(stopped.body).toMatchObject({ kind: 'follows', on: false });
    expect((await User.findByPk(fan.user.id))?.mailOff).toBe('follows');

    // No more mail of that kind, but the notification still comes.
    const before = await OutboxMail.count({ where: { toAddress: `${fan.user.login}@example.test` } });
    expect(
      (await post(owner.agent, `/api/builds/${build.id}/entries`, { entryDate: '2026-12-01', title: 'Second', body: 'x' })).status,
    ).toBe(201);
    expect(await OutboxMail.count({ where: { toAddress: `${fan.user.login}@example.test` } })).toBe(before);
    expect((await notificationsOf(fan.user.id)).length).toBe(2);

    expect((await del(fan.agent, `/api/follows/build/${build.id}`)).status).toBe(204);
    expect((await fan.agent.get(`/api/follows/build/${build.id}`)).body).toMatchObject({ following: false, followers: 0 });
  });

  test('when the link is opened (GET), then nothing changes; a wrong or forged link is 404 bad_unsubscribe_link', async () => {
    const fan = await person();
    const { unsubscribeLinks } = await import('../../server/services/mail-choices.service.ts');
    const link = (await unsubscribeLinks(fan.user.id, 'comments'))!;
    const path = new URL(link.oneClick.replace('{{APP_URL}}', 'http://x')).pathname;
    const seen = await request(t.app).get(path);
    expect(seen.body).toEqual({ kind: 'comments', title: 'Comments on your builds', on: true });
    expect((await User.findByPk(fan.user.id))?.mailOff).toBe('');
    const forged = path.replace(/\/[A-Za-z0-9_-]+$/, '/AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA');
    expectError(await request(t.app).post(forged), 404, 'bad_unsubscribe_link');
    const otherPerson = path.replace(`/${fan.user.id}/`, `/${fan.user.id + 1}/`);
    expectError(await request(t.app).post(otherPerson), 404, 'bad_unsubscribe_link');
    const otherKind = path.replace('/comments/', '/follows/');
    expectError(await request(t.app).post(otherKind), 404, 'bad_unsubscribe_link');
    expectError(await request(t.app).post(path.replace('/comments/', '/spam/')), 400, 'validation_failed', 'kind');
    expect((await User.findByPk(fan.user.id))?.mailOff).toBe('');
  });

  test('when a followed part gets a newly counted run, and a followed maker publishes a build, then followers hear of each', async () => {
    const maker = await person();
    const fan = await person();
    const mod = await person('moderator');
    const part = await createPart({ status: 'accepted', name: `Follow bar ${maker.user.id}` });
    expect((await put(fan.agent, `/api/follows/part/${part.id}`)).status).toBe(200);
    expect((await put(fan.agent, `/api/follows/maker/${maker.user.id}`)).status).toBe(200);
    const build = await createBuildRow(maker.user.id, { status: 'submitted', title: 'Counted build' });
    const run = await createRunRow({ buildId: build.id, partId: part.id, ownerId: maker.user.id, gainNmPerV: 71.3, status: 'accepted' });

    expect((await post(mod.agent, `/api/review/builds/${build.id}/decision`, { decision: 'publish' })).status).toBe(200);
    const told = await notificationsOf(fan.user.id);
    expect(told.map((n) => n.kind).sort()).toEqual(['follow-build', 'follow-run']);
    expect(told.find((n) => n.kind === 'follow-build')!.text).toContain('Counted build');
    expect(told.find((n) => n.kind === 'follow-run')!.path).toBe(`/parts/${part.id}`);
    expect(run.id).toBeGreaterThan(0);

    // A run accepted later on the published build counts at once: the part's followers hear of it.
    const later = await createRunRow({ buildId: build.id, partId: part.id, ownerId: maker.user.id, gainNmPerV: 69.8 });
    expect((await post(mod.agent, `/api/review/runs/${later.id}/decision`, { decision: 'accept' })).status).toBe(200);
    expect((await notificationsOf(fan.user.id)).filter((n) => n.kind === 'follow-run').length).toBe(2);
  });

  test('when the target cannot be followed, then a clear 4xx and no follow row', async () => {
    const maker = await person();
    const draft = await createBuildRow(maker.user.id, { status: 'draft' });
    const proposed = await createPart({ status: 'proposed' });
    expectError(await put(maker.agent, `/api/follows/build/${draft.id}`), 404, 'not_found');
    expectError(await put(maker.agent, `/api/follows/part/${proposed.id}`), 404, 'not_found');
    expectError(await put(maker.agent, `/api/follows/maker/${maker.user.id}`), 400, 'follow_self');
    expectError(await put(maker.agent, '/api/follows/listing/1'), 400, 'validation_failed', 'targetType');
    expectError(await put(maker.agent, '/api/follows/maker/0'), 400, 'validation_failed', 'targetId');
    const guest = await visitor(t);
    expectError(await put(guest, `/api/follows/build/${draft.id}`), 401, 'unauthorized');
    expect(await Follow.count({ where: { userId: maker.user.id } })).toBe(0);
  });
});

describe('notifications', () => {
  test('when listed, then newest first with the unread count and paging; marking read touches only my own', async () => {
    const me = await person();
    const other = await person();
    for (let i = 1; i <= 3; i++) await Notification.create({ userId: me.user.id, kind: 'comment', text: `n${i}`, path: '/builds/1' });
    const theirs = await Notification.create({ userId: other.user.id, kind: 'comment', text: 'theirs', path: '/builds/1' });

    const page1 = await me.agent.get('/api/notifications?limit=2');
    expect(page1.status).toBe(200);
    expect(page1.headers['cache-control']).toBe('no-store');
    expect(page1.body.items.map((n: { text: string }) => n.text)).toEqual(['n3', 'n2']);
    expect(page1.body.unread).toBe(3);
    const page2 = await me.agent.get(`/api/notifications?limit=2&before=${page1.body.nextBefore}`);
    expect(page2.body.items.map((n: { text: string }) => n.text)).toEqual(['n1']);
    expect(page2.body.nextBefore).toBeNull();

    const marked = await post(me.agent, '/api/notifications/read', { ids: [page1.body.items[0].id, theirs.id] });
    expect(marked.body).toEqual({ unread: 2 });
    expect((await Notification.findByPk(theirs.id))?.readAt).toBeNull();
    expect((await post(me.agent, '/api/notifications/read', {})).body).toEqual({ unread: 0 });

    expectError(await me.agent.get('/api/notifications?limit=0'), 400, 'validation_failed', 'limit');
    expectError(await post(me.agent, '/api/notifications/read', { ids: [] }), 400, 'validation_failed', 'ids');
    expectError(await post(me.agent, '/api/notifications/read', { ids: ['x'] }), 400, 'validation_failed', ['ids', 0]);
    expectError(await request(t.app).get('/api/notifications'), 401, 'unauthorized');
  });

  test('when counted, then unread notifications and unread messages from others are the badges', async () => {
    const me = await person();
    await Notification.create({ userId: me.user.id, kind: 'review', text: 'x', path: '/' });
    const counts = await me.agent.get('/api/notifications/counts');
    expect(counts.status).toBe(200);
    expect(counts.body).toEqual({ notifications: 1, messages: 0 });
  });
});

describe('mail choices', () => {
  test('when a kind is turned off on the account page, then it shows there and mail of that kind is not queued', async () => {
    const owner = await person();
    const fan = await person();
    const settings = await owner.agent
      .patch('/api/account/settings')
      .set('X-CSRF-Token', owner.agent.csrf)
      .send({ mailChoices: { comments: false } });
    expect(settings.status, settings.text).toBe(200);
    expect(settings.body.mailChoices).toEqual({ review: true, messages: true, comments: false, follows: true, account: true });
    const build = await createBuildRow(owner.user.id, { status: 'published' });
    expect((await post(fan.agent, `/api/builds/${build.id}/comments`, { body: 'Nice clamp' })).status).toBe(201);
    expect(await OutboxMail.count({ where: { toAddress: `${owner.user.login}@example.test` } })).toBe(0);
    expect((await notificationsOf(owner.user.id)).map((n) => n.kind)).toEqual(['comment']);

    const patch = (body: object) => owner.agent.patch('/api/account/settings').set('X-CSRF-Token', owner.agent.csrf).send(body);
    expectError(await patch({}), 400, 'validation_failed');
    expectError(await patch({ mailChoices: { spam: false } }), 400, 'validation_failed');
    expectError(await patch({ mailChoices: { comments: 'no' } }), 400, 'validation_failed', ['mailChoices', 'comments']);
  });
});

describe('reports on comments', () => {
  test('when a maker reports a comment, then it waits on the desk with a link to it; its author, a moderator, may not settle it', async () => {
    const owner = await person();
    const modAuthor = await person('moderator');
    const reporter = await person();
    const otherMod = await person('moderator');
    const build = await createBuildRow(owner.user.id, { status: 'published' });
    const comment = await BuildComment.create({ buildId: build.id, authorId: modAuthor.user.id, body: 'Buy my amplifier' });
    const res = await post(reporter.agent, '/api/reports', { targetType: 'comment', targetId: comment.id, reason: 'spam' });
    expect(res.status, res.text).toBe(201);
    const queue = await otherMod.agent.get('/api/review/queue');
    const item = queue.body.reports.find((r: { id: number }) => r.id === res.body.id);
    expect(item).toMatchObject({ targetType: 'comment', targetPath: `/builds/${build.id}#comment-${comment.id}` });
    expect(item.targetLabel).toContain('Buy my amplifier');
    expectError(
      await post(modAuthor.agent, `/api/review/reports/${res.body.id}/decision`, { decision: 'dismiss', note: 'Fine' }),
      403,
      'own_work',
    );
    expect(
      (await post(otherMod.agent, `/api/review/reports/${res.body.id}/decision`, { decision: 'resolve', note: 'Hidden.' })).status,
    ).toBe(200);

    await comment.update({ hiddenAt: new Date() });
    expectError(
      await post(reporter.agent, '/api/reports', { targetType: 'comment', targetId: comment.id, reason: 'spam' }),
      404,
      'not_found',
    );
    expect(await Report.count({ where: { targetType: 'comment', targetId: comment.id } })).toBe(1);
  });
});

describe('every mail', () => {
  test('when the tests above have sent decisions, thread posts, follow news and comments, then each mail carries a one-click unsubscribe', async () => {
    await expect.poll(() => t.mail.messages.length, { timeout: 5000 }).toBeGreaterThan(5);
    const without = t.mail.messages.filter((m) => m.listUnsubscribePost !== 'List-Unsubscribe=One-Click' || !m.listUnsubscribe);
    expect(without.map((m) => m.subject)).toEqual([]);
  });
});

describe('decisions about one maker at the same time', () => {
  test('when two moderators decide six builds of one maker at once, then every decision succeeds and every mail is queued', async () => {
    // Sending a decision's mail reads the maker's signing key and writes nothing to their account row: a write there
    // would upgrade the shared lock the notification's foreign-key check holds, and concurrent decisions would deadlock.
    const maker = await person();
    const mods = [await person('moderator'), await person('moderator')];
    const builds = await Promise.all(
      Array.from({ length: 6 }, (_, i) => createBuildRow(maker.user.id, { status: 'submitted', title: `Race ${i}` })),
    );
    const answers = await Promise.all(
      builds.map((b, i) =>
        post(mods[i % 2]!.agent, `/api/review/builds/${b.id}/decision`, { decision: i % 3 ? 'publish' : 'return', note: 'Checked.' }),
      ),
    );
    expect(answers.map((r) => r.status)).toEqual(builds.map(() => 200));
    expect(await OutboxMail.count({ where: { toAddress: `${maker.user.login}@example.test` } })).toBe(6);
  });
});
