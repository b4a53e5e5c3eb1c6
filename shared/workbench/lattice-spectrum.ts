// The spectrum side of the lattice analysis (steps 1–5 of lattice.ts, where the sources are named): a height
// image levelled, windowed and transformed, its peaks found and placed between bins.
import FFT from 'fft.js';
import { LatticeError, MAX_IMAGE_SIDE, MIN_IMAGE_SIDE } from './lattice-limits.ts';

/** Radius of the excluded disc round DC, in cycles across the image (Hann main lobe ±2 bins) [calc]. */
const DC_DISC_CYCLES = 2.5;
/** How many local maxima are kept as candidates. */
const MAX_CANDIDATES = 16;

/** A height image's half-plane magnitude spectrum, zero-padded to P × P. */
export interface Spectrum {
  nx: number;
  ny: number;
  P: number;
  /** |F(u, v)| for any signed bin (u, v); 0 outside the plane. */
  at: (u: number, v: number) => number;
  /** Unpadded bins per padded bin along x and y (P / n). */
  binX: number;
  binY: number;
}

/** A spectrum peak in padded bins, before and after refinement. */
export interface BinPeak {
  u: number;
  v: number;
  m: number;
}

/** Checks the matrix: rectangular, within the size limits, finite. */
export function checkImage(heights: readonly ArrayLike<number>[]): { nx: number; ny: number } {
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
      const re = colOut[2 * v]!;
      const im = colOut[2 * v + 1]!;
      // √(re² + im²): Math.hypot guards against overflow, which these magnitudes cannot reach, at 20× the cost.
      mag[(vs + P / 2) * H + u] = Math.sqrt(re * re + im * im);
    }
  }
  return mag;
}

/** The image's spectrum (steps 1–3); the image must have passed checkImage. */
export function imageSpectrum(heights: readonly ArrayLike<number>[], nx: number, ny: number): Spectrum & { mag: Float64Array } {
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
  return { nx, ny, P, at, binX: P / nx, binY: P / ny, mag };
}

/** Step 4: the strongest local maxima of the half-plane outside the DC disc, neighbours of stronger ones suppressed. */
export function strongestMaxima(s: Spectrum & { mag: Float64Array }): BinPeak[] {
  const { P, mag, at, binX, binY } = s;
  const H = P / 2 + 1;
  const inDcDisc = (u: number, v: number) => (u / binX) ** 2 + (v / binY) ** 2 < DC_DISC_CYCLES ** 2;
  const maxima: BinPeak[] = [];
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
  const suppress = suppressRadius(s);
  const kept: BinPeak[] = [];
  for (const p of maxima) {
    if (kept.length >= MAX_CANDIDATES) break;
    const near = kept.some((q) => Math.hypot(p.u - q.u, p.v - q.v) < suppress || Math.hypot(p.u + q.u, p.v + q.v) < suppress);
    if (!near) kept.push(p);
  }
  return kept;
}

/** Peaks closer than two unpadded bins to a stronger one are its side lobes. */
export const suppressRadius = (s: Pick<Spectrum, 'binX' | 'binY'>) => 2 * Math.max(s.binX, s.binY);

/**
 * The largest magnitude within `radius` padded bins of a predicted position (u, v may be fractional), as a
 * peak in the half-plane; null when the largest is at the window's edge (no local maximum inside).
 */
export function maximumNear(s: Spectrum, u0: number, v0: number, radius: number): BinPeak | null {
  if (u0 < 0 || (u0 === 0 && v0 < 0)) {
    u0 = -u0;
    v0 = -v0;
  }
  const r = Math.max(1, Math.ceil(radius));
  const cu = Math.round(u0);
  const cv = Math.round(v0);
  let best: BinPeak | null = null;
  for (let v = cv - r; v <= cv + r; v++)
    for (let u = cu - r; u <= cu + r; u++) {
      const m = s.at(u, v);
      if (!best || m > best.m) best = { u, v, m };
    }
  if (!best || best.m <= 0) return null;
  if (Math.abs(best.u - cu) === r || Math.abs(best.v - cv) === r) return null;
  return best;
}

/** Gaussian interpolation of the log-magnitude on each axis (step 4, Gasior & Gonzalez 2004). */
export function refinePeak(p: BinPeak, at: Spectrum['at']): BinPeak {
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
  return { u: p.u + du, v: p.v + dv, m: p.m };
}

/**
 * Step 5: the median magnitude in a peak's ring (|k| ± 1.5 bins), leaving out the neighbourhoods of the
 * `kept` peaks and their mirror images.
 */
export function ringMedian(s: Spectrum, p: { u: number; v: number }, kept: readonly { u: number; v: number }[]): number {
  const suppress = suppressRadius(s);
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
      values.push(s.at(u, v));
    }
  }
  return median(values);
}

function median(values: number[]): number {
  if (values.length === 0) return 0;
  const sorted = Float64Array.from(values).sort();
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid]! : (sorted[mid - 1]! + sorted[mid]!) / 2;
}

/** log(1 + |F|) over the whole plane, DC in the centre, row-major P × P (for display). */
export function centredLogSpectrum(s: Spectrum): Float32Array {
  const { P, at } = s;
  const out = new Float32Array(P * P);
  for (let y = 0; y < P; y++) for (let x = 0; x < P; x++) out[y * P + x] = Math.log1p(at(x - P / 2, y - P / 2));
  return out;
}
