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

/** Fitted G with the residual SD of each axis. */
export interface GainMatrixFit {
  n: number;
  gain: GainMatrix;
  residualStdXNm: number;
  residualStdYNm: number;
}

/**
 * Least-squares G from a grid: x = gxa·Va + gxb·Vb and y = gya·Va + gyb·Vb, two independent
 * no-intercept regressions on the same 2 × 2 normal equations; residual SD with n − 2 df.
 */
export function fitGainMatrix(samples: readonly MixingSample[]): GainMatrixFit {
  const n = samples.length;
  if (n < 3) throw new RangeError('a gain-matrix fit needs at least 3 samples');
  let saa = 0;
  let sab = 0;
  let sbb = 0;
  let sax = 0;
  let sbx = 0;
  let say = 0;
  let sby = 0;
  for (const s of samples) {
    if (![s.vaV, s.vbV, s.xNm, s.yNm].every(Number.isFinite)) throw new RangeError('samples must be finite');
    saa += s.vaV * s.vaV;
    sab += s.vaV * s.vbV;
    sbb += s.vbV * s.vbV;
    sax += s.vaV * s.xNm;
    sbx += s.vbV * s.xNm;
    say += s.vaV * s.yNm;
    sby += s.vbV * s.yNm;
  }
  const det = saa * sbb - sab * sab;
  if (!(det > MIN_MIXING_SIN_ANGLE * MIN_MIXING_SIN_ANGLE * saa * sbb)) {
    throw new SingularMatrixError('The drive grid does not vary Va and Vb independently.');
  }
  const gain: GainMatrix = [
    [(sbb * sax - sab * sbx) / det, (saa * sbx - sab * sax) / det],
    [(sbb * say - sab * sby) / det, (saa * sby - sab * say) / det],
  ];
  let ssx = 0;
  let ssy = 0;
  for (const s of samples) {
    const p = applyGain(gain, s.vaV, s.vbV);
    ssx += (s.xNm - p.xNm) ** 2;
    ssy += (s.yNm - p.yNm) ** 2;
  }
  return { n, gain, residualStdXNm: Math.sqrt(ssx / (n - 2)), residualStdYNm: Math.sqrt(ssy / (n - 2)) };
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

/** Whether a wanted (x, y) lies inside the reachable region (voltages within limits ± toleranceV). */
export function isReachable(
  g: GainMatrix,
  limits: DriveLimits,
  xNm: number,
  yNm: number,
  toleranceV = 1e-9,
): boolean {
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
