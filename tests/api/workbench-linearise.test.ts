import { describe, expect, test } from 'vitest';
import { workbenchClient } from '../support/workbench-client.ts';
import { expectError } from '../support/expect-error.ts';

const { post } = workbenchClient();

// A bending loop in µm against V [calc, invented]: up x = 0.08·V − 4e-4·V² + 4e-6·V³, down 0.3·V(100 − V)/1000 above it.
const up = (v: number) => 0.08 * v - 4e-4 * v ** 2 + 4e-6 * v ** 3;
const volts = Array.from({ length: 11 }, (_, i) => i * 10);
const points = [
  ...volts.map((v) => ({ volts: v, displacement: up(v), sweep: 'up' })),
  ...[...volts].reverse().map((v) => ({ volts: v, displacement: up(v) + (0.3 * v * (100 - v)) / 1000, sweep: 'down' })),
];

describe('POST /api/workbench/linearise', () => {
  test('when a loop with labelled sweeps is sent, then each branch has its polynomial (ascending, nm per V^k) and the table inverts both', async () => {
    const res = await post('linearise', { points, displacementUnit: 'um', degree: 'auto', stepNm: 500 });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.branches.up).toMatchObject({ degree: 3, n: 11 });
    // µm → nm: c1 = 80 nm/V, c3 = 4e-3 nm/V³ [calc]
    expect(res.body.branches.up.coefficients[1]).toBeCloseTo(80, 6);
    expect(res.body.branches.up.coefficients[3]).toBeCloseTo(0.004, 9);
    expect(res.body.table[0]).toEqual({ targetNm: expect.any(Number), voltsUp: expect.any(Number), voltsDown: expect.any(Number) });
    expect(res.body.table[1].targetNm - res.body.table[0].targetNm).toBeCloseTo(500, 9);
    expect(res.body.residualNonlinearityPctAfter).toBeLessThan(1e-6);
    expect(res.body.nonlinearityPctBefore).toBeGreaterThan(0.5);
  });

  test('when the sweeps are not labelled, then one branch "all" and a "volts" column', async () => {
    const res = await post('linearise', {
      points: volts.map((v) => ({ volts: v, displacement: up(v) })),
      displacementUnit: 'um',
      degree: 2,
    });
    expect(res.status).toBe(200);
    expect(Object.keys(res.body.branches)).toEqual(['all']);
    expect(res.body.branches.all.degree).toBe(2);
    expect(res.body.table[0]).toHaveProperty('volts');
  });

  test('when a branch turns back, the degree is out of range, or the table would be too long, then 400 with a code', async () => {
    const hump = volts.map((v) => ({ volts: v, displacement: -((v - 50) ** 2) }));
    expectError(await post('linearise', { points: hump, displacementUnit: 'nm', degree: 2 }), 400, 'not_monotonic');
    expectError(await post('linearise', { points, displacementUnit: 'um', degree: 7 }), 400, 'validation_failed', 'degree');
    expectError(await post('linearise', { points, displacementUnit: 'um', stepNm: 0.001 }), 400, 'table_too_long');
    expectError(
      await post('linearise', { points: [{ volts: 1, displacement: 2 }], displacementUnit: 'nm' }),
      400,
      'validation_failed',
      'points',
    );
  });
});
