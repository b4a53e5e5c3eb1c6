// Lattice runs (a reference sample's lattice read off a scan image) and the image decoding the lattice page
// uses for TIFF files. Images are generated with known pixel sizes (tests/support/lattice-images.ts) and
// encoded here by independent writers (fast-png; a baseline TIFF 6.0 writer in tests/support/tiff.ts).
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import request from 'supertest';
import { encode as encodePng } from 'fast-png';
import { startTestApp, type TestApp } from '../support/test-app.ts';
import { signIn, type Agent } from '../support/login.ts';
import { createBuildRow, createPart, createUser } from '../support/factories.ts';
import { expectError } from '../support/expect-error.ts';
import { makeImage } from '../support/lattice-images.ts';
import { greyTiff } from '../support/tiff.ts';
import { Part } from '../../server/models/part.model.ts';

let t: TestApp;
let mod: Agent;
beforeAll(async () => {
  t = await startTestApp();
  mod = await signIn(t, (await createUser({ role: 'moderator' })).login);
});
afterAll(async () => {
  await t.close();
});

const post = (a: Agent, path: string, body: object) => a.post(path).set('X-CSRF-Token', a.csrf).send(body);

// A hexagonal lattice of 0.246 nm (graphite, Trucano & Chen 1975) at 0.012 × 0.0132 nm/px, 2° skew [calc, invented].
const scene = { kind: 'hexagonal' as const, a: 0.246, sx: 0.012, sy: 0.0132, skewDeg: 2, rotationDeg: 12, nx: 256, ny: 256, noise: 0.3 };
const span = { x: 4, y: 5 };

async function analysed() {
  const res = await request(t.app)
    .post('/api/workbench/lattice')
    .send({ heights: makeImage(scene), lattice: { kind: 'hexagonal', constantNm: 0.246 }, scanSpanV: span });
  expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(200);
  return res.body;
}

type Analysed = Awaited<ReturnType<typeof analysed>>;
/** A lattice run's body from the calculation's answer: the vectors the page would send. */
const latticeBody = (r: Analysed) => ({
  kind: 'lattice',
  lattice: { kind: 'hexagonal', constantNm: 0.246 },
  image: { width: 256, height: 256 },
  scanSpanV: span,
  peaks: r.peaks.map(({ kx, ky }: { kx: number; ky: number }) => ({ kx, ky })),
  quadrantPeaks: r.quadrantPeaks,
});

async function ownerWithActuator(axis: 'X' | 'Y' | 'Z' | 'XY') {
  const owner = await createUser();
  const build = await createBuildRow(owner.id, { status: 'draft' });
  const part = await createPart();
  const a = await signIn(t, owner.login);
  const res = await post(a, `/api/builds/${build.id}/actuators`, { partId: part.id, axis, drive: 'quartered-tube' });
  expect(res.status).toBe(201);
  return { build, part, a, actuatorId: res.body.id as number };
}

describe('POST /api/workbench/lattice: the ± of every figure', () => {
  test('when a lattice image is analysed, then each figure has a standard uncertainty from its quarters and the truth lies within 3 u', async () => {
    const r = await analysed();
    const u = r.standardUncertainty;
    expect(u.quadrants).toBeGreaterThanOrEqual(3);
    // The image was made with these [calc]; 3 u covers a normal error 99.7 % of the time [S: GUM 6.3.3].
    expect(Math.abs(r.nmPerPixel.x - scene.sx)).toBeLessThan(3 * u.nmPerPixel.x);
    expect(Math.abs(r.nmPerPixel.y - scene.sy)).toBeLessThan(3 * u.nmPerPixel.y);
    expect(Math.abs(r.skewDeg - scene.skewDeg)).toBeLessThan(3 * u.skewDeg);
    expect(Math.abs(r.rotationDeg - scene.rotationDeg)).toBeLessThan(3 * u.rotationDeg);
    expect(Math.abs(r.gainNmPerV.x - (scene.sx * 256) / span.x)).toBeLessThan(3 * u.gainNmPerV.x);
    expect(Math.abs(r.gainNmPerV.y - (scene.sy * 256) / span.y)).toBeLessThan(3 * u.gainNmPerV.y);
    // And the ± is not vacuous: under 1 % of the figure for an image of 20 periods [calc].
    expect(u.nmPerPixel.x / r.nmPerPixel.x).toBeLessThan(0.01);
  });
});

describe('POST /api/actuators/:actuatorId/runs with kind "lattice"', () => {
  test('when a maker records the page’s vectors on an XY actuator, then the server solves both axes and the run counts the mean', async () => {
    const r = await analysed();
    const { a, actuatorId } = await ownerWithActuator('XY');
    const body = { ...latticeBody(r), measuredOn: '2026-11-20' };
    const res = await post(a, `/api/actuators/${actuatorId}/runs`, body);
    expect(res.status, JSON.stringify(res.body).slice(0, 400)).toBe(201);
    expect(res.body).toMatchObject({
      kind: 'lattice',
      method: 'reference-sample',
      status: 'pending',
      points: [],
      voltageUnit: 'V',
      displacementUnit: 'nm',
    });
    const l = res.body.fit.lattice;
    // The same figures the calculation gave (one code path) [calc].
    expect(l.gainNmPerV.x).toBeCloseTo(r.gainNmPerV.x, 9);
    expect(l.gainNmPerV.y).toBeCloseTo(r.gainNmPerV.y, 9);
    expect(l.gainU.x).toBeCloseTo(r.standardUncertainty.gainNmPerV.x, 9);
    expect(l.countsAs).toBe('mean');
    // Mean of the axes, u = √(u_x² + u_y²)/2 [S: GUM 5.1.2].
    expect(res.body.fit.gainNmPerV).toBeCloseTo((l.gainNmPerV.x + l.gainNmPerV.y) / 2, 9);
    expect(res.body.fit.gainStdUncertaintyNmPerV).toBeCloseTo(Math.hypot(l.gainU.x, l.gainU.y) / 2, 9);
    expect(res.body.fit.gainCi95NmPerV).toBeNull();

    // The export lists the vectors of the whole image and of each quarter.
    const csv = await a.get(`/api/runs/${res.body.id}/export?format=csv`);
    expect(csv.status).toBe(200);
    expect(csv.text).toContain('image_part,vector,kx_cycles_per_px,ky_cycles_per_px');
    expect(csv.text.split('\n').filter((line) => line.startsWith('quarter')).length).toBe(2 * r.quadrantPeaks.length);
  });

  test('when a lattice run is accepted on a published build, then the part’s figures count its gain', async () => {
    const r = await analysed();
    const { a, actuatorId, build, part } = await ownerWithActuator('Y');
    const res = await post(a, `/api/actuators/${actuatorId}/runs`, latticeBody(r));
    expect(res.status).toBe(201);
    expect(res.body.fit.lattice.countsAs).toBe('y');
    expect(res.body.fit.gainNmPerV).toBeCloseTo(res.body.fit.lattice.gainNmPerV.y, 12);
    await build.update({ status: 'published', publishedAt: new Date() });
    const accept = await post(mod, `/api/review/runs/${res.body.id}/decision`, { decision: 'accept' });
    expect(accept.status, accept.text).toBe(200);
    const stored = await Part.findByPk(part.id);
    expect(stored!.gainMedianNmPerV).toBeCloseTo(res.body.fit.gainNmPerV, 9);
  });

  test('when the actuator is a Z axis, or fewer than three quarters are sent, or the vectors are out of range, then 400 with its code', async () => {
    const r = await analysed();
    const base = latticeBody(r);
    const z = await ownerWithActuator('Z');
    expectError(await post(z.a, `/api/actuators/${z.actuatorId}/runs`, base), 400, 'lattice_axis');
    const xy = await ownerWithActuator('XY');
    expectError(
      await post(xy.a, `/api/actuators/${xy.actuatorId}/runs`, { ...base, quadrantPeaks: r.quadrantPeaks.slice(0, 2) }),
      400,
      'validation_failed',
      ['quadrantPeaks'],
    );
    expectError(
      await post(xy.a, `/api/actuators/${xy.actuatorId}/runs`, { ...base, peaks: [{ kx: 0.7, ky: 0 }, base.peaks[1]] }),
      400,
      'validation_failed',
      ['peaks.0.kx'],
    );
    expectError(
      await post(xy.a, `/api/actuators/${xy.actuatorId}/runs`, { ...base, lattice: { kind: 'line', constantNm: 100 } }),
      400,
      'validation_failed',
      ['lattice.kind'],
    );
  });
});

describe('POST /api/workbench/image-heights', () => {
  const w = 48;
  const h = 40;
  const ramp = (i: number) => (i % w) * 7 + Math.floor(i / w) * 3;

  test.each([
    [
      '16-bit PNG',
      () =>
        Buffer.from(
          encodePng({ width: w, height: h, data: Uint16Array.from({ length: w * h }, (_, i) => ramp(i) * 100), depth: 16, channels: 1 }),
        ),
      16,
      100,
    ],
    [
      '8-bit PNG',
      () =>
        Buffer.from(
          encodePng({ width: w, height: h, data: Uint8Array.from({ length: w * h }, (_, i) => ramp(i) % 256), depth: 8, channels: 1 }),
        ),
      8,
      1,
    ],
    [
      '16-bit TIFF',
      () =>
        greyTiff(
          w,
          h,
          Array.from({ length: w * h }, (_, i) => ramp(i) * 100),
          'uint16',
        ),
      16,
      100,
    ],
    [
      '8-bit TIFF',
      () =>
        greyTiff(
          w,
          h,
          Array.from({ length: w * h }, (_, i) => ramp(i) % 256),
          'uint8',
        ),
      8,
      1,
    ],
    [
      '32-bit float TIFF',
      () =>
        greyTiff(
          w,
          h,
          Array.from({ length: w * h }, (_, i) => ramp(i) * 0.25),
          'float32',
        ),
      32,
      0.25,
    ],
  ])('when a %s is sent, then its samples come back as rows, exactly', async (_name, file, bitDepth, scale) => {
    const res = await request(t.app)
      .post('/api/workbench/image-heights')
      .attach('image', file(), { filename: 'scan.bin', contentType: 'application/octet-stream' });
    expect(res.status, res.text.slice(0, 300)).toBe(200);
    expect(res.body).toMatchObject({ width: w, height: h, bitDepth });
    for (const [r, c] of [
      [0, 0],
      [0, w - 1],
      [h - 1, 0],
      [17, 23],
    ] as const) {
      const want = bitDepth === 8 ? ramp(r * w + c) % 256 : ramp(r * w + c) * scale;
      expect(res.body.heights[r][c]).toBeCloseTo(want, 6);
    }
  });

  test('when the file is not PNG or TIFF, is unreadable, too large, or missing, then a 4xx with its code', async () => {
    const send = (buf: Buffer) => request(t.app).post('/api/workbench/image-heights').attach('image', buf, { filename: 'x.bin' });
    expectError(await send(Buffer.from('not an image at all')), 400, 'unreadable_image');
    const big = greyTiff(1100, 20, new Array(1100 * 20).fill(1), 'uint8');
    expectError(await send(big), 400, 'image_too_large');
    const gif = Buffer.from('47494638396101000100800000000000ffffff21f90401000000002c00000000010001000002024401003b', 'hex');
    expectError(await send(gif), 415, 'unsupported_image');
    expectError(await request(t.app).post('/api/workbench/image-heights').field('x', '1'), 400, 'no_files');
  });
});
