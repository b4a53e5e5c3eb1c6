import { createHash, randomBytes } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { expectError } from '../support/expect-error.ts';
import { actuatorOf, makerWithActuator, makeToken, rigRun } from '../support/rig.ts';
import { visitor, type Agent } from '../support/login.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { Build } from '../../server/models/build.model.ts';
import { IdempotencyKey } from '../../server/models/idempotency-key.model.ts';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t?.close();
});

const newKey = () => `rig-${randomBytes(8).toString('hex')}`;
const postRun = (agent: Agent, actuatorId: number, key: string | null, body: object = rigRun()) => {
  const req = agent.post(`/api/actuators/${actuatorId}/runs`).set('X-CSRF-Token', agent.csrf);
  return (key === null ? req : req.set('Idempotency-Key', key)).send(body);
};
const runsOn = (actuatorId: number) => CalibrationRun.count({ where: { actuatorId } });

describe('Idempotency-Key on POST /api/actuators/:actuatorId/runs', () => {
  test('when the write commits but its answer is lost (a crash between the two), then a retry is told it was stored, never runs it again', async () => {
    const { agent, actuator } = await makerWithActuator(t);
    const key = newKey();
    const first = await postRun(agent, actuator.id, key);
    expect(first.status).toBe(201);
    // The mark was written in the run's own transaction.
    const claim = await IdempotencyKey.findOne({ where: { idemKey: key } });
    expect(claim?.appliedResource).toBe(`calibration_runs:${first.body.id}`);
    // What a kill -9 after the commit leaves behind: the write and its mark, no stored answer, some time ago.
    await IdempotencyKey.update({ responseStatus: null, responseBody: null }, { where: { id: claim!.id } });
    await IdempotencyKey.sequelize!.query('UPDATE idempotency_keys SET created_at = NOW() - INTERVAL 1 HOUR WHERE id = ?', {
      replacements: [claim!.id],
    });
    const retry = await postRun(agent, actuator.id, key);
    expectError(retry, 409, 'idempotency_already_applied');
    expect(retry.body.error.details).toEqual({ resource: `calibration_runs:${first.body.id}` });
    expect(await runsOn(actuator.id)).toBe(1);
  });

  test('when a request under a key fails validation, then nothing is marked and the key may be used again', async () => {
    const { agent, actuator } = await makerWithActuator(t);
    const key = newKey();
    expect((await postRun(agent, actuator.id, key, { ...rigRun(), method: 'guess' })).status).toBe(400);
    expect(await IdempotencyKey.count({ where: { idemKey: key } })).toBe(0);
    expect((await postRun(agent, actuator.id, key)).status).toBe(201);
  });

  test('when the same request is sent twice with one key, then the first answer is replayed and one run exists', async () => {
    const { agent, actuator } = await makerWithActuator(t);
    const key = newKey();
    const first = await postRun(agent, actuator.id, key);
    expect(first.status, first.text).toBe(201);
    expect(first.headers['idempotent-replayed']).toBeUndefined();
    const again = await postRun(agent, actuator.id, key);
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.headers['content-type']).toMatch(/^application\/json/);
    expect(again.body).toEqual(first.body);
    expect(await runsOn(actuator.id)).toBe(1);
  });

  test('when the retry sends the same body with its keys in another order, then it is the same request', async () => {
    const { agent, actuator } = await makerWithActuator(t);
    const key = newKey();
    const { method, voltageUnit, displacementUnit, points } = rigRun();
    const first = await postRun(agent, actuator.id, key, { method, voltageUnit, displacementUnit, points });
    const again = await postRun(agent, actuator.id, key, {
      points: points.map(({ volts, displacement }) => ({ displacement, volts })),
      displacementUnit,
      voltageUnit,
      method,
    });
    expect([first.status, again.status, again.body.id]).toEqual([201, 201, first.body.id]);
    expect(await runsOn(actuator.id)).toBe(1);
  });

  test('when the key comes back with another body or on another path, then 409 idempotency_key_reused and nothing is added', async () => {
    const { agent, actuator, user } = await makerWithActuator(t);
    const { actuator: second } = await actuatorOf(user.id);
    const key = newKey();
    await postRun(agent, actuator.id, key).expect(201);
    expectError(await postRun(agent, actuator.id, key, rigRun(5)), 409, 'idempotency_key_reused');
    expectError(await postRun(agent, second.id, key), 409, 'idempotency_key_reused');
    expectError(
      await agent.post('/api/builds').set('X-CSRF-Token', agent.csrf).set('Idempotency-Key', key).send({ title: 'Other' }),
      409,
      'idempotency_key_reused',
    );
    expect([await runsOn(actuator.id), await runsOn(second.id)]).toEqual([1, 0]);
  });

  test('when two makers use the same key, then each gets their own run', async () => {
    const a = await makerWithActuator(t);
    const b = await makerWithActuator(t);
    const key = newKey();
    const ra = await postRun(a.agent, a.actuator.id, key).expect(201);
    const rb = await postRun(b.agent, b.actuator.id, key).expect(201);
    expect(rb.headers['idempotent-replayed']).toBeUndefined();
    expect(rb.body.id).not.toBe(ra.body.id);
    expect([await runsOn(a.actuator.id), await runsOn(b.actuator.id)]).toEqual([1, 1]);
  });

  test('when keys differ only in letter case, then they are different keys', async () => {
    const { agent, actuator } = await makerWithActuator(t);
    const key = newKey();
    await postRun(agent, actuator.id, `${key}-a`).expect(201);
    const other = await postRun(agent, actuator.id, `${key}-A`).expect(201);
    expect(other.headers['idempotent-replayed']).toBeUndefined();
    expect(await runsOn(actuator.id)).toBe(2);
  });

  test.each([
    ['empty', ''],
    ['with a space', 'my key'],
    ['256 characters long', 'k'.repeat(256)],
    ['not ASCII', 'cl\u00e9'],
  ])('when the key is %s, then 400 invalid_idempotency_key and no run', async (_n, key) => {
    const { agent, actuator } = await makerWithActuator(t);
    expectError(await postRun(agent, actuator.id, key), 400, 'invalid_idempotency_key');
    expect(await runsOn(actuator.id)).toBe(0);
  });

  test('when the key is 255 visible characters, then it is accepted', async () => {
    const { agent, actuator } = await makerWithActuator(t);
    const key = `${newKey()}~!#`.padEnd(255, 'z');
    await postRun(agent, actuator.id, key).expect(201);
    expect((await postRun(agent, actuator.id, key).expect(201)).headers['idempotent-replayed']).toBe('true');
  });

  test('when the first attempt was refused (400), then the same key may be used again with a corrected body', async () => {
    const { agent, actuator } = await makerWithActuator(t);
    const key = newKey();
    expectError(await postRun(agent, actuator.id, key, { ...rigRun(), points: [] }), 400, 'validation_failed');
    const ok = await postRun(agent, actuator.id, key).expect(201);
    expect(ok.headers['idempotent-replayed']).toBeUndefined();
    expect(await runsOn(actuator.id)).toBe(1);
  });

  test('when the first request with the key is still running, then 409 idempotency_in_progress', async () => {
    const { agent, actuator, user } = await makerWithActuator(t);
    const key = newKey();
    await IdempotencyKey.create({
      userId: user.id,
      idemKey: key,
      method: 'POST',
      path: `/api/actuators/${actuator.id}/runs`,
      bodyHash: 'f'.repeat(64),
      expiresAt: new Date(Date.now() + 3600_000),
    });
    expectError(await postRun(agent, actuator.id, key), 409, 'idempotency_key_reused');
    const canonical = JSON.stringify({
      displacementUnit: 'nm',
      method: 'capacitive',
      points: rigRun().points.map((p) => ({ displacement: p.displacement, volts: p.volts })),
      voltageUnit: 'V',
    });
    await IdempotencyKey.update(
      { bodyHash: createHash('sha256').update(canonical).digest('hex') },
      { where: { userId: user.id, idemKey: key } },
    );
    expectError(await postRun(agent, actuator.id, key), 409, 'idempotency_in_progress');
    expect(await runsOn(actuator.id)).toBe(0);
  });

  test('when the stored answer is older than 24 h, then the key starts afresh', async () => {
    const { agent, actuator } = await makerWithActuator(t);
    const key = newKey();
    const first = await postRun(agent, actuator.id, key).expect(201);
    await IdempotencyKey.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { idemKey: key } });
    const later = await postRun(agent, actuator.id, key).expect(201);
    expect(later.headers['idempotent-replayed']).toBeUndefined();
    expect(later.body.id).not.toBe(first.body.id);
    expect(await IdempotencyKey.count({ where: { idemKey: key } })).toBe(1);
  });

  test('when a rig posts with a bearer token and a key twice, then one run and the first answer again', async () => {
    const { agent, actuator } = await makerWithActuator(t);
    const { secret } = await makeToken(agent, ['runs:write']);
    const key = newKey();
    const send = () =>
      request(t.app)
        .post(`/api/actuators/${actuator.id}/runs`)
        .set('Authorization', `Bearer ${secret}`)
        .set('Idempotency-Key', key)
        .send(rigRun());
    const first = await send().expect(201);
    const again = await send().expect(201);
    expect([again.body.id, again.headers['idempotent-replayed']]).toEqual([first.body.id, 'true']);
    expect(await runsOn(actuator.id)).toBe(1);
  });

  test('when no key is sent, then each post makes a run', async () => {
    const { agent, actuator } = await makerWithActuator(t);
    await postRun(agent, actuator.id, null).expect(201);
    await postRun(agent, actuator.id, null).expect(201);
    expect(await runsOn(actuator.id)).toBe(2);
  });
});

describe('Idempotency-Key on the other creating POSTs', () => {
  test('when POST /api/builds is retried with its key, then one build', async () => {
    const { agent, user } = await makerWithActuator(t);
    const title = `Retried build ${randomBytes(3).toString('hex')}`;
    const key = newKey();
    const send = () =>
      agent
        .post('/api/builds')
        .set('X-CSRF-Token', agent.csrf)
        .set('Idempotency-Key', key)
        .send({ title, instrumentKind: 'profilometer', summary: 'Sent twice by a flaky connection.' });
    const first = await send();
    expect(first.status, first.text).toBe(201);
    const again = await send().expect(201);
    expect([again.body.id, again.headers['idempotent-replayed']]).toEqual([first.body.id, 'true']);
    expect(await Build.count({ where: { ownerId: user.id, title } })).toBe(1);
  });

  test('when a visitor sends a key, then the route answers 401 as before and no key is kept', async () => {
    const v = await visitor(t);
    const key = newKey();
    const res = await v.post('/api/builds').set('X-CSRF-Token', v.csrf).set('Idempotency-Key', key).send({ title: 'x' });
    expectError(res, 401, 'unauthorized');
    expect(await IdempotencyKey.count({ where: { idemKey: key } })).toBe(0);
  });
});
