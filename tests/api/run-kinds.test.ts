import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import Papa from 'papaparse';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createBuildRow, createPart, createRunRow, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { CalibrationRun } from '../../server/models/calibration-run.model.ts';
import { Part } from '../../server/models/part.model.ts';

let t: TestApp;
let mod: Agent;
beforeAll(async () => {
  t = await startTestApp();
  const m = await createUser({ role: 'moderator' });
  mod = await signIn(t, m.login);
});
afterAll(async () => {
  await t.close();
});

const post = (a: Agent, path: string, body: object) => a.post(path).set('X-CSRF-Token', a.csrf).send(body);
const patch = (a: Agent, path: string, body: object) => a.patch(path).set('X-CSRF-Token', a.csrf).send(body);

async function ownerWithActuator(status = 'draft') {
  const owner = await createUser();
  const build = await createBuildRow(owner.id, { status });
  const part = await createPart();
  const a = await signIn(t, owner.login);
  const res = await post(a, `/api/builds/${build.id}/actuators`, { partId: part.id, axis: 'X', drive: 'single', maxVolts: 40 });
  expect(res.status).toBe(201);
  return { owner, build, part, a, actuatorId: res.body.id as number };
}

// An indicator with 1 µm divisions read 8 µm peak-to-peak for a 120 V peak-to-peak sine, voltage read to 1 V.
const p2p = {
  kind: 'peak-to-peak',
  displacementPp: 8,
  voltsPp: 120,
  displacementUnit: 'um',
  voltageUnit: 'V',
  displacementResolution: 1,
  voltsResolution: 1,
  method: 'indicator',
  frequencyHz: 5,
};
const linePoints = (gain: number, n = 7) =>
  Array.from({ length: n }, (_, i) => ({ volts: i * 5, displacement: gain * i * 5 + (i % 2 ? 0.3 : -0.3) }));

describe('POST /api/actuators/:actuatorId/runs with kind "peak-to-peak"', () => {
  test('when a maker stores a peak-to-peak reading, then the gain is Δx/ΔV with u from the resolutions (r/√6 per difference) and worst-case bounds', async () => {
    const { a, actuatorId } = await ownerWithActuator();
    const res = await post(a, `/api/actuators/${actuatorId}/runs`, p2p);
    expect(res.status).toBe(201);
    // [calc] gain = 8000 nm / 120 V; u(Δx) = 1000/√6 nm, u(ΔV) = 1/√6 V, relative terms in quadrature
    // [S: JCGM 100:2008 (GUM) 4.3.7 rectangular, 5.1.2 propagation — memory for the clauses]
    const g = 8000 / 120;
    const u = g * Math.hypot(1000 / Math.sqrt(6) / 8000, 1 / Math.sqrt(6) / 120);
    expect(res.body).toMatchObject({ kind: 'peak-to-peak', status: 'pending', method: 'indicator', pointCount: 2, points: [] });
    expect(res.body.fit.gainNmPerV).toBeCloseTo(g, 10);
    expect(res.body.fit.gainStdUncertaintyNmPerV).toBeCloseTo(u, 10);
    expect(res.body.fit.gainBoundsNmPerV[0]).toBeCloseTo(7000 / 121, 10);
    expect(res.body.fit.gainBoundsNmPerV[1]).toBeCloseTo(9000 / 119, 10);
    expect(res.body.fit.gainCi95NmPerV).toBeNull();
    expect(res.body.reading).toEqual({ displacementPp: 8, voltsPp: 120, displacementResolution: 1, voltsResolution: 1, frequencyHz: 5 });
    const again = await a.get(`/api/runs/${res.body.id}`);
    expect(again.body.fit).toEqual(res.body.fit);
  });

  test('when the voltage resolution is not below the swing, or a field of another kind is sent, then 400 with its code', async () => {
    const { a, actuatorId } = await ownerWithActuator();
    expectError(await post(a, `/api/actuators/${actuatorId}/runs`, { ...p2p, voltsPp: 1, voltsResolution: 2 }), 400, 'invalid_input');
    expectError(await post(a, `/api/actuators/${actuatorId}/runs`, { ...p2p, points: [] }), 400, 'validation_failed');
    expectError(
      await post(a, `/api/actuators/${actuatorId}/runs`, { ...p2p, displacementPp: 0 }),
      400,
      'validation_failed',
      'displacementPp',
    );
    expectError(await post(a, `/api/actuators/${actuatorId}/runs`, { ...p2p, kind: 'guess' }), 400, 'validation_failed', 'kind');
  });

  test('when a point run is posted without a kind, then it keeps its shape and is stored as kind "points"', async () => {
    const { a, actuatorId } = await ownerWithActuator();
    const res = await post(a, `/api/actuators/${actuatorId}/runs`, {
      points: linePoints(100),
      displacementUnit: 'nm',
      method: 'capacitive',
    });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: 'points', pointCount: 7, decimated: false, model: 'intercept' });
    expect(res.body.points).toHaveLength(7);
    expect(res.body.fit.gainCi95NmPerV).toHaveLength(2);
    expect(res.body.fit.gainStdUncertaintyNmPerV).toBe(res.body.fit.gainStdErrNmPerV);
  });

  test('when a peak-to-peak run and a point run are accepted on one part, then the part pools both gains and its page names each kind', async () => {
    const { a, actuatorId, part } = await ownerWithActuator('published');
    const one = await post(a, `/api/actuators/${actuatorId}/runs`, p2p);
    const two = await post(a, `/api/actuators/${actuatorId}/runs`, {
      points: linePoints(-70),
      displacementUnit: 'nm',
      method: 'capacitive',
    });
    for (const r of [one, two])
      expect((await post(mod, `/api/review/runs/${r.body.id}/decision`, { decision: 'accept' })).status).toBe(200);
    const stored = await Part.findByPk(part.id);
    expect(stored!.acceptedRunCount).toBe(2);
    // Magnitudes pool: |−70| and 66.67 → median 68.33 [calc, type-7 median of two values]
    expect(stored!.gainMedianNmPerV).toBeCloseTo((70 + 8000 / 120) / 2, 1);
    const page = await request(t.app).get(`/api/parts/${part.id}`);
    expect(page.status).toBe(200);
    const kinds = page.body.runs.map((r: { kind: string }) => r.kind).sort();
    expect(kinds).toEqual(['peak-to-peak', 'points']);
  });
});

describe('PATCH /api/runs/:runId', () => {
  test('when a pending point run gets new points and a measured-on date, then it is refitted', async () => {
    const { a, actuatorId } = await ownerWithActuator();
    const created = await post(a, `/api/actuators/${actuatorId}/runs`, {
      points: linePoints(100),
      displacementUnit: 'nm',
      method: 'capacitive',
    });
    const res = await patch(a, `/api/runs/${created.body.id}`, {
      points: linePoints(50),
      measuredOn: '2026-11-20',
      conditions: { preload: '2 N' },
    });
    expect(res.status).toBe(200);
    expect(res.body.fit.gainNmPerV).toBeCloseTo(50, 1);
    expect(res.body).toMatchObject({ measuredOn: '2026-11-20', conditions: { preload: '2 N' }, status: 'pending', method: 'capacitive' });
  });

  test('when an accepted run is corrected, then it goes back to pending and leaves the part figures in the same change', async () => {
    const { a, actuatorId, part } = await ownerWithActuator('published');
    const created = await post(a, `/api/actuators/${actuatorId}/runs`, p2p);
    await post(mod, `/api/review/runs/${created.body.id}/decision`, { decision: 'accept' });
    expect((await Part.findByPk(part.id))!.acceptedRunCount).toBe(1);
    const res = await patch(a, `/api/runs/${created.body.id}`, { displacementPp: 9 });
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('pending');
    expect(res.body.fit.gainNmPerV).toBeCloseTo(9000 / 120, 10);
    const after = await Part.findByPk(part.id);
    expect(after!.acceptedRunCount).toBe(0);
    expect(after!.gainMedianNmPerV).toBeNull();
  });

  test('when the change is empty, belongs to another kind, or comes from someone else or a visitor, then 400/403/401', async () => {
    const { a, actuatorId } = await ownerWithActuator();
    const created = await post(a, `/api/actuators/${actuatorId}/runs`, p2p);
    const path = `/api/runs/${created.body.id}`;
    expectError(await patch(a, path, {}), 400, 'validation_failed');
    expectError(await patch(a, path, { points: linePoints(10) }), 400, 'validation_failed', 'points');
    expectError(await patch(a, path, { measuredOn: '2999-01-01' }), 400, 'validation_failed', 'measuredOn');
    const other = await signIn(t, (await createUser()).login);
    expectError(await patch(other, path, { displacementPp: 9 }), 404, 'not_found');
    expectError(await request(t.app).patch(path).send({ displacementPp: 9 }), 403, 'csrf_failed');
    expect((await CalibrationRun.findByPk(created.body.id))!.gainNmPerV).toBeCloseTo(8000 / 120, 10);
  });
});

describe('POST /api/builds/:buildId/withdraw', () => {
  test('when the maker withdraws a build pending review, then it is a draft again; a draft cannot be withdrawn', async () => {
    const { a, build } = await ownerWithActuator('draft');
    expect((await post(a, `/api/builds/${build.id}/submit`, {})).status).toBe(200);
    const res = await post(a, `/api/builds/${build.id}/withdraw`, {});
    expect(res.status).toBe(200);
    expect(res.body.status).toBe('draft');
    expectError(await post(a, `/api/builds/${build.id}/withdraw`, {}), 409, 'invalid_state');
  });
});

describe('GET /api/runs/:runId/export', () => {
  test('when a visitor exports a run of a published build as CSV, then the points come as recorded with the licence and the figures', async () => {
    const { a, actuatorId, build } = await ownerWithActuator('published');
    const points = linePoints(100);
    const created = await post(a, `/api/actuators/${actuatorId}/runs`, { points, displacementUnit: 'nm', method: 'capacitive' });
    const res = await request(t.app).get(`/api/runs/${created.body.id}/export?format=csv`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toContain(`scanwright-run-${created.body.id}.csv`);
    expect(res.text).toContain('CC-BY-4.0');
    const parsed = Papa.parse<string[]>(res.text.trim(), { comments: '#' });
    expect(parsed.data[0]).toEqual(['volts_V', 'displacement_nm', 'sweep']);
    expect(parsed.data.slice(1).map((r) => [Number(r[0]), Number(r[1])])).toEqual(points.map((p) => [p.volts, p.displacement]));
    expect(res.text).toMatch(new RegExp(`/builds/${build.id}`));
    const json = await request(t.app).get(`/api/runs/${created.body.id}/export?format=json`);
    expect(json.status).toBe(200);
    expect(json.body).toMatchObject({ licence: { id: 'CC-BY-4.0' }, run: { id: created.body.id, kind: 'points' }, record: points });
    expect(json.body.figures.gain_nm_per_v).toMatch(/^\d+(\.\d+)?$/);
    expectError(await request(t.app).get(`/api/runs/${created.body.id}/export?format=xml`), 400, 'validation_failed', 'format');
  });

  test('when the build is a draft, then a visitor gets 404', async () => {
    const { a, actuatorId } = await ownerWithActuator('draft');
    const created = await post(a, `/api/actuators/${actuatorId}/runs`, p2p);
    expectError(await request(t.app).get(`/api/runs/${created.body.id}/export`), 404, 'not_found');
    expect((await a.get(`/api/runs/${created.body.id}/export?format=csv`)).status).toBe(200);
  });
});

describe('big runs stay cheap', () => {
  test('when a run holds 50 000 points, then the build page carries a decimated series and stays under 300 KB', async () => {
    const { a, actuatorId, build } = await ownerWithActuator('published');
    const points = Array.from({ length: 50_000 }, (_, i) => ({
      volts: (i % 1000) / 10,
      displacement: ((i % 1000) / 10) * 87.3 + Math.sin(i),
    }));
    const created = await post(a, `/api/actuators/${actuatorId}/runs`, { points, displacementUnit: 'nm', method: 'capacitive' });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ pointCount: 50_000, decimated: true });
    expect(created.body.points.length).toBeLessThanOrEqual(2000);
    const page = await request(t.app).get(`/api/builds/${build.id}`);
    expect(page.status).toBe(200);
    expect(page.text.length).toBeLessThan(300_000);
    const json = await request(t.app).get(`/api/runs/${created.body.id}/export?format=json`);
    expect(json.body.record).toHaveLength(50_000);
  });

  test('when large runs wait on the desk, then the review queue carries a thinned series and stays under 1 MB', async () => {
    const { a, actuatorId, build } = await ownerWithActuator();
    const points = Array.from({ length: 40_000 }, (_, i) => ({ volts: (i % 400) / 4, displacement: ((i % 400) / 4) * 63.1 + Math.cos(i) }));
    for (let k = 0; k < 3; k++)
      expect((await post(a, `/api/actuators/${actuatorId}/runs`, { points, displacementUnit: 'nm', method: 'capacitive' })).status).toBe(
        201,
      );
    expect((await post(a, `/api/builds/${build.id}/submit`, {})).status).toBe(200);
    const queue = await mod.get('/api/review/queue');
    expect(queue.status).toBe(200);
    expect(queue.text.length).toBeLessThan(1_000_000);
    const mine = queue.body.runs.filter((r: { buildId: number }) => r.buildId === build.id);
    expect(mine).toHaveLength(3);
    for (const r of mine) expect(r.points.length).toBeLessThanOrEqual(100);
  });

  test('when a run has more than 200 000 points, then 400; when a build would pass 2 000 000, then 413', async () => {
    const { a, actuatorId, build, part, owner } = await ownerWithActuator();
    const many = Array.from({ length: 200_001 }, (_, i) => ({ volts: i % 100, displacement: i % 100 }));
    expectError(
      await post(a, `/api/actuators/${actuatorId}/runs`, { points: many, displacementUnit: 'nm', method: 'capacitive' }),
      400,
      'validation_failed',
      'points',
    );
    const filler = await createRunRow({ buildId: build.id, partId: part.id, ownerId: owner.id, gainNmPerV: 10 });
    await filler.update({ pointCount: 1_999_995 });
    expectError(
      await post(a, `/api/actuators/${actuatorId}/runs`, { points: linePoints(10), displacementUnit: 'nm', method: 'capacitive' }),
      413,
      'build_points_limit',
    );
  });
});

describe('POST /api/actuators/:actuatorId/runs with kind "sine-record"', () => {
  // A generated record [calc]: 50 Hz drive of 60 V amplitude on a 60 V offset, displacement 5.1 µm amplitude
  // lagging 12°, 4 000 samples over 0.1 s (5 periods), no noise: the fit must return what was put in.
  const f = 50;
  const samples = Array.from({ length: 4000 }, (_, i) => {
    const t = i * 2.5e-5;
    const w = 2 * Math.PI * f * t;
    return { timeS: t, volts: 60 + 60 * Math.sin(w), displacement: 1.3 + 5.1 * Math.sin(w - (12 * Math.PI) / 180) };
  });
  const body = { kind: 'sine-record', samples, voltageUnit: 'V', displacementUnit: 'um', method: 'capacitive' };

  test('when a maker stores a sine record, then the gain is amplitude ÷ amplitude, the lag and frequency are stored, and the plot is decimated', async () => {
    const { a, actuatorId } = await ownerWithActuator();
    const res = await post(a, `/api/actuators/${actuatorId}/runs`, body);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ kind: 'sine-record', pointCount: 4000, decimated: true });
    expect(res.body.points.length).toBeLessThanOrEqual(2000);
    expect(res.body.fit.gainNmPerV).toBeCloseTo(5100 / 60, 6);
    expect(res.body.fit.sine.frequencyHz).toBeCloseTo(50, 6);
    expect(res.body.fit.sine.phaseLagDeg).toBeCloseTo(12, 4);
    expect(res.body.fit.sine.frequencyKnown).toBe(false);
    // The workbench route answers the same gain for the same record.
    const wb = await request(t.app).post('/api/workbench/sine-fit').send({ samples, voltageUnit: 'V', displacementUnit: 'um' });
    expect(wb.status).toBe(200);
    expect(res.body.fit.gainNmPerV).toBe(wb.body.gainNmPerV);
    const csv = await a.get(`/api/runs/${res.body.id}/export?format=csv`);
    expect(Papa.parse<string[]>(csv.text.trim(), { comments: '#' }).data[0]).toEqual(['time_s', 'volts_V', 'displacement_um']);
  });

  test('when the record spans less than two periods, then 400 with the fit’s code and nothing is stored', async () => {
    const { a, actuatorId } = await ownerWithActuator();
    const res = await post(a, `/api/actuators/${actuatorId}/runs`, { ...body, samples: samples.slice(0, 1000) });
    expectError(res, 400, 'record_too_short');
    expect(await CalibrationRun.count({ where: { actuatorId } })).toBe(0);
  });
});
