import { describe, expect, test } from 'vitest';
import { workbenchClient } from '../support/workbench-client.ts';
import { expectError } from '../support/expect-error.ts';

const { post } = workbenchClient();

/** A square lattice, period 10 px along x and 12 px along y, 128 × 96 [calc, invented]. */
const square = Array.from({ length: 96 }, (_, r) =>
  Array.from({ length: 128 }, (_, c) => Math.cos((2 * Math.PI * c) / 10) + Math.cos((2 * Math.PI * r) / 12)),
);

describe('POST /api/workbench/lattice', () => {
  test('when a square lattice of 1 nm is sent with drive spans, then nm per pixel, skew, rotation, peaks and gains come back', async () => {
    const res = await post('lattice', { heights: square, lattice: { kind: 'square', constantNm: 1 }, scanSpanV: { x: 40, y: 30 } });
    expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(200);
    // 1 nm over 10 px and 12 px [calc]
    expect(res.body.nmPerPixel.x).toBeCloseTo(0.1, 3);
    expect(res.body.nmPerPixel.y).toBeCloseTo(1 / 12, 3);
    expect(Math.abs(res.body.skewDeg)).toBeLessThan(0.2);
    expect(Math.abs(res.body.rotationDeg)).toBeLessThan(0.2);
    expect(res.body.peaks).toHaveLength(2);
    expect(res.body.peaks[0]).toEqual({
      kx: expect.any(Number),
      ky: expect.any(Number),
      magnitude: expect.any(Number),
      periodPx: expect.any(Number),
      strength: expect.any(Number),
    });
    // 0.1 nm/px × 128 px / 40 V; (1/12) × 96 / 30 [calc]
    expect(res.body.gainNmPerV.x).toBeCloseTo(0.32, 3);
    expect(res.body.gainNmPerV.y).toBeCloseTo(8 / 30, 3);
    expect(res.body.warnings).toEqual([]);
    expect(res.body.cautions).toEqual([]);
  });

  test('when a line grating is sent, then only the scale along its normal, and a warning that says so', async () => {
    const lines = Array.from({ length: 64 }, () => Array.from({ length: 64 }, (_, c) => Math.cos((2 * Math.PI * c) / 8)));
    const res = await post('lattice', { heights: lines, lattice: { kind: 'line', constantNm: 400 } });
    expect(res.status).toBe(200);
    expect(res.body.nmPerPixel).toBeNull();
    expect(res.body.alongNormal.nmPerPixel).toBeCloseTo(50, 1); // 400 nm / 8 px [calc]
    expect(res.body.warnings.map((w: { code: string }) => w.code)).toContain('line_one_axis');
  });

  test('when the image is ragged, too large, too small, flat or the lattice unknown, then 400 with a code', async () => {
    const lattice = { kind: 'hexagonal', constantNm: 0.246 };
    const ragged = square.map((row, i) => (i === 3 ? row.slice(1) : row));
    expectError(await post('lattice', { heights: ragged, lattice }), 400, 'not_rectangular');
    expectError(await post('lattice', { heights: [[1, 2, 3]], lattice }), 400, 'image_too_small');
    const wide = Array.from({ length: 16 }, () => new Array(1100).fill(0));
    expectError(await post('lattice', { heights: wide, lattice }), 400, 'image_too_large');
    const flat = Array.from({ length: 32 }, () => new Array(32).fill(5));
    expectError(await post('lattice', { heights: flat, lattice }), 400, 'no_periodicity');
    expectError(
      await post('lattice', { heights: square, lattice: { kind: 'oblique', constantNm: 1 } }),
      400,
      'validation_failed',
      'lattice.kind',
    );
  });

  test('when a 1024 × 1024 image is sent, then it is analysed (the body limit allows it)', async () => {
    const big = Array.from({ length: 1024 }, (_, r) =>
      Array.from(
        { length: 1024 },
        (_, c) => Math.round((Math.cos((2 * Math.PI * c) / 16) + Math.cos((2 * Math.PI * r) / 16)) * 1000) / 1000,
      ),
    );
    const res = await post('lattice', { heights: big, lattice: { kind: 'square', constantNm: 0.8 } });
    expect(res.status).toBe(200);
    expect(res.body.nmPerPixel.x).toBeCloseTo(0.05, 4); // 0.8 nm / 16 px [calc]
  });
});
