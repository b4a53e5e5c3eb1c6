import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  SingularMatrixError,
  applyGain,
  equalGainPairMatrix,
  fitGainMatrix,
  invertGain,
  isReachable,
  mixingSinAngle,
  reachableRegion,
  voltsFor,
  type GainMatrix,
} from '@shared/workbench/mixing.ts';

const entry = fc.double({ min: -500, max: 500, noNaN: true });
const wellConditioned = fc
  .tuple(entry, entry, entry, entry)
  .map(([a, b, c, d]): GainMatrix => [
    [a, b],
    [c, d],
  ])
  .filter((g) => mixingSinAngle(g) > 1e-3 && Math.hypot(g[0][0], g[1][0]) > 1e-3 && Math.hypot(g[0][1], g[1][1]) > 1e-3);

describe('two-axis mixing [practice; small-angle, linear]', () => {
  it('when G is multiplied by its inverse, then the identity comes back [calc]', () => {
    fc.assert(
      fc.property(wellConditioned, (g) => {
        const inv = invertGain(g);
        const scale = Math.max(...g.flat().map(Math.abs)) * Math.max(...inv.flat().map(Math.abs));
        for (let i = 0; i < 2; i++) {
          for (let j = 0; j < 2; j++) {
            const product = g[i][0] * inv[0][j] + g[i][1] * inv[1][j];
            expect(Math.abs(product - (i === j ? 1 : 0))).toBeLessThan(1e-9 * scale);
          }
        }
      }),
    );
  });

  it('when volts are solved for a wanted (x, y), then applying G lands there [calc]', () => {
    fc.assert(
      fc.property(wellConditioned, entry, entry, (g, x, y) => {
        const v = voltsFor(g, x, y);
        const r = applyGain(g, v.vaV, v.vbV);
        const scale = (Math.abs(x) + Math.abs(y) + 1) / mixingSinAngle(g);
        expect(Math.abs(r.xNm - x)).toBeLessThan(1e-9 * scale);
        expect(Math.abs(r.yNm - y)).toBeLessThan(1e-9 * scale);
      }),
    );
  });

  it('when gains are equal at ±45°, then x = g(Va − Vb)/√2 and y = g(Va + Vb)/√2', () => {
    const g = equalGainPairMatrix(100);
    const r = applyGain(g, 3, 1);
    expect(r.xNm).toBeCloseTo((100 * 2) / Math.SQRT2, 12);
    expect(r.yNm).toBeCloseTo((100 * 4) / Math.SQRT2, 12);
    expect(mixingSinAngle(g)).toBeCloseTo(1, 15);
  });

  it('when the two directions are parallel, then inverting throws SingularMatrixError', () => {
    expect(() => invertGain([[1, 2], [2, 4]])).toThrow(SingularMatrixError);
    expect(() => invertGain([[0, 1], [0, 1]])).toThrow(SingularMatrixError);
  });

  it('when a noise-free grid is fitted, then G comes back with zero residuals [calc]', () => {
    const g: GainMatrix = [[70, -65], [72, 68]];
    const samples = [];
    for (const vaV of [-10, 0, 10, 20]) {
      for (const vbV of [-10, 0, 10]) samples.push({ vaV, vbV, ...applyGain(g, vaV, vbV) });
    }
    const fit = fitGainMatrix(samples);
    fit.gain.flat().forEach((value, i) => expect(value).toBeCloseTo(g.flat()[i], 10));
    expect(fit.residualStdXNm).toBeLessThan(1e-9);
    expect(fit.n).toBe(12);
  });

  it('when a grid only moves Va and Vb together, then the fit throws', () => {
    const samples = [1, 2, 3].map((v) => ({ vaV: v, vbV: v, xNm: v, yNm: v }));
    expect(() => fitGainMatrix(samples)).toThrow(SingularMatrixError);
  });

  it('when limits are 0–150 V, then the region is the parallelogram of the four corner drives, and reachability follows it', () => {
    const g = equalGainPairMatrix(100);
    const limits = { vaMinV: 0, vaMaxV: 150, vbMinV: 0, vbMaxV: 150 };
    const corners = reachableRegion(g, limits);
    expect(corners).toEqual([applyGain(g, 0, 0), applyGain(g, 150, 0), applyGain(g, 150, 150), applyGain(g, 0, 150)]);
    expect(isReachable(g, limits, 0, 10000)).toBe(true);
    expect(isReachable(g, limits, corners[2].xNm, corners[2].yNm)).toBe(true);
    expect(isReachable(g, limits, 0, -1)).toBe(false);
    expect(isReachable(g, limits, 12000, 12000)).toBe(false);
  });
});
