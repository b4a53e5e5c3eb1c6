import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createBuildRow, createPart, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { linearise } from '../../shared/workbench/linearise.ts';
import { lineariseInput } from '../../shared/schemas/linearise.ts';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

const send = (a: Agent, method: 'put' | 'delete', path: string, body?: object) => a[method](path).set('X-CSRF-Token', a.csrf).send(body);

async function ownerWithActuator(status = 'draft') {
  const owner = await createUser();
  const build = await createBuildRow(owner.id, { status });
  const part = await createPart();
  const a = await signIn(t, owner.login);
  const res = await a
    .post(`/api/builds/${build.id}/actuators`)
    .set('X-CSRF-Token', a.csrf)
    .send({ partId: part.id, axis: 'Z', drive: 'single' });
  return { a, build, actuatorId: res.body.id as number };
}

// A loop bending as a cubic per branch [calc, invented]: nm against V.
const up = (v: number) => 80 * v - 0.4 * v ** 2 + 0.004 * v ** 3;
const volts = Array.from({ length: 11 }, (_, i) => i * 10);
const points = [
  ...volts.map((v) => ({ volts: v, displacement: up(v), sweep: 'up' })),
  ...[...volts].reverse().map((v) => ({ volts: v, displacement: up(v) + 0.3 * v * (100 - v), sweep: 'down' })),
];

describe('PUT /api/actuators/:actuatorId/linearisation', () => {
  test('when the owner saves a linearisation, then 201, the build page shows its summary, the table downloads, and a second save is 200', async () => {
    const { a, build, actuatorId } = await ownerWithActuator('published');
    const body = { points, displacementUnit: 'nm', degree: 'auto', measuredOn: '2026-11-30' };
    const res = await send(a, 'put', `/api/actuators/${actuatorId}/linearisation`, body);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const { measuredOn: _date, ...fitBody } = body;
    const expected = linearise(lineariseInput.parse(fitBody));
    expect(res.body.linearisation).toMatchObject({
      branches: { up: { degree: 3, n: 11 }, down: { degree: 3, n: 11 } },
      tableRows: expected.table.length,
      measuredOn: '2026-11-30',
    });
    expect(res.body.linearisation.residualNonlinearityPctAfter).toBeCloseTo(expected.residualNonlinearityPctAfter, 12);
    const page = await request(t.app).get(`/api/builds/${build.id}`);
    expect(page.body.actuators[0].linearisation.tableRows).toBe(21);
    const csv = await request(t.app).get(`/api/actuators/${actuatorId}/linearisation/table?format=csv`);
    expect(csv.status).toBe(200);
    expect(csv.text.split('\n')[0]).toBe('target_nm,volts_up,volts_down');
    expect(csv.text.trim().split('\n')).toHaveLength(22);
    const c = await request(t.app).get(`/api/actuators/${actuatorId}/linearisation/table?format=c`);
    expect(c.text).toContain('static const float scanwright_drive_volts_down[21]');
    expect((await send(a, 'put', `/api/actuators/${actuatorId}/linearisation`, { ...body, degree: 2 })).status).toBe(200);
  });

  test('when a branch turns back, then 400 not_monotonic and nothing is stored; when there is none, the table is 404', async () => {
    const { a, actuatorId } = await ownerWithActuator();
    const hump = volts.map((v) => ({ volts: v, displacement: -((v - 50) ** 2) }));
    expectError(
      await send(a, 'put', `/api/actuators/${actuatorId}/linearisation`, { points: hump, displacementUnit: 'nm', degree: 2 }),
      400,
      'not_monotonic',
    );
    expectError(await a.get(`/api/actuators/${actuatorId}/linearisation/table`), 404, 'not_found');
    expectError(await a.get(`/api/actuators/${actuatorId}/linearisation/table?format=xls`), 400, 'validation_failed', 'format');
  });

  test("when a visitor asks for a draft's table, then 404; when the owner removes it, then 204 and it is gone", async () => {
    const { a, actuatorId } = await ownerWithActuator();
    await send(a, 'put', `/api/actuators/${actuatorId}/linearisation`, { points, displacementUnit: 'nm', degree: 3 });
    expectError(await request(t.app).get(`/api/actuators/${actuatorId}/linearisation/table`), 404, 'not_found');
    expect((await send(a, 'delete', `/api/actuators/${actuatorId}/linearisation`)).status).toBe(204);
    expectError(await a.get(`/api/actuators/${actuatorId}/linearisation/table`), 404, 'not_found');
  });
});
