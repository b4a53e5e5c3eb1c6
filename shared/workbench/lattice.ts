// Lateral scale of a scanner read off an image of a lattice of known spacing (graphite 0.246 nm, a grating
// of stated pitch): the lattice's peaks in the image's 2-D spectrum are compared with the ideal lattice's.
// Steps, each with its source:
// 1. A least-squares plane z = a + b·x + c·y is removed. On a full rectangular grid with centred coordinates
//    the normal equations are diagonal, so a = mean z, b = Σ(x−x̄)z / Σ(x−x̄)², c likewise [calc: ordinary least
//    squares, orthogonal design].
// 2. A 2-D Hann window w(x)·w(y), w(n) = 0.5 − 0.5·cos(2πn/(N−1)), tames leakage from the image edges
//    [S: Harris, Proc. IEEE 66, 51 (1978)].
// 3. 2-D DFT as row FFTs then column FFTs (the DFT is separable), both sides zero-padded to one power of two
//    P ≥ the longer side, with fft.js (radix-4). A real image's spectrum is Hermitian, so only the half-plane
//    u ≥ 0 is computed and searched [calc].
// 4. Peaks: local maxima of |F| outside a disc round DC (2.5 cycles across the image: the Hann main lobe is
//    ±2 bins), suppressed within 2 unpadded bins of a stronger one; each is refined to sub-bin position by
//    Gaussian interpolation — a parabola through the log-magnitude of the three bins on each axis,
//    δ = (ln M₋ − ln M₊) / (2·(ln M₋ − 2 ln M₀ + ln M₊)) [S: Gasior & Gonzalez, "Improving FFT frequency
//    measurement resolution by parabolic and Gaussian spectrum interpolation", AIP Conf. Proc. 732, 276 (2004)].
//    The 2-D spectrum of a windowed plane wave is the product of the two 1-D window spectra, so the two axes
//    are refined separately [calc].
// 5. Strength: a peak's magnitude over the median magnitude in its ring (|k| ± 1.5 bins, the peaks' own
//    neighbourhoods left out) [practice]. Below NO_PERIODICITY_RATIO the image is refused; below
//    WEAK_PEAK_RATIO a warning.
// 6. The affine map A (nm per pixel) takes pixel coordinates p = (column, row) to nanometres, r = A·p; a plane
//    wave with reciprocal vector b (cycles/nm) shows in the image at k = Aᵀ·b (cycles/px). With the measured
//    pair K = [k₁ k₂] and the ideal pair B₀ (hexagonal |b| = 2/(√3·a) at 60°, square 1/a at 90°
//    [S: Kittel, Introduction to Solid State Physics, ch. 2, reciprocal lattice]) rotated by the unknown R:
//    Aᵀ·R·B₀ = K ⇒ A = R·M with M = B₀⁻ᵀ·Kᵀ. Taking the physical x axis along the image's rows fixes R:
//    A is the upper-triangular factor of the QR decomposition of M (M = Q·U, R = Qᵀ) [calc]. Then
//    nm/px x = U₀₀, nm/px y = |(U₀₁, U₁₁)|, skew = angle between the axes − 90°, rotation = angle of a
//    lattice vector A·p₁ from x. A line grating gives one vector: only the scale along its normal, a/|k|⁻¹.
// 7. Gains: the drive span V over the image's N pixels is V/N per pixel, so G = A·diag(Nx/Vx, Ny/Vy) nm/V
//    [calc].
import FFT from 'fft.js';

/** Raised for images the lattice analysis cannot use; `code` becomes the API's error code. */
export class LatticeError extends RangeError {
  constructor(
    readonly code: 'not_rectangular' | 'image_too_large' | 'image_too_small' | 'no_periodicity' | 'non_finite_value',
    message: string,
  ) {
    super(message);
  }
}

export type LatticeKind = 'hexagonal' | 'square' | 'line';

export const MAX_IMAGE_SIDE = 1024;
export const MIN_IMAGE_SIDE = 16;
/** A peak weaker than this many times its ring's median is refused as no periodicity [practice]. */
export const NO_PERIODICITY_RATIO = 6;
/** A chosen peak weaker than this many times its ring's median gets a warning [practice]. */
export const WEAK_PEAK_RATIO = 15;
/** Fewer periods than this across the image along a chosen vector gets a warning [practice]. */
export const MIN_PERIODS = 5;
/** Radius of the excluded disc round DC, in cycles across the image (Hann main lobe ±2 bins) [calc]. */
const DC_DISC_CYCLES = 2.5;
/** How many local maxima are kept as candidates. */
const MAX_CANDIDATES = 16;
const SQRT3 = Math.sqrt(3);

export interface LatticePeak {
  /** Reciprocal vector, cycles per pixel along x (columns) and y (rows). */
  kx: number;
  ky: number;
  magnitude: number;
  /** Period along the vector, pixels. */
  periodPx: number;
  /** Magnitude over the median of its ring. */
  strength: number;
}

export interface LatticeAnalysis {
  width: number;
  height: number;
  paddedSize: number;
  /** The chosen peaks: two for hexagonal and square lattices, one for a line grating. */
  peaks: LatticePeak[];
  /** Other strong peaks seen (for display), strongest first. */
  candidates: LatticePeak[];
  /** nm per pixel; null for a line grating, where x and y cannot both be found. */
  nmPerPixel: { x: number; y: number } | null;
  skewDeg: number | null;
  /** Angle of a lattice vector (hexagonal, square) or of the grating's lines from the x axis, degrees. */
  rotationDeg: number;
  /** A as [[a00, a01], [a10, a11]] nm per pixel; null for a line grating. */
  pixelToNm: [[number, number], [number, number]] | null;
  /** Line grating: scale along the normal to its lines, and the normal's angle from x. */
  alongNormal: { nmPerPixel: number; angleDeg: number } | null;
  /** Fewest periods across the image along a chosen vector. */
  periodsAcross: number;
  /** Ratios that hint at the every-other-atom trap, if any. */
  sqrt3Hint: boolean;
}

export interface LatticeOptions {
  /** Also return the log-magnitude spectrum, centred, P × P, for display. */
  withSpectrum?: boolean;
}

/** Checks the matrix: rectangular, within the size limits, finite. */
function checkImage(heights: readonly ArrayLike<number>[]): { nx: number; ny: number } {
  const ny = heights.length;
  const nx = heights[0]?.length ?? 0;
  for (let r = 0; r < ny; r++) {
    const row = heights[r]!;
    if (row.length !== nx)
      throw new LatticeError(
        'not_rectangular',
        `Row ${r + 1} has ${row.length} values but row 1 has ${nx}: every row needs the same count.`,
      );
  }
  if (nx > MAX_IMAGE_SIDE || ny > MAX_IMAGE_SIDE)
    throw new LatticeError('image_too_large', `The image is ${nx} × ${ny}; at most ${MAX_IMAGE_SIDE} × ${MAX_IMAGE_SIDE} is analysed.`);
  if (nx < MIN_IMAGE_SIDE || ny < MIN_IMAGE_SIDE)
    throw new LatticeError('image_too_small', `The image is ${nx} × ${ny}; at least ${MIN_IMAGE_SIDE} × ${MIN_IMAGE_SIDE} is needed.`);
  for (let r = 0; r < ny; r++) {
    const row = heights[r]!;
    for (let c = 0; c < nx; c++)
      if (!Number.isFinite(row[c])) throw new LatticeError('non_finite_value', `Row ${r + 1}, column ${c + 1} is not a finite number.`);
  }
  return { nx, ny };
}

/** Plane removed (step 1) and Hann window applied (step 2), into a P × P zero-padded buffer (row-major). */
function levelAndWindow(heights: readonly ArrayLike<number>[], nx: number, ny: number, P: number): Float64Array {
  let mean = 0;
  for (let r = 0; r < ny; r++) for (let c = 0; c < nx; c++) mean += heights[r]![c]!;
  mean /= nx * ny;
  const xc = (nx - 1) / 2;
  const yc = (ny - 1) / 2;
  let sxz = 0;
  let syz = 0;
  for (let r = 0; r < ny; r++)
    for (let c = 0; c < nx; c++) {
      const z = heights[r]![c]!;
      sxz += (c - xc) * z;
      syz += (r - yc) * z;
    }
  // Σ(x − x̄)² over the grid = ny · nx(nx² − 1)/12 [calc].
  const b = sxz / ((ny * nx * (nx * nx - 1)) / 12);
  const cy = syz / ((nx * ny * (ny * ny - 1)) / 12);
  const wx = hann(nx);
  const wy = hann(ny);
  const out = new Float64Array(P * P);
  for (let r = 0; r < ny; r++) {
    const row = heights[r]!;
    for (let c = 0; c < nx; c++) out[r * P + c] = (row[c]! - mean - b * (c - xc) - cy * (r - yc)) * wx[c]! * wy[r]!;
  }
  return out;
}

function hann(n: number): Float64Array {
  const w = new Float64Array(n);
  for (let i = 0; i < n; i++) w[i] = 0.5 - 0.5 * Math.cos((2 * Math.PI * i) / (n - 1));
  return w;
}

/**
 * Half-plane magnitude spectrum (step 3): mag[(v + P/2) · H + u] for u = 0…P/2, v = −P/2…P/2−1, H = P/2 + 1.
 */
function halfSpectrum(data: Float64Array, ny: number, P: number): Float64Array {
  const H = P / 2 + 1;
  const fft = new FFT(P);
  // Typed arrays throughout: fft.js only indexes its arguments, and typed storage keeps the GC quiet.
  const rowsOut = new Float64Array(ny * 2 * P);
  for (let r = 0; r < ny; r++) fft.realTransform(rowsOut.subarray(r * 2 * P, (r + 1) * 2 * P), data.subarray(r * P, (r + 1) * P));
  const col = new Float64Array(2 * P);
  const colOut = new Float64Array(2 * P);
  const mag = new Float64Array(H * P);
  for (let u = 0; u < H; u++) {
    for (let r = 0; r < ny; r++) {
      col[2 * r] = rowsOut[r * 2 * P + 2 * u]!;
      col[2 * r + 1] = rowsOut[r * 2 * P + 2 * u + 1]!;
    }
    fft.transform(colOut, col);
    for (let v = 0; v < P; v++) {
      const vs = v < P / 2 ? v : v - P; // signed frequency index
      mag[(vs + P / 2) * H + u] = Math.hypot(colOut[2 * v]!, colOut[2 * v + 1]!);
    }
  }
  return mag;
}

/** Analyses a height image of a lattice of known kind and constant. */
export function analyseLattice(
  heights: readonly ArrayLike<number>[],
  lattice: { kind: LatticeKind; constantNm: number },
  options: LatticeOptions = {},
): LatticeAnalysis & { spectrum?: Float32Array } {
  const { nx, ny } = checkImage(heights);
  let P = 4;
  while (P < Math.max(nx, ny)) P *= 2;
  const H = P / 2 + 1;
  const mag = halfSpectrum(levelAndWindow(heights, nx, ny, P), ny, P);
  // |F(u, v)| for any signed (u, v), using F(−u, −v) = F(u, v)* for u < 0.
  const at = (u: number, v: number): number => {
    if (u < 0) {
      u = -u;
      v = -v;
    }
    if (u > P / 2 || v < -P / 2 || v >= P / 2) return 0;
    return mag[(v + P / 2) * H + u]!;
  };
  // Bins per cycle across the image, per axis (zero padding stretches the spectrum).
  const binX = P / nx;
  const binY = P / ny;
  const inDcDisc = (u: number, v: number) => (u / binX) ** 2 + (v / binY) ** 2 < DC_DISC_CYCLES ** 2;

  // Step 4: local maxima in the half-plane (u > 0, or u = 0 with v > 0), DC disc left out.
  const maxima: { u: number; v: number; m: number }[] = [];
  for (let v = -P / 2 + 1; v < P / 2 - 1; v++)
    for (let u = 0; u < P / 2; u++) {
      if (u === 0 && v <= 0) continue;
      const m = mag[(v + P / 2) * H + u]!;
      if (m <= 0 || inDcDisc(u, v)) continue;
      let isMax = true;
      if (u > 0 && u < P / 2) {
        // Interior: neighbours straight from the array; ties go to the first in scan order.
        const i = (v + P / 2) * H + u;
        const up = i - H;
        const down = i + H;
        isMax =
          mag[up - 1]! < m &&
          mag[up]! < m &&
          mag[up + 1]! < m &&
          mag[i - 1]! < m &&
          mag[i + 1]! <= m &&
          mag[down - 1]! <= m &&
          mag[down]! <= m &&
          mag[down + 1]! <= m;
      } else
        for (let dv = -1; dv <= 1 && isMax; dv++)
          for (let du = -1; du <= 1; du++) {
            if (du === 0 && dv === 0) continue;
            const n = at(u + du, v + dv);
            if (n > m || (n === m && (dv < 0 || (dv === 0 && du < 0)))) {
              isMax = false;
              break;
            }
          }
      if (isMax) maxima.push({ u, v, m });
    }
  maxima.sort((a, b) => b.m - a.m);
  const suppress = 2 * Math.max(binX, binY);
  const kept: { u: number; v: number; m: number }[] = [];
  for (const p of maxima) {
    if (kept.length >= MAX_CANDIDATES) break;
    const near = kept.some((q) => Math.hypot(p.u - q.u, p.v - q.v) < suppress || Math.hypot(p.u + q.u, p.v + q.v) < suppress);
    if (!near) kept.push(p);
  }
  if (kept.length === 0) throw new LatticeError('no_periodicity', 'The image shows no periodic pattern: its spectrum is flat.');

  const refined = kept.map((p) => refine(p, at, P));
  const ringMedian = (p: { u: number; v: number }): number => {
    const r0 = Math.hypot(p.u, p.v);
    const values: number[] = [];
    const lo = Math.max(0, Math.floor(r0 - 1.5));
    const hi = Math.ceil(r0 + 1.5);
    for (let v = -hi; v <= hi; v++) {
      // Only the u where the ring crosses this row.
      const uFrom = Math.ceil(Math.sqrt(Math.max(0, lo * lo - v * v)));
      const uTo = Math.floor(Math.sqrt(Math.max(0, hi * hi - v * v)));
      for (let u = uFrom; u <= uTo; u++) {
        if (u === 0 && v <= 0) continue;
        if (Math.abs(Math.hypot(u, v) - r0) > 1.5) continue;
        if (kept.some((q) => Math.hypot(u - q.u, v - q.v) < suppress || Math.hypot(u + q.u, v + q.v) < suppress)) continue;
        values.push(at(u, v));
      }
    }
    return median(values);
  };
  const toPeak = (p: RefinedPeak): LatticePeak => {
    const kx = p.u / P;
    const ky = p.v / P;
    const bg = ringMedian(p);
    return { kx, ky, magnitude: p.m, periodPx: 1 / Math.hypot(kx, ky), strength: bg > 0 ? p.m / bg : Number.MAX_VALUE };
  };
  const candidates = refined.map(toPeak);
  const first = candidates[0]!;
  if (!(first.strength >= NO_PERIODICITY_RATIO))
    throw new LatticeError(
      'no_periodicity',
      `The strongest peak in the spectrum is only ${first.strength.toFixed(1)} × its background (at least ${NO_PERIODICITY_RATIO} needed): no lattice found.`,
    );

  const spectrum = options.withSpectrum ? centredLogSpectrum(at, P) : undefined;
  const periodsAlong = (k: LatticePeak) => Math.abs(k.kx) * nx + Math.abs(k.ky) * ny;

  if (lattice.kind === 'line') {
    const k = first;
    const kLen = Math.hypot(k.kx, k.ky);
    const normalDeg = (Math.atan2(k.ky, k.kx) * 180) / Math.PI;
    return {
      width: nx,
      height: ny,
      paddedSize: P,
      peaks: [k],
      candidates,
      nmPerPixel: null,
      skewDeg: null,
      rotationDeg: wrapDeg(normalDeg + 90, 180),
      pixelToNm: null,
      alongNormal: { nmPerPixel: lattice.constantNm * kLen, angleDeg: wrapDeg(normalDeg, 180) },
      periodsAcross: periodsAlong(k),
      sqrt3Hint: false,
      ...(spectrum ? { spectrum } : {}),
    };
  }

  // Second vector: not collinear with the first (more than 15° off), preferring one of similar length.
  const len = (k: LatticePeak) => Math.hypot(k.kx, k.ky);
  const sinAngle = (a: LatticePeak, b: LatticePeak) => Math.abs(a.kx * b.ky - a.ky * b.kx) / (len(a) * len(b));
  const nonCollinear = candidates.slice(1).filter((c) => sinAngle(first, c) > Math.sin((15 * Math.PI) / 180));
  if (nonCollinear.length === 0)
    throw new LatticeError('no_periodicity', 'Only one direction of periodicity was found: for a line grating choose "line".');
  const similar = nonCollinear.filter((c) => len(c) / len(first) > 0.75 && len(c) / len(first) < 1.33);
  let second = similar.find((c) => c.strength >= NO_PERIODICITY_RATIO) ?? nonCollinear[0]!;
  // Signs: an acute pair for a hexagonal lattice (the 60° pair, not 120°), then counter-clockwise order.
  if (first.kx * second.kx + first.ky * second.ky < 0) second = { ...second, kx: -second.kx, ky: -second.ky };
  let k1 = first;
  let k2 = second;
  if (k1.kx * k2.ky - k1.ky * k2.kx < 0) [k1, k2] = [k2, k1];

  const a = lattice.constantNm;
  // Ideal reciprocal basis B₀ (columns) and its inverse transpose, the real basis L₀ = B₀⁻ᵀ.
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
  const A: [[number, number], [number, number]] = [
    [sx, U01],
    [0, U11],
  ];
  // A lattice vector in nm: A·p₁, p₁ the first column of K⁻ᵀ.
  const Pm = transpose(inverse(K));
  const ax = A[0][0] * Pm[0][0] + A[0][1] * Pm[1][0];
  const ay = A[1][0] * Pm[0][0] + A[1][1] * Pm[1][0];
  const sym = lattice.kind === 'hexagonal' ? 60 : 90;
  const rotationDeg = wrapDeg((Math.atan2(ay, ax) * 180) / Math.PI, sym);

  const ratio = len(k2) / len(k1);
  const near = (x: number, target: number) => Math.abs(x / target - 1) < 0.08;
  const strongOthers = candidates.filter((p) => p.magnitude >= 0.3 * first.magnitude);
  const sqrt3Hint =
    lattice.kind === 'hexagonal' &&
    (near(ratio, SQRT3) ||
      near(ratio, 1 / SQRT3) ||
      strongOthers.some((p) => near(len(p) / len(first), SQRT3) || near(len(p) / len(first), 1 / SQRT3)) ||
      near(Math.max(sx, sy) / Math.min(sx, sy), SQRT3));

  return {
    width: nx,
    height: ny,
    paddedSize: P,
    peaks: [k1, k2],
    candidates,
    nmPerPixel: { x: sx, y: sy },
    skewDeg,
    rotationDeg,
    pixelToNm: A,
    alongNormal: null,
    periodsAcross: Math.min(periodsAlong(k1), periodsAlong(k2)),
    sqrt3Hint,
    ...(spectrum ? { spectrum } : {}),
  };
}

interface RefinedPeak {
  u: number;
  v: number;
  m: number;
}

/** Gaussian interpolation of the log-magnitude on each axis (step 4, Gasior & Gonzalez 2004). */
function refine(p: { u: number; v: number; m: number }, at: (u: number, v: number) => number, P: number): RefinedPeak {
  const offset = (lm: number, l0: number, lp: number): number => {
    const den = lm - 2 * l0 + lp;
    if (!(den < 0)) return 0;
    const d = (lm - lp) / (2 * den);
    return Math.max(-0.5, Math.min(0.5, d));
  };
  const ln = (x: number) => Math.log(Math.max(x, Number.MIN_VALUE));
  const l0 = ln(p.m);
  const du = offset(ln(at(p.u - 1, p.v)), l0, ln(at(p.u + 1, p.v)));
  const dv = offset(ln(at(p.u, p.v - 1)), l0, ln(at(p.u, p.v + 1)));
  void P;
  return { u: p.u + du, v: p.v + dv, m: p.m };
}

function median(values: number[]): number {
  if (values.length === 0) return 0;
  const s = Float64Array.from(values).sort();
  const mid = s.length >> 1;
  return s.length % 2 ? s[mid]! : (s[mid - 1]! + s[mid]!) / 2;
}

/** Wraps an angle into (−period/2, period/2]. */
function wrapDeg(deg: number, period: number): number {
  let d = deg % period;
  if (d > period / 2) d -= period;
  if (d <= -period / 2) d += period;
  return d;
}

/** log(1 + |F|) over the whole plane, DC in the centre, row-major P × P (for display). */
function centredLogSpectrum(at: (u: number, v: number) => number, P: number): Float32Array {
  const out = new Float32Array(P * P);
  for (let y = 0; y < P; y++) for (let x = 0; x < P; x++) out[y * P + x] = Math.log1p(at(x - P / 2, y - P / 2));
  return out;
}

type Mat = [[number, number], [number, number]];
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
function inverse(m: Mat): Mat {
  const det = m[0][0] * m[1][1] - m[0][1] * m[1][0];
  return [
    [m[1][1] / det, -m[0][1] / det],
    [-m[1][0] / det, m[0][0] / det],
  ];
}
