// The least-squares core of the sine fit, one channel at a time: the three-parameter fit at a known ω and the
// Gauss–Newton refinement of ω (the four-parameter fit), with the covariance each leaves behind.
//
// Sources:
// - Model y(t) = A·cos ωt + B·sin ωt + C; three-parameter fit: linear least squares in A, B, C; four-parameter
//   fit: each step a least-squares solve for A, B, C and Δω with the extra column t·(−A·sin ωt + B·cos ωt)
//   [S: IEEE Std 1057-2017, the three- and four-parameter sine-fit algorithms; clause numbers from memory].
// - Normal matrices scaled to a unit diagonal before a Cholesky solve (small-normal-solve.ts) [practice].
// - Amplitude R = √(A² + B²), phase φ = atan2(A, B); their standard uncertainties from the covariance
//   σ²·(XᵀX)⁻¹ [memory: the standard linear least-squares result, e.g. Draper & Smith, Applied Regression
//   Analysis], propagated to first order [S: GUM, JCGM 100:2008, 5.1.2].
import { SineFitError } from './sine-fit-error.ts';
import { solveNormal } from './small-normal-solve.ts';

/** Gauss–Newton stops when a step moves the phase at the record's ends by less than this (rad) [practice]. */
const PHASE_TOLERANCE_RAD = 1e-9;
const MAX_ITERATIONS = 50;

export function meanOf(y: Float64Array): number {
  let s = 0;
  for (let i = 0; i < y.length; i++) s += y[i];
  return s / y.length;
}

export function sumSquaresAbout(y: Float64Array, mean: number): number {
  let s = 0;
  for (let i = 0; i < y.length; i++) {
    const d = y[i] - mean;
    s += d * d;
  }
  return s;
}

export function fillTrig(t: Float64Array, omega: number, c: Float64Array, s: Float64Array): void {
  for (let i = 0; i < t.length; i++) {
    const p = omega * t[i];
    c[i] = Math.cos(p);
    s[i] = Math.sin(p);
  }
}

/** One channel's three-parameter fit: A, B, offset about `mean`, SSE and (XᵀX)⁻¹. */
export interface ChannelFit {
  a: number;
  b: number;
  offset: number;
  sse: number;
  inverse: Float64Array;
}

const aliasing = () =>
  new SineFitError(
    'no_clear_sine',
    'At this frequency the samples cannot tell a sine from an offset (every sample at nearly the same phase); check the frequency and the sampling rate.',
  );

export function threeParameterFit(c: Float64Array, s: Float64Array, y: Float64Array, mean: number): ChannelFit {
  let cc = 0;
  let cs = 0;
  let c1 = 0;
  let ss = 0;
  let s1 = 0;
  let cy = 0;
  let sy = 0;
  let y1 = 0;
  const n = y.length;
  for (let i = 0; i < n; i++) {
    const ci = c[i];
    const si = s[i];
    const yi = y[i] - mean;
    cc += ci * ci;
    cs += ci * si;
    c1 += ci;
    ss += si * si;
    s1 += si;
    cy += ci * yi;
    sy += si * yi;
    y1 += yi;
  }
  const solved = solveNormal(Float64Array.of(cc, cs, c1, cs, ss, s1, c1, s1, n), Float64Array.of(cy, sy, y1), 3);
  if (!solved) throw aliasing();
  const [a, b, k] = solved.x;
  let sse = 0;
  for (let i = 0; i < n; i++) {
    const r = y[i] - mean - a * c[i] - b * s[i] - k;
    sse += r * r;
  }
  return { a, b, offset: mean + k, sse, inverse: solved.inverse };
}

/** The 4×4 normal equations of the four-parameter model at ω, A, B (columns cos, sin, 1, ∂y/∂ω = t·(B·cos − A·sin)). */
export function fourParameterSystem(
  t: Float64Array,
  y: Float64Array,
  mean: number,
  omega: number,
  a: number,
  b: number,
  trig?: readonly [Float64Array, Float64Array],
): { m: Float64Array; r: Float64Array } {
  let cc = 0;
  let cs = 0;
  let c1 = 0;
  let cd = 0;
  let ss = 0;
  let s1 = 0;
  let sd = 0;
  let d1 = 0;
  let dd = 0;
  let cy = 0;
  let sy = 0;
  let y1 = 0;
  let dy = 0;
  const n = y.length;
  for (let i = 0; i < n; i++) {
    let ci: number;
    let si: number;
    if (trig) {
      ci = trig[0][i];
      si = trig[1][i];
    } else {
      const p = omega * t[i];
      ci = Math.cos(p);
      si = Math.sin(p);
    }
    const di = t[i] * (b * ci - a * si);
    const yi = y[i] - mean;
    cc += ci * ci;
    cs += ci * si;
    c1 += ci;
    cd += ci * di;
    ss += si * si;
    s1 += si;
    sd += si * di;
    d1 += di;
    dd += di * di;
    cy += ci * yi;
    sy += si * yi;
    y1 += yi;
    dy += di * yi;
  }
  return {
    m: Float64Array.of(cc, cs, c1, cd, cs, ss, s1, sd, c1, s1, n, d1, cd, sd, d1, dd),
    r: Float64Array.of(cy, sy, y1, dy),
  };
}

/** Gauss–Newton refinement of ω from a three-parameter start; each step's size limited to a quarter period over the half-record. */
export function refineFrequency(
  t: Float64Array,
  y: Float64Array,
  halfSpanS: number,
  mean: number,
  omega0: number,
  start: ChannelFit,
): { omega: number; iterations: number } {
  let omega = omega0;
  let a = start.a;
  let b = start.b;
  const maxStep = Math.PI / 2 / halfSpanS;
  for (let it = 1; it <= MAX_ITERATIONS; it++) {
    const { m, r } = fourParameterSystem(t, y, mean, omega, a, b);
    const solved = solveNormal(m, r, 4);
    if (!solved) throw aliasing();
    a = solved.x[0];
    b = solved.x[1];
    const step = Math.max(-maxStep, Math.min(maxStep, solved.x[3]));
    omega += step;
    if (!(omega > 0) || !Number.isFinite(omega)) break;
    if (Math.abs(step) * halfSpanS < PHASE_TOLERANCE_RAD) return { omega, iterations: it };
  }
  throw new SineFitError(
    'no_clear_sine',
    'The drive frequency did not settle in the four-parameter fit: the drive may not be a sine. Enter the drive frequency if you know it.',
  );
}

/** Amplitude, phase and their standard uncertainties from A, B and their covariance (σ²·inverse, rows/cols 0 and 1). */
export function polar(fit: ChannelFit, sigma2: number, inverse: Float64Array, size: number) {
  const { a, b } = fit;
  const vaa = sigma2 * inverse[0];
  const vbb = sigma2 * inverse[size + 1];
  const vab = sigma2 * inverse[1];
  const r2 = a * a + b * b;
  const amplitude = Math.sqrt(r2);
  const ampVar = r2 > 0 ? (a * a * vaa + b * b * vbb + 2 * a * b * vab) / r2 : Math.max(vaa, vbb);
  const phaseVar = r2 > 0 ? (b * b * vaa + a * a * vbb - 2 * a * b * vab) / (r2 * r2) : 0;
  return {
    amplitude,
    amplitudeStdUnc: Math.sqrt(Math.max(0, ampVar)),
    phase: Math.atan2(a, b),
    phaseStdUnc: Math.sqrt(Math.max(0, phaseVar)),
  };
}
