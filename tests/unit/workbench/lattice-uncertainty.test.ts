// The ± of the lattice figures (shared/workbench/lattice-figures.ts) on generated images whose true figures
// are known [calc]: coverage (the truth within 3 u), sensitivity (creep across the scan widens the ±), and the
// interpolation-bias constant recomputed here by a direct DFT, independently of fft.js.
import { describe, expect, test } from 'vitest';
import { analyseLattice } from '../../../shared/workbench/lattice.ts';
import { GAUSSIAN_BIAS_BINS, latticeFigures } from '../../../shared/workbench/lattice-figures.ts';
import { makeImage, type Scene } from '../../support/lattice-images.ts';

const figures = (s: Scene) => {
  const r = analyseLattice(makeImage(s), { kind: s.kind, constantNm: s.a });
  return latticeFigures({
    lattice: { kind: s.kind, constantNm: s.a },
    width: r.width,
    height: r.height,
    peaks: r.peaks,
    quadrantPeaks: r.quadrantPeaks,
  });
};

const hex: Scene = { kind: 'hexagonal', a: 0.246, sx: 0.012, sy: 0.0132, skewDeg: 2, rotationDeg: 12, nx: 256, ny: 256, noise: 0.3 };

describe('standard uncertainty of the lattice figures', () => {
  test.each([
    { ...hex, seed: 1 },
    { ...hex, seed: 2, noise: 1.5 },
    { ...hex, seed: 3, creep: 0.03 },
    { ...hex, kind: 'square' as const, a: 0.5, sx: 0.02, sy: 0.021, skewDeg: 1, rotationDeg: 25, seed: 4, noise: 0.8 },
  ])('$kind, noise $noise, seed $seed, creep $creep: the true figures lie within 3 u [calc; S: GUM 6.3.3 for k = 3]', (s) => {
    const f = figures(s);
    const u = f.standardUncertainty!;
    expect(u.quadrants).toBeGreaterThanOrEqual(3);
    expect(Math.abs(f.nmPerPixel!.x - s.sx)).toBeLessThan(3 * u.nmPerPixel!.x);
    expect(Math.abs(f.nmPerPixel!.y - s.sy)).toBeLessThan(3 * u.nmPerPixel!.y);
    expect(Math.abs(f.skewDeg! - s.skewDeg)).toBeLessThan(3 * u.skewDeg!);
    expect(Math.abs(f.rotationDeg - s.rotationDeg)).toBeLessThan(3 * u.rotationDeg);
  });

  test('creep along the slow axis widens the ± of the x scale by more than 3× (the quarters disagree) [calc]', () => {
    const still = figures({ ...hex, seed: 5 }).standardUncertainty!.nmPerPixel!.x;
    const creeping = figures({ ...hex, seed: 5, creep: 0.03 }).standardUncertainty!.nmPerPixel!.x;
    expect(creeping).toBeGreaterThan(3 * still);
  });

  test('an image too small to quarter gives no ± [calc]', () => {
    const f = figures({ ...hex, kind: 'square', a: 1, sx: 0.25, sy: 0.25, skewDeg: 0, rotationDeg: 0, nx: 24, ny: 24, noise: 0.05 });
    expect(f.standardUncertainty).toBeNull();
  });

  test('GAUSSIAN_BIAS_BINS bounds the three-point Gaussian interpolation error on a Hann window, and is tight [calc, direct DFT]', () => {
    const N = 128;
    const magAt = (f0: number, k: number) => {
      let re = 0;
      let im = 0;
      for (let n = 0; n < N; n++) {
        const w = 0.5 - 0.5 * Math.cos((2 * Math.PI * n) / (N - 1));
        const x = w * Math.cos((2 * Math.PI * f0 * n) / N + 0.4);
        re += x * Math.cos((2 * Math.PI * k * n) / N);
        im -= x * Math.sin((2 * Math.PI * k * n) / N);
      }
      return Math.hypot(re, im);
    };
    let worst = 0;
    for (let d = -0.5; d <= 0.5; d += 0.025) {
      const f0 = 20 + d;
      const k = Math.round(f0);
      const [lm, l0, lp] = [k - 1, k, k + 1].map((j) => Math.log(magAt(f0, j)));
      worst = Math.max(worst, Math.abs(k + (lm! - lp!) / (2 * (lm! - 2 * l0! + lp!)) - f0));
    }
    expect(worst).toBeLessThanOrEqual(GAUSSIAN_BIAS_BINS);
    expect(worst).toBeGreaterThan(0.8 * GAUSSIAN_BIAS_BINS);
  });
});
