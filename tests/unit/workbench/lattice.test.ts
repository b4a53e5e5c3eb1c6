// Lattice calibration from generated images: sums of cosines of an ideal lattice seen through a known
// pixel → nm map (nm/px in x and y, skew, rotation) plus seeded Gaussian noise. Every expected value is
// the one the image was made with [calc]; tolerances are stated beside each check.
import { describe, expect, test } from 'vitest';
import { analyseLattice, LatticeError } from '../../../shared/workbench/lattice.ts';
import { latticeCalculator } from '../../../shared/workbench/calculators/lattice-calculator.ts';
import { latticeInput } from '../../../shared/schemas/lattice.ts';
import { makeImage, rad, reciprocal } from '../../support/lattice-images.ts';
import { seededRandom } from '../../../shared/stats/seeded-random.ts';

// Tolerances: the peak positions come from Gaussian interpolation on a Hann-windowed spectrum, whose bias is
// a few hundredths of a bin [S: Gasior & Gonzalez 2004]; with 20+ periods across the image that is ≲ 0.3 % of
// |k|, so 1 % on nm/px and 0.5° on angles leave room for noise and the neighbouring peaks' leakage [calc].
const within = (got: number, want: number, rel: number) => expect(Math.abs(got / want - 1)).toBeLessThan(rel);
const angleWithin = (got: number, want: number, deg: number) => expect(Math.abs(got - want)).toBeLessThan(deg);

describe('lattice analysis on generated images', () => {
  test.each([
    { kind: 'hexagonal' as const, a: 0.246, sx: 0.012, sy: 0.0132, skewDeg: 2, rotationDeg: 12, nx: 256, ny: 256, noise: 0.5 },
    { kind: 'hexagonal' as const, a: 0.246, sx: 0.015, sy: 0.014, skewDeg: -1.5, rotationDeg: -20, nx: 300, ny: 200, noise: 0.3 },
    { kind: 'square' as const, a: 0.5, sx: 0.02, sy: 0.021, skewDeg: 1, rotationDeg: 25, nx: 256, ny: 256, noise: 0.5 },
    { kind: 'square' as const, a: 3, sx: 0.1, sy: 0.09, skewDeg: -2.5, rotationDeg: -7, nx: 200, ny: 240, noise: 0.2 },
  ])('$kind, $nx × $ny, skew $skewDeg°, rotation $rotationDeg° [calc]', (s) => {
    const r = analyseLattice(makeImage(s), { kind: s.kind, constantNm: s.a });
    within(r.nmPerPixel!.x, s.sx, 0.01);
    within(r.nmPerPixel!.y, s.sy, 0.01);
    angleWithin(r.skewDeg!, s.skewDeg, 0.5);
    angleWithin(r.rotationDeg, s.rotationDeg, 0.5);
    expect(r.sqrt3Hint).toBe(false);
    expect(r.peaks).toHaveLength(2);
  });

  test('line grating: the scale along its normal only, and the lines’ angle [calc]', () => {
    const s = { kind: 'line' as const, a: 100, sx: 5, sy: 5.2, skewDeg: 0, rotationDeg: 80, nx: 256, ny: 256, noise: 0.3 };
    const r = analyseLattice(makeImage(s), { kind: 'line', constantNm: s.a });
    expect(r.nmPerPixel).toBeNull();
    // The normal lies at 170° ≡ −10°: mostly along x, so its scale is close to sx but mixes in sy [calc].
    const n = rad(s.rotationDeg + 90);
    const alongNormal = 1 / Math.hypot(Math.cos(n) / s.sx, Math.sin(n) / s.sy);
    within(r.alongNormal!.nmPerPixel, alongNormal, 0.01);
    angleWithin(r.rotationDeg, s.rotationDeg, 0.5);
  });

  test('every-other-atom trap: strong periods in a √3 ratio are flagged [calc; S: FIELD.md, Trucano & Chen 1975]', () => {
    // The 0.246 nm lattice plus waves of the √3-shorter period (0.142 nm spacing) at 30°, as strong.
    const a = 0.246;
    const short = reciprocal('hexagonal', a / Math.sqrt(3), 30 + 5).map((b) => ({ b, amp: 1.2 }));
    const s = {
      kind: 'hexagonal' as const,
      a,
      sx: 0.012,
      sy: 0.012,
      skewDeg: 0,
      rotationDeg: 5,
      nx: 256,
      ny: 256,
      noise: 0.2,
      extra: short,
    };
    const r = analyseLattice(makeImage(s), { kind: 'hexagonal', constantNm: a });
    expect(r.sqrt3Hint).toBe(true);
    const result = latticeCalculator.compute(latticeInput.parse({ heights: makeImage(s), lattice: { kind: 'hexagonal', constantNm: a } }));
    expect(result.warnings.map((w) => w.code)).toContain('every_other_atom');
  });

  test('few periods across the image and weak peaks are warned about [practice]', () => {
    const s = { kind: 'square' as const, a: 1, sx: 0.25, sy: 0.25, skewDeg: 0, rotationDeg: 0, nx: 16, ny: 16, noise: 0.05 };
    const result = latticeCalculator.compute({ heights: makeImage(s), lattice: { kind: 'square', constantNm: 1 } });
    expect(result.warnings.map((w) => w.code)).toContain('few_periods');
  });

  test('drive spans give the gains per axis and the coupling term [calc]', () => {
    const s = { kind: 'hexagonal' as const, a: 0.246, sx: 0.012, sy: 0.013, skewDeg: 2, rotationDeg: 0, nx: 256, ny: 256, noise: 0.2 };
    const result = latticeCalculator.compute({
      heights: makeImage(s),
      lattice: { kind: 'hexagonal', constantNm: 0.246 },
      scanSpanV: { x: 10, y: 20 },
    });
    within(result.gainNmPerV!.x!, (s.sx * 256) / 10, 0.01);
    within(result.gainNmPerV!.y!, (s.sy * 256) / 20, 0.01);
    within(result.gainMatrixNmPerV![0][1], (-s.sy * Math.sin(rad(2)) * 256) / 20, 0.1);
  });
});

describe('lattice refusals', () => {
  const code = (f: () => unknown) => {
    try {
      f();
    } catch (err) {
      expect(err).toBeInstanceOf(LatticeError);
      return (err as LatticeError).code;
    }
    return 'none';
  };
  const hex = { kind: 'hexagonal' as const, constantNm: 0.246 };
  test('ragged, too large, too small, non-finite [calc]', () => {
    const ragged = Array.from({ length: 20 }, (_, i) => new Array(i === 5 ? 19 : 20).fill(0));
    expect(code(() => analyseLattice(ragged, hex))).toBe('not_rectangular');
    expect(
      code(() =>
        analyseLattice(
          Array.from({ length: 1025 }, () => new Array(16).fill(0)),
          hex,
        ),
      ),
    ).toBe('image_too_large');
    expect(
      code(() =>
        analyseLattice(
          Array.from({ length: 15 }, () => new Array(40).fill(0)),
          hex,
        ),
      ),
    ).toBe('image_too_small');
    const bad = Array.from({ length: 20 }, () => new Array(20).fill(1));
    bad[3]![4] = Number.NaN;
    expect(code(() => analyseLattice(bad, hex))).toBe('non_finite_value');
  });
  test('a flat image and pure noise have no periodicity [calc]', () => {
    expect(
      code(() =>
        analyseLattice(
          Array.from({ length: 64 }, () => new Array(64).fill(3)),
          hex,
        ),
      ),
    ).toBe('no_periodicity');
    const rnd = seededRandom(7);
    const noise = Array.from({ length: 128 }, () => Array.from({ length: 128 }, () => rnd()));
    expect(code(() => analyseLattice(noise, hex))).toBe('no_periodicity');
  });
});
