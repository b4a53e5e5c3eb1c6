import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn } from '../support/login.ts';
import { createBuildRow, createPart, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { fitCalibrationInUnits, toFitResultDto } from '../../shared/workbench/calibration-fit.ts';
import { bimorphSeriesGain } from '../../shared/workbench/expected-gain.ts';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

const points = [
  { volts: 0, displacement: 0.01, sweep: 'up' },
  { volts: 10, displacement: 0.98, sweep: 'up' },
  { volts: 20, displacement: 2.03, sweep: 'up' },
  { volts: 20, displacement: 2.05, sweep: 'down' },
  { volts: 10, displacement: 1.09, sweep: 'down' },
  { volts: 0, displacement: 0.02, sweep: 'down' },
];
const runBody = {
  points,
  voltageUnit: 'V',
  displacementUnit: 'um',
  method: 'indicator',
  drive: { kind: 'dc-steps' },
  conditions: { preload: 'none', temperatureC: 21 },
};

async function ownerWithActuator(status = 'draft') {
  const owner = await createUser();
  const build = await createBuildRow(owner.id, { status });
  const part = await createPart();
  const a = await signIn(t, owner.login);
  const res = await a
    .post(`/api/builds/${build.id}/actuators`)
    .set('X-CSRF-Token', a.csrf)
    .send({ partId: part.id, axis: 'X', drive: 'single', maxVolts: 40 });
  expect(res.status).toBe(201);
  return { owner, build, part, a, actuator: res.body };
}

describe('POST /api/builds/:id/actuators', () => {
  test('when the owner adds an actuator, then 201 with its part and the expected gain from geometry', async () => {
    const { actuator, part } = await ownerWithActuator();
    expect(actuator).toMatchObject({
      id: expect.any(Number),
      axis: 'X',
      drive: 'single',
      part: { id: part.id, category: 'bimorph' },
      runs: [],
    });
    // 12 × 0.6 mm PZT-5A series bimorph → 102.6 nm/V [calc, FIELD.md; S: Smits, Dalke & Cooney 1991]
    expect(actuator.expectedGain.gainNmPerV).toBeCloseTo(bimorphSeriesGain('PZT-5A', { lengthMm: 12, thicknessMm: 0.6 }).gainNmPerV, 10);
    expect(actuator.expectedGain.gainNmPerV).toBeCloseTo(102.6, 1);
  });

  test.each([
    ['an unknown axis', { axis: 'W', drive: 'single' }, 'axis'],
    ['an unknown drive', { axis: 'X', drive: 'sideways' }, 'drive'],
    ['a negative voltage limit', { axis: 'X', drive: 'single', maxVolts: -5 }, 'maxVolts'],
  ])('when the body has %s, then 400 on %s', async (_n, body, field) => {
    const owner = await createUser();
    const build = await createBuildRow(owner.id);
    const part = await createPart();
    const a = await signIn(t, owner.login);
    const res = await a
      .post(`/api/builds/${build.id}/actuators`)
      .set('X-CSRF-Token', a.csrf)
      .send({ partId: part.id, ...body });
    expectError(res, 400, 'validation_failed', field);
  });

  test("when the part does not exist, is rejected, or is someone else's proposal, then 400 on partId", async () => {
    const owner = await createUser();
    const build = await createBuildRow(owner.id);
    const a = await signIn(t, owner.login);
    const rejected = await createPart({ status: 'rejected' });
    const othersProposal = await createPart({ status: 'proposed', proposedById: (await createUser()).id });
    for (const partId of [99999999, rejected.id, othersProposal.id]) {
      const res = await a
        .post(`/api/builds/${build.id}/actuators`)
        .set('X-CSRF-Token', a.csrf)
        .send({ partId, axis: 'Z', drive: 'single' });
      expectError(res, 400, 'validation_failed', 'partId');
      expect(res.body.error.details[0].path).toBe('partId');
    }
    const own = await createPart({ status: 'proposed', proposedById: owner.id });
    expect(
      (await a.post(`/api/builds/${build.id}/actuators`).set('X-CSRF-Token', a.csrf).send({ partId: own.id, axis: 'Z', drive: 'single' }))
        .status,
    ).toBe(201);
  });

  test('when another maker adds an actuator to a published build, then 403', async () => {
    const owner = await createUser();
    const build = await createBuildRow(owner.id, { status: 'published' });
    const part = await createPart();
    const other = await signIn(t, (await createUser()).login);
    const res = await other
      .post(`/api/builds/${build.id}/actuators`)
      .set('X-CSRF-Token', other.csrf)
      .send({ partId: part.id, axis: 'X', drive: 'single' });
    expectError(res, 403, 'forbidden');
  });
});

describe('POST /api/actuators/:id/runs', () => {
  test('when the owner records a run, then 201 pending with the fit the shared code computes from the points', async () => {
    const { a, actuator } = await ownerWithActuator();
    const res = await a.post(`/api/actuators/${actuator.id}/runs`).set('X-CSRF-Token', a.csrf).send(runBody);
    expect(res.status).toBe(201);
    const base = toFitResultDto(
      fitCalibrationInUnits({ points: points as never, voltageUnit: 'V', displacementUnit: 'um', model: 'intercept' }),
    );
    // A point run's standard uncertainty is the slope's standard error (k = 1).
    const expected = { ...base, gainStdUncertaintyNmPerV: base.gainStdErrNmPerV };
    expect(res.body).toMatchObject({
      id: expect.any(Number),
      status: 'pending',
      method: 'indicator',
      displacementUnit: 'um',
      drive: { kind: 'dc-steps' },
      conditions: { temperatureC: 21 },
    });
    expect(res.body.fit).toEqual(expected);
    expect(res.body.fit.hysteresisPctFs).toBeGreaterThan(0);
    const again = await a.get(`/api/runs/${res.body.id}`);
    expect(again.body.fit).toEqual(expected);
    expect(again.body.points).toEqual(points);
  });

  test('when the client sends its own fit numbers, then they are refused (400), never stored', async () => {
    const { a, actuator } = await ownerWithActuator();
    const res = await a
      .post(`/api/actuators/${actuator.id}/runs`)
      .set('X-CSRF-Token', a.csrf)
      .send({ ...runBody, fit: { gainNmPerV: 1e6 } });
    // `fit` is not a key the body may have: an issue of the whole body (path '').
    expectError(res, 400, 'validation_failed', '');
    expect(res.body.error.details).toContainEqual(expect.objectContaining({ code: 'unrecognized_keys' }));
  });

  test.each([
    ['fewer than 3 points', { points: points.slice(0, 2) }, 'validation_failed'],
    ['equal voltages', { points: [1, 2, 3].map((d) => ({ volts: 5, displacement: d })) }, 'voltages_all_equal'],
    ['an unknown unit', { displacementUnit: 'cubit' }, 'validation_failed'],
    ['an unknown method', { method: 'guesswork' }, 'validation_failed'],
    ['a sine drive without frequency', { drive: { kind: 'sine', amplitudeV: 5 } }, 'validation_failed'],
  ])('when the run has %s, then 400 %s', async (_n, patch, code) => {
    const { a, actuator } = await ownerWithActuator();
    const res = await a
      .post(`/api/actuators/${actuator.id}/runs`)
      .set('X-CSRF-Token', a.csrf)
      .send({ ...runBody, ...patch });
    expectError(res, 400, code);
  });

  // A visitor's 401 is in the authorization matrix.
  test('when another maker records a run on a published build, then 403', async () => {
    const { actuator, build } = await ownerWithActuator('draft');
    await build.update({ status: 'published' });
    const other = await signIn(t, (await createUser()).login);
    expectError(await other.post(`/api/actuators/${actuator.id}/runs`).set('X-CSRF-Token', other.csrf).send(runBody), 403, 'forbidden');
  });

  test('when a run belongs to a draft, then visitors get 404 and the build page lists it for the owner', async () => {
    const { a, actuator, build } = await ownerWithActuator();
    const run = await a.post(`/api/actuators/${actuator.id}/runs`).set('X-CSRF-Token', a.csrf).send(runBody);
    expectError(await request(t.app).get(`/api/runs/${run.body.id}`), 404, 'not_found');
    const page = await a.get(`/api/builds/${build.id}`);
    expect(page.body.actuators[0].runs[0].id).toBe(run.body.id);
    expect(page.body.gains[0]).toMatchObject({ actuatorId: actuator.id, runStatus: 'pending' });
  });

  test('when the owner deletes a pending run, then 204; an unknown run, then 404', async () => {
    const { a, actuator } = await ownerWithActuator();
    const run = await a.post(`/api/actuators/${actuator.id}/runs`).set('X-CSRF-Token', a.csrf).send(runBody);
    expect((await a.delete(`/api/runs/${run.body.id}`).set('X-CSRF-Token', a.csrf)).status).toBe(204);
    expectError(await a.get(`/api/runs/${run.body.id}`), 404, 'not_found');
  });
});
