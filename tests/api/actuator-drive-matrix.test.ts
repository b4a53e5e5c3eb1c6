// Saving a two-axis mixer result onto an XY-pair actuator: PUT / DELETE /api/actuators/:id/drive-matrix.
// The CSRF-less 403 and each actor's answer are in the authorization matrix too.
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, visitor } from '../support/login.ts';
import { createBuildRow, createPart, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

// Equal gains of 100 nm/V at ±45°: g/√2 = 70.7107 nm/V in each cell [practice, FIELD.md; calc].
const body = {
  gainNmPerV: [
    [70.7107, -70.7107],
    [70.7107, 70.7107],
  ],
  offsetNm: [12, -8],
  limits: { vaMinV: -150, vaMaxV: 150, vbMinV: -150, vbMaxV: 150 },
  model: 'affine',
  measuredOn: '2026-11-30',
};

async function ownerWithActuator(axis: 'XY' | 'X' = 'XY', status = 'draft') {
  const owner = await createUser();
  const build = await createBuildRow(owner.id, { status });
  const part = await createPart();
  const a = await signIn(t, owner.login);
  const res = await a
    .post(`/api/builds/${build.id}/actuators`)
    .set('X-CSRF-Token', a.csrf)
    .send({ partId: part.id, axis, drive: 'single' });
  expect(res.status).toBe(201);
  return { owner, build, a, actuator: res.body as { id: number; driveMatrix: unknown } };
}

describe('PUT /api/actuators/:actuatorId/drive-matrix', () => {
  test('when the owner saves a matrix onto an XY pair, then 201 with it on the actuator, 200 on a replacement, and the build page shows it', async () => {
    const { a, actuator, build } = await ownerWithActuator();
    expect(actuator.driveMatrix).toBeNull();
    const first = await a.put(`/api/actuators/${actuator.id}/drive-matrix`).set('X-CSRF-Token', a.csrf).send(body);
    expect(first.status, first.text).toBe(201);
    expect(first.body).toMatchObject({
      id: actuator.id,
      driveMatrix: { ...body, savedAt: expect.stringMatching(/^\d{4}-\d\d-\d\dT/) },
    });
    const again = await a
      .put(`/api/actuators/${actuator.id}/drive-matrix`)
      .set('X-CSRF-Token', a.csrf)
      .send({ ...body, offsetNm: undefined, model: 'origin', measuredOn: undefined });
    expect(again.status, again.text).toBe(200);
    expect(again.body.driveMatrix).toMatchObject({ model: 'origin', offsetNm: [0, 0], measuredOn: null });
    const page = await a.get(`/api/builds/${build.id}`);
    expect(page.body.actuators.find((x: { id: number }) => x.id === actuator.id).driveMatrix).toMatchObject({
      gainNmPerV: body.gainNmPerV,
      model: 'origin',
      limits: body.limits,
    });
  });

  test('when the build is published, then a visitor sees the saved matrix on GET /api/builds/:id', async () => {
    const { a, actuator, build } = await ownerWithActuator('XY', 'published');
    expect((await a.put(`/api/actuators/${actuator.id}/drive-matrix`).set('X-CSRF-Token', a.csrf).send(body)).status).toBe(201);
    const page = await request(t.app).get(`/api/builds/${build.id}`);
    expect(page.status).toBe(200);
    expect(page.body.actuators[0].driveMatrix).toMatchObject({ gainNmPerV: body.gainNmPerV, offsetNm: [12, -8], measuredOn: '2026-11-30' });
  });

  test.each([
    [
      'a gain cell that is not a number',
      {
        gainNmPerV: [
          [70, 'x'],
          [70, 70],
        ],
      },
      'gainNmPerV.0.1',
    ],
    [
      'a singular gain matrix (both benders along one line)',
      {
        gainNmPerV: [
          [70, 70],
          [70, 70],
        ],
      },
      'gainNmPerV',
    ],
    ['a minimum above its maximum', { limits: { vaMinV: 10, vaMaxV: -10, vbMinV: -1, vbMaxV: 1 } }, 'limits'],
    ['a missing limit', { limits: { vaMinV: -1, vaMaxV: 1, vbMinV: -1 } }, 'limits.vbMaxV'],
    ['an unknown model', { model: 'cubic' }, 'model'],
    ['offsets on a fit through the origin', { model: 'origin' }, 'offsetNm'],
    ['a date that is no date', { measuredOn: '30/11/2026' }, 'measuredOn'],
    ['an unknown field', { colour: 'teal' }, ''],
  ])('when the body has %s, then 400 naming the field', async (_what, change, path) => {
    const { a, actuator } = await ownerWithActuator();
    const res = await a
      .put(`/api/actuators/${actuator.id}/drive-matrix`)
      .set('X-CSRF-Token', a.csrf)
      .send({ ...body, ...change });
    expectError(res, 400, 'validation_failed', path);
  });

  test('when the actuator drives one axis, then 409 not_xy_pair and nothing is saved', async () => {
    const { a, actuator, build } = await ownerWithActuator('X');
    expectError(await a.put(`/api/actuators/${actuator.id}/drive-matrix`).set('X-CSRF-Token', a.csrf).send(body), 409, 'not_xy_pair');
    expect((await a.get(`/api/builds/${build.id}`)).body.actuators[0].driveMatrix).toBeNull();
  });

  test('when a visitor saves, then 401', async () => {
    const { actuator } = await ownerWithActuator();
    const v = await visitor(t);
    expectError(await v.put(`/api/actuators/${actuator.id}/drive-matrix`).set('X-CSRF-Token', v.csrf).send(body), 401, 'unauthorized');
  });

  test('when another maker saves onto a published build, then 403; onto a draft, then 404', async () => {
    const pub = await ownerWithActuator('XY', 'published');
    const draft = await ownerWithActuator('XY');
    const other = await createUser();
    const o = await signIn(t, other.login);
    expectError(await o.put(`/api/actuators/${pub.actuator.id}/drive-matrix`).set('X-CSRF-Token', o.csrf).send(body), 403, 'forbidden');
    expectError(await o.put(`/api/actuators/${draft.actuator.id}/drive-matrix`).set('X-CSRF-Token', o.csrf).send(body), 404, 'not_found');
  });

  test('when the actuator does not exist, then 404', async () => {
    const owner = await createUser();
    const a = await signIn(t, owner.login);
    expectError(await a.put('/api/actuators/999999999/drive-matrix').set('X-CSRF-Token', a.csrf).send(body), 404, 'not_found');
  });

  test('when the build waits for review, then 409 build_locked', async () => {
    const { a, actuator, build } = await ownerWithActuator();
    const { Build } = await import('../../server/models/build.model.ts');
    await Build.update({ status: 'submitted' }, { where: { id: build.id } });
    expectError(await a.put(`/api/actuators/${actuator.id}/drive-matrix`).set('X-CSRF-Token', a.csrf).send(body), 409, 'build_locked');
  });
});

describe('DELETE /api/actuators/:actuatorId/drive-matrix', () => {
  test('when the owner clears a saved matrix, then 204 and the build page shows none; clearing again is 204', async () => {
    const { a, actuator, build } = await ownerWithActuator();
    await a.put(`/api/actuators/${actuator.id}/drive-matrix`).set('X-CSRF-Token', a.csrf).send(body);
    expect((await a.delete(`/api/actuators/${actuator.id}/drive-matrix`).set('X-CSRF-Token', a.csrf)).status).toBe(204);
    expect((await a.get(`/api/builds/${build.id}`)).body.actuators[0].driveMatrix).toBeNull();
    expect((await a.delete(`/api/actuators/${actuator.id}/drive-matrix`).set('X-CSRF-Token', a.csrf)).status).toBe(204);
  });

  test('when another maker clears it, then 403 on a published build', async () => {
    const { a, actuator } = await ownerWithActuator('XY', 'published');
    await a.put(`/api/actuators/${actuator.id}/drive-matrix`).set('X-CSRF-Token', a.csrf).send(body);
    const o = await signIn(t, (await createUser()).login);
    expectError(await o.delete(`/api/actuators/${actuator.id}/drive-matrix`).set('X-CSRF-Token', o.csrf), 403, 'forbidden');
  });
});
