import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  GainMatrixFitError,
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
    expect(() =>
      invertGain([
        [1, 2],
        [2, 4],
      ]),
    ).toThrow(SingularMatrixError);
    expect(() =>
      invertGain([
        [0, 1],
        [0, 1],
      ]),
    ).toThrow(SingularMatrixError);
  });

  it('when a noise-free grid is fitted, then G comes back with zero residuals [calc]', () => {
    const g: GainMatrix = [
      [70, -65],
      [72, 68],
    ];
    const samples = [];
    for (const vaV of [-10, 0, 10, 20]) {
      for (const vbV of [-10, 0, 10]) samples.push({ vaV, vbV, ...applyGain(g, vaV, vbV) });
    }
    const fit = fitGainMatrix(samples);
    fit.gain.flat().forEach((value, i) => expect(value).toBeCloseTo(g.flat()[i], 10));
    expect(fit.residualStdXNm).toBeLessThan(1e-9);
    expect(fit.n).toBe(12);
  });

  it('when a grid only moves Va and Vb together, then the fit refuses it as degenerate', () => {
    const samples = [1, 2, 3, 4].map((v) => ({ vaV: v, vbV: v, xNm: v, yNm: v }));
    expect(() => fitGainMatrix(samples)).toThrow(GainMatrixFitError);
    expect(() => fitGainMatrix(samples)).toThrow(/change together/);
    expect(() => fitGainMatrix(samples, 'origin')).toThrow(/change together/);
  });

  it('when the indicator zero is offset, then the affine fit returns G and the offsets exactly, and the through-origin fit is biased [calc]', () => {
    const g: GainMatrix = [
      [70, -65],
      [72, 68],
    ];
    const samples = [];
    for (const vaV of [0, 5, 10, 15]) {
      for (const vbV of [0, 5, 10]) {
        const p = applyGain(g, vaV, vbV);
        samples.push({ vaV, vbV, xNm: p.xNm + 250, yNm: p.yNm - 40 });
      }
    }
    const fit = fitGainMatrix(samples);
    fit.gain.flat().forEach((value, i) => expect(value).toBeCloseTo(g.flat()[i], 9));
    expect(fit.offsetNm[0]).toBeCloseTo(250, 8);
    expect(fit.offsetNm[1]).toBeCloseTo(-40, 8);
    expect(fit.residualStdXNm).toBeLessThan(1e-9);
    const biased = fitGainMatrix(samples, 'origin');
    expect(Math.abs(biased.gain[0][0] - 70)).toBeGreaterThan(1);
    expect(biased.offsetNm).toEqual([0, 0]);
  });

  it('when the affine fit is compared with simple-statistics on one channel (Vb fixed), then the slope and intercept agree [S: simple-statistics linearRegression]', async () => {
    const { linearRegression } = await import('simple-statistics');
    // Noisy x against Va with Vb held at two levels: the Va coefficient equals the slope of x on Va within each level.
    const samples = [];
    const noise = [0.3, -0.2, 0.1, -0.4, 0.25, 0.05];
    for (const [k, vaV] of [0, 4, 8, 12, 16, 20].entries()) {
      for (const vbV of [0, 10])
        samples.push({ vaV, vbV, xNm: 12 + 95 * vaV + 3 * vbV + noise[k], yNm: -7 + 2 * vaV + 90 * vbV + noise[5 - k] });
    }
    const fit = fitGainMatrix(samples);
    const level0 = samples.filter((s) => s.vbV === 0);
    const ref = linearRegression(level0.map((s) => [s.vaV, s.xNm]));
    expect(fit.gain[0][0]).toBeCloseTo(ref.m, 9);
    expect(fit.offsetNm[0]).toBeCloseTo(ref.b, 9);
  });

  it('when the values are extreme, then underflow, overflow and degeneracy are told apart', () => {
    const base = [
      [0, 0],
      [1, 0],
      [0, 1],
      [1, 1],
    ].map(([a, b]) => ({ vaV: a, vbV: b, xNm: a + b, yNm: a - b }));
    expect(() => fitGainMatrix(base.map((s) => ({ ...s, vaV: s.vaV * 1e-200, vbV: s.vbV * 1e-200 })))).toThrow(/underflow/);
    expect(() => fitGainMatrix(base.map((s) => ({ ...s, xNm: s.xNm * 1e300, vaV: s.vaV * 1e-10, vbV: s.vbV * 1e-10 })))).toThrow(
      /overflow/,
    );
    expect(() => fitGainMatrix(base.map((s) => ({ ...s, vbV: 0 })))).toThrow(/Vb is zero in every sample/);
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
