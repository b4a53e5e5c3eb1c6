// Comments on published builds: who may write, read and hide them, what the owner is told, and the limits.
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createBuildRow, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { BuildComment } from '../../server/models/build-comment.model.ts';
import { AuditEntry } from '../../server/models/audit-entry.model.ts';

let t: TestApp;
let fan: Agent;
let mod: Agent;
beforeAll(async () => {
  t = await startTestApp();
  fan = await signIn(t, (await createUser({ login: 'comment-fan' })).login);
  mod = await signIn(t, (await createUser({ role: 'moderator' })).login);
});
afterAll(async () => {
  await t.close();
});

const post = (a: Agent, path: string, body: object) => a.post(path).set('X-CSRF-Token', a.csrf).send(body);

async function publishedBuild(title = 'Bimorph stage') {
  const owner = await createUser();
  await owner.update({ email: `${owner.login}@example.test` });
  const build = await createBuildRow(owner.id, { status: 'published', title });
  return { owner, build };
}

describe('comments on a build', () => {
  test('when a maker comments on a published build, then visitors read it and the owner gets a mail', async () => {
    const { owner, build } = await publishedBuild('Comment target');
    const res = await post(fan, `/api/builds/${build.id}/comments`, { body: 'Which **clamp** holds the bar?' });
    expect(res.status, res.text).toBe(201);
    expect(res.body).toMatchObject({ buildId: build.id, author: { login: 'comment-fan' }, body: 'Which **clamp** holds the bar?' });
    const list = await request(t.app).get(`/api/builds/${build.id}/comments`);
    expect(list.status).toBe(200);
    expect(list.body.items.map((c: { body: string }) => c.body)).toEqual(['Which **clamp** holds the bar?']);
    expect(list.body.items[0].abilities).toEqual({ hide: false, report: false });
    const mail = await t.mail.waitFor((m) => m.subject.includes('commented on Comment target'));
    expect(mail.to).toContain(`${owner.login}@example.test`);
    expect(mail.text).toContain('Which **clamp** holds the bar?');
  });

  test('when a moderator hides a comment with a note, then it is gone for everyone and the note is on the audit trail', async () => {
    const { build } = await publishedBuild();
    const created = await post(fan, `/api/builds/${build.id}/comments`, { body: 'Cheap bars at my shop' });
    expect((await post(mod, `/api/comments/${created.body.id}/hide`, { note: 'Advertising.' })).status).toBe(204);
    const list = await request(t.app).get(`/api/builds/${build.id}/comments`);
    expect(list.body.items).toEqual([]);
    const audit = await AuditEntry.findOne({ where: { action: 'comment.hide', targetId: created.body.id } });
    expect(audit?.note).toBe('Advertising.');
    expectError(await post(mod, `/api/comments/${created.body.id}/hide`, { note: 'Again' }), 404, 'not_found');
    expectError(await post(mod, `/api/comments/${created.body.id + 999999}/hide`, { note: 'x' }), 404, 'not_found');
  });

  test('when the build is a draft, then commenting is refused and reading it is 404 to others', async () => {
    const owner = await createUser();
    const draft = await createBuildRow(owner.id, { status: 'draft' });
    expectError(await post(fan, `/api/builds/${draft.id}/comments`, { body: 'Early!' }), 404, 'not_found');
    expectError(await request(t.app).get(`/api/builds/${draft.id}/comments`), 404, 'not_found');
    const submitted = await createBuildRow(owner.id, { status: 'submitted' });
    expectError(await post(mod, `/api/builds/${submitted.id}/comments`, { body: 'Mods see it' }), 409, 'build_not_published');
    expect(await BuildComment.count({ where: { buildId: [draft.id, submitted.id] } })).toBe(0);
  });

  test('when the body is empty, too long or a field is unknown, then 400 naming the field, and nothing is stored', async () => {
    const { build } = await publishedBuild();
    expectError(await post(fan, `/api/builds/${build.id}/comments`, { body: '   ' }), 400, 'validation_failed', 'body');
    expectError(await post(fan, `/api/builds/${build.id}/comments`, { body: 'x'.repeat(4001) }), 400, 'validation_failed', 'body');
    expectError(await post(fan, `/api/builds/${build.id}/comments`, { body: 'ok', pinned: true }), 400, 'validation_failed');
    expectError(await post(fan, `/api/builds/${build.id}/comments`, { body: 'nul \u0000 here' }), 400, 'validation_failed', 'body');
    expectError(await post(fan, `/api/builds/${build.id}/comments`, { body: 'lone \uD800 half' }), 400, 'validation_failed', 'body');
    expect(await BuildComment.count({ where: { buildId: build.id } })).toBe(0);
  });

  test('when a moderator would hide a comment on their own build, then 403 own_work (four eyes)', async () => {
    const m = await createUser({ role: 'moderator' });
    const modAgent = await signIn(t, m.login);
    const build = await createBuildRow(m.id, { status: 'published' });
    const c = await BuildComment.create({ buildId: build.id, authorId: (await createUser()).id, body: 'Nice' });
    const res = await post(modAgent, `/api/comments/${c.id}/hide`, { note: 'Not keen' });
    expect(res.status).toBe(403);
    expect((await BuildComment.findByPk(c.id))?.hiddenAt).toBeNull();
  });
});

describe('comment rate limit', () => {
  test('when a maker posts an 11th comment within 10 minutes, then 429', async () => {
    const limited = await startTestApp({ rateLimits: true });
    try {
      const writer = await signIn(limited, (await createUser()).login);
      const { build } = await publishedBuild();
      for (let i = 0; i < 10; i++)
        expect(
          (
            await writer
              .post(`/api/builds/${build.id}/comments`)
              .set('X-CSRF-Token', writer.csrf)
              .send({ body: `n${i}` })
          ).status,
        ).toBe(201);
      const res = await writer.post(`/api/builds/${build.id}/comments`).set('X-CSRF-Token', writer.csrf).send({ body: 'one too many' });
      expectError(res, 429, 'rate_limited');
    } finally {
      await limited.close();
      t.rebind();
    }
  });
});
