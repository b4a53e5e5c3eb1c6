import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { readStrdFile } from '../support/nist-strd.ts';
import { expectError } from '../support/expect-error.ts';

const readStrd = (name: string) => readStrdFile(new URL(`../fixtures/${name}`, import.meta.url));

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(async () => {
  await t.close();
});

const post = (body: unknown) =>
  request(t.app)
    .post('/api/workbench/fit')
    .send(body as object);
const rel = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('POST /api/workbench/fit', () => {
  test('when a visitor posts NIST Norris, then the certified slope, intercept, residual SD and R² come back [S: NIST/ITL StRD Norris]', async () => {
    const strd = readStrd('Norris.dat');
    const points = strd.x.map((x, i) => ({ volts: x, displacement: strd.y[i] }));
    const res = await post({ points, displacementUnit: 'nm' });
    expect(res.status).toBe(200);
    expect(res.body.n).toBe(36);
    expect(rel(res.body.gainNmPerV, strd.certified.slope)).toBeLessThan(1e-10);
    expect(rel(res.body.interceptNm, strd.certified.intercept!)).toBeLessThan(1e-10);
    expect(rel(res.body.residualStdNm, strd.certified.residualSd)).toBeLessThan(1e-10);
    expect(rel(res.body.r2, strd.certified.r2)).toBeLessThan(1e-10);
    expect(res.body).toMatchObject({ hysteresisPctFs: null, gainCi95NmPerV: [expect.any(Number), expect.any(Number)] });
  });

  test('when the origin model fits NoInt1, then interceptNm is 0 and the certified slope returns [S: NIST/ITL StRD NoInt1]', async () => {
    const strd = readStrd('NoInt1.dat');
    const points = strd.x.map((x, i) => ({ volts: x, displacement: strd.y[i] }));
    const res = await post({ points, displacementUnit: 'nm', model: 'origin' });
    expect(res.status).toBe(200);
    expect(res.body.interceptNm).toBe(0);
    expect(rel(res.body.gainNmPerV, strd.certified.slope)).toBeLessThan(1e-10);
    expect(rel(res.body.r2, strd.certified.r2)).toBeLessThan(1e-10);
  });

  test('when points are in mV and µin, then the gain is in nm/V (1 µin = 25.4 nm exactly) [S: NBS 1959]', async () => {
    const points = [0, 1000, 2000, 3000].map((mv) => ({ volts: mv, displacement: (mv / 1000) * 4 }));
    const res = await post({ points, voltageUnit: 'mV', displacementUnit: 'uin' });
    expect(res.status).toBe(200);
    expect(res.body.gainNmPerV).toBeCloseTo(4 * 25.4, 10);
  });

  test('when up and down sweeps share voltages, then hysteresis is reported as % of span [practice]', async () => {
    const up = [0, 10, 20].map((v) => ({ volts: v, displacement: v * 100, sweep: 'up' }));
    const down = [20, 10, 0].map((v) => ({ volts: v, displacement: v * 100 + (v === 10 ? 50 : 0), sweep: 'down' }));
    const res = await post({ points: [...up, ...down], displacementUnit: 'nm' });
    expect(res.status).toBe(200);
    // span = |b|·20 V; gap 50 nm at 10 V.
    expect(res.body.hysteresisPctFs).toBeCloseTo((50 / res.body.spanNm) * 100, 10);
  });

  test.each([
    [
      'fewer than 3 points',
      {
        points: [
          { volts: 0, displacement: 0 },
          { volts: 1, displacement: 1 },
        ],
        displacementUnit: 'nm',
      },
    ],
    [
      'a string value',
      {
        points: [
          { volts: '1', displacement: 0 },
          { volts: 1, displacement: 1 },
          { volts: 2, displacement: 2 },
        ],
        displacementUnit: 'nm',
      },
    ],
    [
      'a null value',
      {
        points: [
          { volts: null, displacement: 0 },
          { volts: 1, displacement: 1 },
          { volts: 2, displacement: 2 },
        ],
        displacementUnit: 'nm',
      },
    ],
    [
      'an unknown unit',
      {
        points: [
          { volts: 0, displacement: 0 },
          { volts: 1, displacement: 1 },
          { volts: 2, displacement: 2 },
        ],
        displacementUnit: 'furlong',
      },
    ],
    [
      'a missing unit',
      {
        points: [
          { volts: 0, displacement: 0 },
          { volts: 1, displacement: 1 },
          { volts: 2, displacement: 2 },
        ],
      },
    ],
    [
      'an unknown model',
      {
        points: [
          { volts: 0, displacement: 0 },
          { volts: 1, displacement: 1 },
          { volts: 2, displacement: 2 },
        ],
        displacementUnit: 'nm',
        model: 'cubic',
      },
    ],
  ])('when the body has %s, then 400 in the error shape', async (_name, body) => {
    const res = await post(body);
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } });
  });

  test('when all voltages are equal, then 400 voltages_all_equal', async () => {
    const res = await post({ points: [1, 2, 3].map((d) => ({ volts: 5, displacement: d })), displacementUnit: 'nm' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('voltages_all_equal');
  });

  test('when a value is non-finite in JSON (1e999 parses to Infinity), then 400', async () => {
    const res = await request(t.app)
      .post('/api/workbench/fit')
      .set('Content-Type', 'application/json')
      .send(
        '{"points":[{"volts":1e999,"displacement":0},{"volts":1,"displacement":1},{"volts":2,"displacement":2}],"displacementUnit":"nm"}',
      );
    expectError(res, 400, 'validation_failed', 'points.0.volts');
  });

  test('when more than 100 000 points are sent, then 400', async () => {
    const points = Array.from({ length: 100_001 }, (_, i) => ({ volts: i, displacement: i }));
    const res = await post({ points, displacementUnit: 'nm' });
    expectError(res, 400, 'validation_failed', 'points');
  });

  test('when exactly 100 000 points are sent, then 200', async () => {
    const points = Array.from({ length: 100_000 }, (_, i) => ({ volts: i / 1000, displacement: i / 10 }));
    const res = await post({ points, displacementUnit: 'nm' });
    expect(res.status).toBe(200);
    expect(res.body.gainNmPerV).toBeCloseTo(100, 8);
  });
});
