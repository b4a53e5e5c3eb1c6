import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn } from '../support/login.ts';
import { createBuildRow, createUser, uniqueLogin } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

const newBuild = { title: 'Bender stage', instrumentKind: 'positioning-stage', summary: 'Two benders at 90°.' };

describe('POST /api/builds', () => {
  test.each([
    ['a missing title', { instrumentKind: 'other', summary: 's' }, 'title'],
    ['an unknown instrument kind', { ...newBuild, instrumentKind: 'telescope' }, 'instrumentKind'],
    ['an unknown stage', { ...newBuild, stage: 'dreaming' }, 'stage'],
    ['an extra field', { ...newBuild, status: 'published' }, ''],
    ['an empty summary', { ...newBuild, summary: '   ' }, 'summary'],
  ])('when the body has %s, then 400 naming the field', async (_n, body, field) => {
    const u = await createUser();
    const a = await signIn(t, u.login);
    const res = await a.post('/api/builds').set('X-CSRF-Token', a.csrf).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    if (field) expect(res.body.error.details.map((d: { path: string }) => d.path)).toContain(field);
  });

  test('when a maker posts a valid build, then 201 draft owned by them, listed in mine, invisible to others', async () => {
    const u = await createUser();
    const a = await signIn(t, u.login);
    const res = await a
      .post('/api/builds')
      .set('X-CSRF-Token', a.csrf)
      .send({ ...newBuild, body: '# Hello', stage: 'assembling' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      id: expect.any(Number),
      status: 'draft',
      stage: 'assembling',
      body: '# Hello',
      owner: { id: u.id, login: u.login },
      abilities: { edit: true, submit: true, delete: true },
    });
    const mine = await a.get('/api/builds/mine');
    expect(mine.body.items.map((b: { id: number }) => b.id)).toContain(res.body.id);
    expectError(await request(t.app).get(`/api/builds/${res.body.id}`), 404, 'not_found');
    const other = await signIn(t, (await createUser()).login);
    expectError(await other.get(`/api/builds/${res.body.id}`), 404, 'not_found');
    const mod = await signIn(t, (await createUser({ role: 'moderator' })).login);
    expect((await mod.get(`/api/builds/${res.body.id}`)).status).toBe(200);
  });
});

describe('GET /api/builds', () => {
  test('when listing, then only published builds appear, newest first, filterable by kind and text', async () => {
    const u = await createUser();
    const tag = uniqueLogin('zircon');
    const pub = await createBuildRow(u.id, { status: 'published', title: `Published ${tag}`, instrumentKind: 'manipulator' });
    await createBuildRow(u.id, { status: 'draft', title: `Draft ${tag}` });
    const res = await request(t.app).get(`/api/builds?q=${tag}`);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ total: 1, page: 1, items: [{ id: pub.id, status: 'published', owner: { login: u.login } }] });
    expect((await request(t.app).get(`/api/builds?q=${tag}&kind=profilometer`)).body.total).toBe(0);
    expect((await request(t.app).get(`/api/builds?q=${tag}&kind=manipulator`)).body.total).toBe(1);
  });

  test('when a query is bad, then 400', async () => {
    expectError(await request(t.app).get('/api/builds?kind=telescope'), 400, 'validation_failed', 'kind');
    expectError(await request(t.app).get('/api/builds?page=0'), 400, 'validation_failed', 'page');
    expectError(await request(t.app).get('/api/builds?pageSize=1000'), 400, 'validation_failed', 'pageSize');
  });

  test('when a visitor asks for mine, then 401', async () => {
    expectError(await request(t.app).get('/api/builds/mine'), 401, 'unauthorized');
  });
});

describe('PATCH and DELETE /api/builds/:id', () => {
  test('when another maker edits a published build, then 403; a draft, then 404; nothing changes', async () => {
    const owner = await createUser();
    const pub = await createBuildRow(owner.id, { status: 'published' });
    const draft = await createBuildRow(owner.id);
    const other = await signIn(t, (await createUser()).login);
    expectError(await other.patch(`/api/builds/${pub.id}`).set('X-CSRF-Token', other.csrf).send({ title: 'Mine now' }), 403, 'forbidden');
    expectError(await other.patch(`/api/builds/${draft.id}`).set('X-CSRF-Token', other.csrf).send({ title: 'Mine now' }), 404, 'not_found');
    await pub.reload();
    expect(pub.title).not.toBe('Mine now');
  });

  test('when the owner edits a published build, then it stays published and is marked edited since review', async () => {
    const owner = await createUser();
    const pub = await createBuildRow(owner.id, { status: 'published' });
    const a = await signIn(t, owner.login);
    const res = await a.patch(`/api/builds/${pub.id}`).set('X-CSRF-Token', a.csrf).send({ stage: 'working', body: 'New text' });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'published', stage: 'working', editedSinceReview: true, body: 'New text' });
    expect((await request(t.app).get(`/api/builds/${pub.id}`)).body.body).toBe('New text');
  });

  test('when the patch is empty or the cover is not a photo of the build, then 400', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id);
    const a = await signIn(t, owner.login);
    expectError(await a.patch(`/api/builds/${b.id}`).set('X-CSRF-Token', a.csrf).send({}), 400, 'validation_failed');
    expectError(
      await a.patch(`/api/builds/${b.id}`).set('X-CSRF-Token', a.csrf).send({ coverPhotoId: 999999 }),
      400,
      'validation_failed',
      'coverPhotoId',
    );
  });

  test('when a submitted build is edited, then 409 build_locked', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id, { status: 'submitted' });
    const a = await signIn(t, owner.login);
    const res = await a.patch(`/api/builds/${b.id}`).set('X-CSRF-Token', a.csrf).send({ title: 'Changed' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('build_locked');
  });

  test('when the owner deletes a draft, then 204 and it is gone; a published one, then 409', async () => {
    const owner = await createUser();
    const draft = await createBuildRow(owner.id);
    const pub = await createBuildRow(owner.id, { status: 'published' });
    const a = await signIn(t, owner.login);
    expect((await a.delete(`/api/builds/${draft.id}`).set('X-CSRF-Token', a.csrf)).status).toBe(204);
    expectError(await a.get(`/api/builds/${draft.id}`), 404, 'not_found');
    const res = await a.delete(`/api/builds/${pub.id}`).set('X-CSRF-Token', a.csrf);
    expectError(res, 409, 'invalid_state');
    expect((await a.get(`/api/builds/${pub.id}`)).status).toBe(200);
  });
});

describe('POST /api/builds/:id/submit', () => {
  test('when a draft is submitted, then submitted; submitting again, then 409', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id);
    const a = await signIn(t, owner.login);
    const res = await a.post(`/api/builds/${b.id}/submit`).set('X-CSRF-Token', a.csrf);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'submitted', abilities: { edit: false, submit: false, delete: false } });
    const again = await a.post(`/api/builds/${b.id}/submit`).set('X-CSRF-Token', a.csrf);
    expect(again.status).toBe(409);
    expect(again.body.error.code).toBe('invalid_state');
  });

  test.each(['published', 'declined'])('when a %s build is submitted, then 409', async (status) => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id, { status });
    const a = await signIn(t, owner.login);
    expectError(await a.post(`/api/builds/${b.id}/submit`).set('X-CSRF-Token', a.csrf), 409, 'invalid_state');
  });

  test('when a returned build is submitted, then submitted; by another maker, then 404', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id, { status: 'returned' });
    const other = await signIn(t, (await createUser()).login);
    expectError(await other.post(`/api/builds/${b.id}/submit`).set('X-CSRF-Token', other.csrf), 404, 'not_found');
    const a = await signIn(t, owner.login);
    expect((await a.post(`/api/builds/${b.id}/submit`).set('X-CSRF-Token', a.csrf)).body.status).toBe('submitted');
  });
});

describe('log entries', () => {
  test('when the owner adds, edits and deletes an entry, then the build page shows entries in date order', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id, { status: 'published' });
    const a = await signIn(t, owner.login);
    const later = await a
      .post(`/api/builds/${b.id}/entries`)
      .set('X-CSRF-Token', a.csrf)
      .send({ entryDate: '2026-11-20', title: 'Later', body: 'Second' });
    expect(later.status).toBe(201);
    const earlier = await a
      .post(`/api/builds/${b.id}/entries`)
      .set('X-CSRF-Token', a.csrf)
      .send({ entryDate: '2026-11-02', title: 'Earlier', body: 'First' });
    const page = await request(t.app).get(`/api/builds/${b.id}`);
    expect(page.body.entries.map((e: { title: string }) => e.title)).toEqual(['Earlier', 'Later']);
    const edited = await a
      .patch(`/api/builds/${b.id}/entries/${earlier.body.id}`)
      .set('X-CSRF-Token', a.csrf)
      .send({ body: 'First, edited' });
    expect(edited.body.body).toBe('First, edited');
    expect((await a.delete(`/api/builds/${b.id}/entries/${later.body.id}`).set('X-CSRF-Token', a.csrf)).status).toBe(204);
    expect((await request(t.app).get(`/api/builds/${b.id}`)).body.entries).toHaveLength(1);
  });

  test('when an entry has a bad date, or another maker writes, or the entry is in another build, then 400 / 403 / 404', async () => {
    const owner = await createUser();
    const b = await createBuildRow(owner.id, { status: 'published' });
    const b2 = await createBuildRow(owner.id, { status: 'published' });
    const a = await signIn(t, owner.login);
    expectError(
      await a.post(`/api/builds/${b.id}/entries`).set('X-CSRF-Token', a.csrf).send({ entryDate: '2026-13-40', title: 'Bad', body: 'x' }),
      400,
      'validation_failed',
      'entryDate',
    );
    const e = await a
      .post(`/api/builds/${b.id}/entries`)
      .set('X-CSRF-Token', a.csrf)
      .send({ entryDate: '2026-11-02', title: 'Fine', body: 'x' });
    expectError(
      await a.patch(`/api/builds/${b2.id}/entries/${e.body.id}`).set('X-CSRF-Token', a.csrf).send({ title: 'Moved?' }),
      404,
      'not_found',
    );
    const other = await signIn(t, (await createUser()).login);
    expectError(
      await other
        .post(`/api/builds/${b.id}/entries`)
        .set('X-CSRF-Token', other.csrf)
        .send({ entryDate: '2026-11-02', title: 'Hijack', body: 'x' }),
      403,
      'forbidden',
    );
  });
});
