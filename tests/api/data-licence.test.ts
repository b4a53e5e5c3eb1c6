// The data licence a maker accepts once: POST /api/account/data-licence (idempotent), the session user's
// acceptance date (GET /api/account/data-licence), and run creation that does not depend on it.
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, visitor } from '../support/login.ts';
import { createBuildRow, createPart, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { DATA_LICENCE } from '../../shared/data-licence.ts';
import { RIG_RUN_BODY } from '../../shared/docs/rig-examples.ts';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

describe('POST /api/account/data-licence', () => {
  test('when a maker accepts, then the answer and a later read carry the date, and accepting again keeps the first date', async () => {
    const a = await signIn(t, (await createUser()).login);
    const before = await a.get('/api/account/data-licence').expect(200);
    expect(before.body).toEqual({ licence: DATA_LICENCE, acceptedAt: null });

    const first = await a.post('/api/account/data-licence').set('X-CSRF-Token', a.csrf).send({});
    expect(first.status).toBe(200);
    expect(first.body.licence).toEqual(DATA_LICENCE);
    expect(Date.parse(first.body.acceptedAt)).toBeGreaterThan(Date.now() - 60_000);
    const again = await a.post('/api/account/data-licence').set('X-CSRF-Token', a.csrf).send({});
    expect(again.status).toBe(200);
    expect(again.body.acceptedAt).toBe(first.body.acceptedAt);
    expect((await a.get('/api/account/data-licence')).body.acceptedAt).toBe(first.body.acceptedAt);
  });

  test('when a visitor asks, then 401; without the CSRF token, then 403 csrf_failed', async () => {
    const v = await visitor(t);
    expectError(await v.post('/api/account/data-licence').set('X-CSRF-Token', v.csrf).send({}), 401, 'unauthorized');
    expectError(await request(t.app).get('/api/account/data-licence'), 401, 'unauthorized');
    const a = await signIn(t, (await createUser()).login);
    expectError(await a.post('/api/account/data-licence').send({}), 403, 'csrf_failed');
  });

  test('when a maker who has not accepted posts a run, then it is stored all the same (the app asks; the API does not refuse)', async () => {
    const owner = await createUser();
    const a = await signIn(t, owner.login);
    const build = await createBuildRow(owner.id);
    const part = await createPart();
    const act = await a
      .post(`/api/builds/${build.id}/actuators`)
      .set('X-CSRF-Token', a.csrf)
      .send({ partId: part.id, axis: 'Z', drive: 'single', maxVolts: 60 });
    expect(act.status).toBe(201);
    const run = await a.post(`/api/actuators/${act.body.id}/runs`).set('X-CSRF-Token', a.csrf).send(RIG_RUN_BODY);
    expect(run.status).toBe(201);
  });
});
