// Generated lattice images for the lattice tests: sums of cosines of an ideal lattice seen through a known
// pixel → nm map (nm/px in x and y, skew, rotation) plus seeded Gaussian noise. Every figure a test expects is
// the one the image was made with [calc].
import type { LatticeKind } from '../../shared/workbench/lattice.ts';
import { seededRandom } from '../../shared/stats/seeded-random.ts';

export interface Scene {
  kind: LatticeKind;
  a: number;
  sx: number;
  sy: number;
  skewDeg: number;
  rotationDeg: number;
  nx: number;
  ny: number;
  noise: number;
  seed?: number;
  /** Extra waves: reciprocal vectors (cycles/nm) and amplitudes. */
  extra?: { b: [number, number]; amp: number }[];
  /**
   * Creep along the slow axis: the x scale grows linearly down the image, sx·(1 + creep·(row/ny − 1/2)), so the
   * top and bottom of the scan disagree by `creep` (a fraction) [calc].
   */
  creep?: number;
}

export const rad = (d: number) => (d * Math.PI) / 180;

/** Reciprocal vectors (cycles/nm) of the ideal lattice whose lattice vector (or lines) lies at θ from x. */
export function reciprocal(kind: LatticeKind, a: number, thetaDeg: number): [number, number][] {
  const dirs = kind === 'hexagonal' ? [30, 90, 150] : kind === 'square' ? [0, 90] : [90];
  const len = kind === 'hexagonal' ? 2 / (Math.sqrt(3) * a) : 1 / a;
  return dirs.map((d) => [len * Math.cos(rad(thetaDeg + d)), len * Math.sin(rad(thetaDeg + d))]);
}

/** Image z(p) = Σ cos(2π b·A·p) + noise, A = [[sx, −sy sin φ], [0, sy cos φ]]. */
export function makeImage(s: Scene): number[][] {
  const rnd = seededRandom(s.seed ?? 1);
  const gauss = () => Math.sqrt(-2 * Math.log(1 - rnd())) * Math.cos(2 * Math.PI * rnd()); // Box–Muller
  const waves = reciprocal(s.kind, s.a, s.rotationDeg)
    .map((b) => ({ b, amp: 1 }))
    .concat(s.extra ?? []);
  const a01 = -s.sy * Math.sin(rad(s.skewDeg));
  const a11 = s.sy * Math.cos(rad(s.skewDeg));
  const img: number[][] = [];
  for (let r = 0; r < s.ny; r++) {
    const row: number[] = [];
    for (let c = 0; c < s.nx; c++) {
      const x = s.sx * (1 + (s.creep ?? 0) * (r / s.ny - 0.5)) * (c - s.nx / 2) + s.sx * (s.nx / 2) + a01 * r;
      const y = a11 * r;
      let z = (0.3 * c) / s.nx - (0.2 * r) / s.ny; // a tilt the plane fit removes
      for (const w of waves) z += w.amp * Math.cos(2 * Math.PI * (w.b[0] * x + w.b[1] * y));
      row.push(z + s.noise * gauss());
    }
    img.push(row);
  }
  return img;
}
