// Two-axis mixing for a pair of benders meeting at a tip: a 2 × 2 gain matrix G (nm/V),
// r = G·[Va, Vb]ᵀ, fitted from a grid of drive pairs by least squares, commanded through G⁻¹
// [practice; small-angle, linear — FIELD.md "Displacement per volt"].

/** G as rows: [[∂x/∂Va, ∂x/∂Vb], [∂y/∂Va, ∂y/∂Vb]] in nm/V. */
export type GainMatrix = readonly [readonly [number, number], readonly [number, number]];

/** G⁻¹ as rows, in V/nm. */
export type InverseGainMatrix = readonly [readonly [number, number], readonly [number, number]];

/** Drive limits of the two channels (V). */
export interface DriveLimits {
  vaMinV: number;
  vaMaxV: number;
  vbMinV: number;
  vbMaxV: number;
}

/**
 * |det G| must exceed this fraction of |col a|·|col b| (i.e. |sin| of the angle between the two
 * actuators' directions): below 1e-6 the axes are parallel for any practical purpose [practice].
 */
export const MIN_MIXING_SIN_ANGLE = 1e-6;

/** Thrown when the two actuators move along (nearly) the same line; a RangeError so routes answer 400. */
export class SingularMatrixError extends RangeError {
  constructor(message = 'The two actuators move along the same line; the gain matrix has no inverse.') {
    super(message);
    this.name = 'SingularMatrixError';
  }
}

/** Tip displacement for a pair of drive voltages: r = G·[Va, Vb]ᵀ. */
export function applyGain(g: GainMatrix, vaV: number, vbV: number): { xNm: number; yNm: number } {
  return { xNm: g[0][0] * vaV + g[0][1] * vbV, yNm: g[1][0] * vaV + g[1][1] * vbV };
}

/** |sin| of the angle between the two actuators' directions: 1 orthogonal, 0 parallel. */
export function mixingSinAngle(g: GainMatrix): number {
  const det = g[0][0] * g[1][1] - g[0][1] * g[1][0];
  const norms = Math.hypot(g[0][0], g[1][0]) * Math.hypot(g[0][1], g[1][1]);
  return norms > 0 ? Math.abs(det) / norms : 0;
}

/** G⁻¹ so the page can turn a wanted (x, y) into drive voltages; throws if G is singular. */
export function invertGain(g: GainMatrix): InverseGainMatrix {
  if (!(mixingSinAngle(g) > MIN_MIXING_SIN_ANGLE)) throw new SingularMatrixError();
  const det = g[0][0] * g[1][1] - g[0][1] * g[1][0];
  return [
    [g[1][1] / det, -g[0][1] / det],
    [-g[1][0] / det, g[0][0] / det],
  ];
}

/** Drive voltages that put the tip at a wanted (x, y): [Va, Vb]ᵀ = G⁻¹·r. */
export function voltsFor(g: GainMatrix, xNm: number, yNm: number): { vaV: number; vbV: number } {
  const inv = invertGain(g);
  return { vaV: inv[0][0] * xNm + inv[0][1] * yNm, vbV: inv[1][0] * xNm + inv[1][1] * yNm };
}

/** One grid sample: the two drive voltages and the measured tip position. */
export interface MixingSample {
  vaV: number;
  vbV: number;
  xNm: number;
  yNm: number;
}

/** Fitted G (and the offsets x₀, y₀ for the affine model) with the residual SD of each axis. */
export interface GainMatrixFit {
  n: number;
  model: GainMatrixModel;
  gain: GainMatrix;
  offsetNm: readonly [number, number];
  residualStdXNm: number;
  residualStdYNm: number;
}

/** Affine x = x₀ + G·V (an indicator's zero need not be the rest position), or through the origin. */
export type GainMatrixModel = 'affine' | 'origin';

/** Why a grid cannot be fitted, so the page and the API can say which. */
export type GainMatrixRefusal = 'too_few_samples' | 'degenerate_grid' | 'numeric_overflow' | 'numeric_underflow';

/** Thrown for a grid the fit cannot use; a RangeError, so routes answer 400 with `code`. */
export class GainMatrixFitError extends RangeError {
  readonly code: GainMatrixRefusal;
  constructor(code: GainMatrixRefusal, message: string) {
    super(message);
    this.name = 'GainMatrixFitError';
    this.code = code;
  }
}

/** Smallest magnitude we scale by safely: below it, squares would fall into subnormals [calc: 2^-511 ≈ 1.5e-154]. */
const SMALLEST_SAFE_SCALE = 1.5e-154;

function maxAbs(samples: readonly MixingSample[], key: keyof MixingSample): number {
  let m = 0;
  for (const s of samples) {
    const a = Math.abs(s[key]);
    if (a > m) m = a;
  }
  return m;
}

/**
 * Least-squares G from a grid of drive pairs, each axis its own regression on the same design:
 * affine x = x₀ + gxa·Va + gxb·Vb (centred sums, residual SD with n − 3 df) or through the origin
 * x = gxa·Va + gxb·Vb (raw sums, n − 2 df) [S: ordinary least squares, e.g. Draper & Smith, Applied
 * Regression Analysis, ch. 5 — memory for the chapter]. Columns are scaled by their largest
 * magnitude first, so the sums neither overflow nor underflow for any representable input; a grid
 * whose Va and Vb do not vary independently (|sin| of the angle between the centred columns below
 * 1e-6) is refused as degenerate.
 */
export function fitGainMatrix(samples: readonly MixingSample[], model: GainMatrixModel = 'affine'): GainMatrixFit {
  const n = samples.length;
  const params = model === 'affine' ? 3 : 2;
  if (n < params + 1) {
    throw new GainMatrixFitError(
      'too_few_samples',
      `A ${model === 'affine' ? 'fit with offsets' : 'fit through the origin'} needs at least ${params + 1} samples.`,
    );
  }
  for (const s of samples) {
    if (![s.vaV, s.vbV, s.xNm, s.yNm].every(Number.isFinite))
      throw new GainMatrixFitError('numeric_overflow', 'Every sample must be a finite number.');
  }
  const sa = maxAbs(samples, 'vaV');
  const sb = maxAbs(samples, 'vbV');
  const sx = maxAbs(samples, 'xNm') || 1;
  const sy = maxAbs(samples, 'yNm') || 1;
  if (sa === 0 || sb === 0) {
    throw new GainMatrixFitError(
      'degenerate_grid',
      `${sa === 0 ? 'Va' : 'Vb'} is zero in every sample: the grid cannot separate the two channels. Vary Va and Vb each on its own.`,
    );
  }
  if (Math.min(sa, sb, sx, sy) < SMALLEST_SAFE_SCALE) {
    throw new GainMatrixFitError(
      'numeric_underflow',
      'The values are so small that double precision loses them (underflow); enter them in other units (mV, µm).',
    );
  }
  let ma = 0;
  let mb = 0;
  let mx = 0;
  let my = 0;
  if (model === 'affine') {
    for (const s of samples) {
      ma += s.vaV / sa;
      mb += s.vbV / sb;
      mx += s.xNm / sx;
      my += s.yNm / sy;
    }
    ma /= n;
    mb /= n;
    mx /= n;
    my /= n;
  }
  let saa = 0;
  let sab = 0;
  let sbb = 0;
  let sax = 0;
  let sbx = 0;
  let say = 0;
  let sby = 0;
  for (const s of samples) {
    const a = s.vaV / sa - ma;
    const b = s.vbV / sb - mb;
    const x = s.xNm / sx - mx;
    const y = s.yNm / sy - my;
    saa += a * a;
    sab += a * b;
    sbb += b * b;
    sax += a * x;
    sbx += b * x;
    say += a * y;
    sby += b * y;
  }
  const det = saa * sbb - sab * sab;
  if (!(saa > 0) || !(sbb > 0) || !(det > MIN_MIXING_SIN_ANGLE * MIN_MIXING_SIN_ANGLE * saa * sbb)) {
    const which = !(saa > 0) ? 'Va never changes' : !(sbb > 0) ? 'Vb never changes' : 'Va and Vb change together';
    throw new GainMatrixFitError(
      'degenerate_grid',
      `${which} in this grid, so it cannot separate the two channels. Vary Va and Vb each on its own (a grid of both).`,
    );
  }
  // Coefficients in scaled units, then back to nm/V.
  const gxa = ((sbb * sax - sab * sbx) / det) * (sx / sa);
  const gxb = ((saa * sbx - sab * sax) / det) * (sx / sb);
  const gya = ((sbb * say - sab * sby) / det) * (sy / sa);
  const gyb = ((saa * sby - sab * say) / det) * (sy / sb);
  const gain: GainMatrix = [
    [gxa, gxb],
    [gya, gyb],
  ];
  const offsetNm: [number, number] =
    model === 'affine' ? [mx * sx - gxa * ma * sa - gxb * mb * sb, my * sy - gya * ma * sa - gyb * mb * sb] : [0, 0];
  let ssx = 0;
  let ssy = 0;
  for (const s of samples) {
    const p = applyGain(gain, s.vaV, s.vbV);
    ssx += ((s.xNm - offsetNm[0] - p.xNm) / sx) ** 2;
    ssy += ((s.yNm - offsetNm[1] - p.yNm) / sy) ** 2;
  }
  const df = n - params;
  const fit = {
    n,
    model,
    gain,
    offsetNm,
    residualStdXNm: Math.sqrt(ssx / df) * sx,
    residualStdYNm: Math.sqrt(ssy / df) * sy,
  };
  if (![gxa, gxb, gya, gyb, ...offsetNm, fit.residualStdXNm, fit.residualStdYNm].every(Number.isFinite)) {
    throw new GainMatrixFitError(
      'numeric_overflow',
      'The gains are too large for double precision (overflow); enter the readings in other units.',
    );
  }
  return fit;
}

/**
 * Reachable region for the drive limits: the image of the voltage rectangle under G, a
 * parallelogram whose corners come back in order (Va,Vb) = (min,min), (max,min), (max,max), (min,max).
 */
export function reachableRegion(g: GainMatrix, limits: DriveLimits): { xNm: number; yNm: number }[] {
  return [
    applyGain(g, limits.vaMinV, limits.vbMinV),
    applyGain(g, limits.vaMaxV, limits.vbMinV),
    applyGain(g, limits.vaMaxV, limits.vbMaxV),
    applyGain(g, limits.vaMinV, limits.vbMaxV),
  ];
}

/**
 * Reachable region of a saved drive matrix in the indicator's frame: the parallelogram of
 * reachableRegion moved by the fitted offsets, since x = x₀ + G·V [practice; small-angle, linear —
 * FIELD.md "Displacement per volt"]. Corners in the same order as reachableRegion.
 */
export function reachableRegionWithOffset(
  g: GainMatrix,
  limits: DriveLimits,
  offsetNm: readonly [number, number],
): { xNm: number; yNm: number }[] {
  return reachableRegion(g, limits).map((p) => ({ xNm: p.xNm + offsetNm[0], yNm: p.yNm + offsetNm[1] }));
}

/** Whether a wanted (x, y) lies inside the reachable region (voltages within limits ± toleranceV). */
export function isReachable(g: GainMatrix, limits: DriveLimits, xNm: number, yNm: number, toleranceV = 1e-9): boolean {
  const { vaV, vbV } = voltsFor(g, xNm, yNm);
  return (
    vaV >= limits.vaMinV - toleranceV &&
    vaV <= limits.vaMaxV + toleranceV &&
    vbV >= limits.vbMinV - toleranceV &&
    vbV <= limits.vbMaxV + toleranceV
  );
}

/**
 * Equal gains g at ±45°: x = g(Va − Vb)/√2, y = g(Va + Vb)/√2
 * [practice; small-angle, linear — FIELD.md].
 */
export function equalGainPairMatrix(gainNmPerV: number): GainMatrix {
  const h = gainNmPerV / Math.SQRT2;
  return [
    [h, -h],
    [h, h],
  ];
}
