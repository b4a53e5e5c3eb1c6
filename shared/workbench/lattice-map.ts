// Step 6 of the lattice analysis (lattice.ts): the affine map from image pixels to nanometres that takes the
// measured reciprocal vectors onto the ideal lattice's, and the figures read off it.
// A plane wave with reciprocal vector b (cycles/nm) shows in the image at k = Aᵀ·b (cycles/px). With the measured
// pair K = [k₁ k₂] and the ideal pair B₀ (hexagonal |b| = 2/(√3·a) at 60°, square 1/a at 90°
// [S: Kittel, Introduction to Solid State Physics, ch. 2, reciprocal lattice]) rotated by the unknown R:
// Aᵀ·R·B₀ = K ⇒ A = R·M with M = B₀⁻ᵀ·Kᵀ. Taking the physical x axis along the image's rows fixes R: A is the
// upper-triangular factor of the QR decomposition of M (M = Q·U, R = Qᵀ) [calc]. Then nm/px x = U₀₀,
// nm/px y = |(U₀₁, U₁₁)|, skew = angle between the axes − 90°, rotation = angle of a lattice vector A·p₁ from x.
// A line grating gives one vector: only the scale along its normal, a·|k|.
import type { LatticeKind } from './lattice-limits.ts';

export type Mat = [[number, number], [number, number]];
/** A reciprocal vector measured in the image, cycles per pixel along x (columns) and y (rows). */
export interface ImageVector {
  kx: number;
  ky: number;
}

export interface LatticeMap {
  nmPerPixel: { x: number; y: number };
  skewDeg: number;
  rotationDeg: number;
  /** A as [[a00, a01], [a10, a11]] nm per pixel. */
  pixelToNm: Mat;
}

const SQRT3 = Math.sqrt(3);
const len = (k: ImageVector) => Math.hypot(k.kx, k.ky);

/**
 * The pair in the order the map expects: an acute pair for a hexagonal lattice (the 60° pair, not 120°),
 * then counter-clockwise.
 */
export function orderPair<T extends ImageVector>(first: T, second: T): [T, T] {
  let k2 = first.kx * second.kx + first.ky * second.ky < 0 ? { ...second, kx: -second.kx, ky: -second.ky } : second;
  let k1 = first;
  if (k1.kx * k2.ky - k1.ky * k2.kx < 0) [k1, k2] = [k2, k1];
  return [k1, k2];
}

/** The pixel → nm map of a two-dimensional lattice from its two measured reciprocal vectors (any order, any sign). */
export function solveLatticeMap(
  first: ImageVector,
  second: ImageVector,
  lattice: { kind: Exclude<LatticeKind, 'line'>; constantNm: number },
): LatticeMap {
  const [k1, k2] = orderPair(first, second);
  const a = lattice.constantNm;
  const B0: Mat =
    lattice.kind === 'hexagonal'
      ? scale(
          [
            [1, 0.5],
            [0, SQRT3 / 2],
          ],
          2 / (SQRT3 * a),
        )
      : scale(
          [
            [1, 0],
            [0, 1],
          ],
          1 / a,
        );
  const K: Mat = [
    [k1.kx, k2.kx],
    [k1.ky, k2.ky],
  ];
  const M = mul(transpose(inverse(B0)), transpose(K));
  // QR of M by one rotation: M = Q·U.
  const r = Math.hypot(M[0][0], M[1][0]);
  const c = M[0][0] / r;
  const s = M[1][0] / r;
  const U01 = c * M[0][1] + s * M[1][1];
  const U11 = -s * M[0][1] + c * M[1][1];
  const sx = r;
  const sy = Math.hypot(U01, U11);
  const skewDeg = (Math.acos(U01 / sy) * 180) / Math.PI - 90;
  const A: Mat = [
    [sx, U01],
    [0, U11],
  ];
  // A lattice vector in nm: A·p₁, p₁ the first column of K⁻ᵀ.
  const Pm = transpose(inverse(K));
  const ax = A[0][0] * Pm[0][0] + A[0][1] * Pm[1][0];
  const ay = A[1][0] * Pm[0][0] + A[1][1] * Pm[1][0];
  const rotationDeg = wrapDeg((Math.atan2(ay, ax) * 180) / Math.PI, lattice.kind === 'hexagonal' ? 60 : 90);
  return { nmPerPixel: { x: sx, y: sy }, skewDeg, rotationDeg, pixelToNm: A };
}

/** A line grating's scale along its normal (a·|k| nm per pixel), the normal's angle and the lines' angle from x. */
export function lineGratingScale(k: ImageVector, constantNm: number): { nmPerPixel: number; angleDeg: number; rotationDeg: number } {
  const normalDeg = (Math.atan2(k.ky, k.kx) * 180) / Math.PI;
  return { nmPerPixel: constantNm * len(k), angleDeg: wrapDeg(normalDeg, 180), rotationDeg: wrapDeg(normalDeg + 90, 180) };
}

/** Wraps an angle into (−period/2, period/2]. */
export function wrapDeg(deg: number, period: number): number {
  let d = deg % period;
  if (d > period / 2) d -= period;
  if (d <= -period / 2) d += period;
  return d;
}

const transpose = (m: Mat): Mat => [
  [m[0][0], m[1][0]],
  [m[0][1], m[1][1]],
];
const scale = (m: Mat, f: number): Mat => [
  [m[0][0] * f, m[0][1] * f],
  [m[1][0] * f, m[1][1] * f],
];
const mul = (a: Mat, b: Mat): Mat => [
  [a[0][0] * b[0][0] + a[0][1] * b[1][0], a[0][0] * b[0][1] + a[0][1] * b[1][1]],
  [a[1][0] * b[0][0] + a[1][1] * b[1][0], a[1][0] * b[0][1] + a[1][1] * b[1][1]],
];
export function inverse(m: Mat): Mat {
  const det = m[0][0] * m[1][1] - m[0][1] * m[1][0];
  return [
    [m[1][1] / det, -m[0][1] / det],
    [-m[1][0] / det, m[0][0] / det],
  ];
}
