// Linearising an open-loop piezo drive from its own calibration: a polynomial x = p(V) per sweep branch
// (up and down, or one curve when the sweeps are not labelled), then a table that inverts each branch so
// a wanted position gives the volts to apply on that branch.
// - Fit: polynomial-fit.ts (centred, scaled Vandermonde solved by Householder QR).
// - "auto" degree: start at 1 and add a degree while the extra term is significant by the partial F-test
//   at 5 %, F = (SSE_d − SSE_{d+1}) / (SSE_{d+1}/(n − d − 2)) against F(0.95; 1, n − d − 2) = t(0.975; n − d − 2)²
//   [S: Draper & Smith, Applied Regression Analysis, 3rd ed. 1998, the extra-sum-of-squares principle —
//   memory for the chapter; the identity F(1, ν) = t(ν)² is exact, calc].
// - Inversion: a branch must be strictly monotonic over the driven range (p′ of one sign at 512 evenly spaced
//   voltages and at the ends), then each target is solved by bisection to 1e-12 of the range [practice].
// - Nonlinearity before: the straight-line figure of the calibration fit (calibration-fit.ts, ISA-51.1
//   terms); after: max |reading − p_branch(V)| over all points ÷ span × 100 % — what is left once the drive
//   follows the table [practice; stated so it can be checked].
import type { LineariseInput } from '../schemas/linearise.ts';
import { MAX_LINEARISE_DEGREE, MAX_TABLE_ROWS } from '../schemas/linearise.ts';
import { toNm, toVolts } from '../units.ts';
import { fitCalibrationInUnits } from './calibration-fit.ts';
import { evaluateDerivative, evaluatePolynomial, fitPolynomial, PolynomialFitError, type PolynomialFit } from './polynomial-fit.ts';
import { tCritical95 } from './student-t.ts';

/** Raised for input the linearisation cannot use; `code` becomes the API's error code. */
export class LineariseError extends RangeError {
  constructor(
    readonly code: 'not_monotonic' | 'too_few_points' | 'no_common_range' | 'table_too_long',
    message: string,
  ) {
    super(message);
  }
}

export type BranchName = 'up' | 'down' | 'all';

/** One branch as the API returns it. */
export interface BranchFit {
  degree: number;
  n: number;
  coefficients: number[];
  coefficientStdErr: number[];
  residualStdNm: number;
  r2: number | null;
  voltsRangeV: [number, number];
}

export interface TableRow {
  targetNm: number;
  voltsUp?: number;
  voltsDown?: number;
  volts?: number;
}

export interface LineariseResult {
  branches: Partial<Record<BranchName, BranchFit>>;
  table: TableRow[];
  nonlinearityPctBefore: number | null;
  residualNonlinearityPctAfter: number;
  spanNm: number;
  unlabelledLeftOut: number;
}

/** What an actuator keeps of a linearisation: the server's result (never numbers sent by the client) and dates. */
export interface StoredLinearisation {
  result: LineariseResult;
  measuredOn: string | null;
  savedAt: string;
}

const MONOTONIC_SAMPLES = 512;

/** The degree an "auto" fit settles on: the smallest whose next term is not significant at 5 % (partial F-test). */
export function chooseDegree(v: readonly number[], x: readonly number[]): PolynomialFit {
  let fit = fitPolynomial(v, x, 1);
  for (let d = 2; d <= MAX_LINEARISE_DEGREE && v.length >= d + 2; d++) {
    let next: PolynomialFit;
    try {
      next = fitPolynomial(v, x, d);
    } catch (err) {
      if (err instanceof PolynomialFitError) break;
      throw err;
    }
    const df = v.length - (d + 1);
    if (df < 1 || next.residualSumSquares <= 0) {
      if (next.residualSumSquares <= 0 && fit.residualSumSquares > 0) fit = next;
      break;
    }
    const f = (fit.residualSumSquares - next.residualSumSquares) / (next.residualSumSquares / df);
    if (!(f > tCritical95(df) ** 2)) break;
    fit = next;
  }
  return fit;
}

function assertMonotonic(name: BranchName, fit: PolynomialFit, lo: number, hi: number): 1 | -1 {
  let sign = 0;
  for (let i = 0; i <= MONOTONIC_SAMPLES; i++) {
    const d = evaluateDerivative(fit, lo + ((hi - lo) * i) / MONOTONIC_SAMPLES);
    const s = d > 0 ? 1 : d < 0 ? -1 : 0;
    if (s === 0 || (sign !== 0 && s !== sign))
      throw new LineariseError(
        'not_monotonic',
        `The ${name === 'all' ? '' : `${name}-sweep `}curve turns back within the driven range, so it cannot be inverted; try a lower degree.`,
      );
    sign = s;
  }
  return sign as 1 | -1;
}

/** The voltage in [lo, hi] where the monotonic branch reaches `target` (bisection). */
export function invertBranch(fit: PolynomialFit, lo: number, hi: number, target: number): number {
  const rising = evaluatePolynomial(fit, hi) > evaluatePolynomial(fit, lo);
  let a = lo;
  let b = hi;
  for (let i = 0; i < 200 && b - a > 1e-12 * (hi - lo); i++) {
    const mid = (a + b) / 2;
    const below = evaluatePolynomial(fit, mid) < target;
    if (below === rising) a = mid;
    else b = mid;
  }
  // A root within 1e-9 of the range from an end is that end (bisection leaves ~1e-11 V crumbs otherwise).
  const v = (a + b) / 2;
  const tol = 1e-9 * (hi - lo);
  return Math.abs(v - lo) < tol ? lo : Math.abs(hi - v) < tol ? hi : v;
}

/** Polynomial per branch, the inverse table and the nonlinearity before and after. */
export function linearise(input: LineariseInput): LineariseResult {
  const pts = input.points.map((p) => ({
    v: toVolts(p.volts, input.voltageUnit),
    x: toNm(p.displacement, input.displacementUnit),
    sweep: p.sweep,
  }));
  const labelled = pts.some((p) => p.sweep);
  const groups: Array<[BranchName, typeof pts]> = labelled
    ? (['up', 'down'] as const)
        .map((s) => [s, pts.filter((p) => p.sweep === s)] as [BranchName, typeof pts])
        .filter(([, g]) => g.length > 0)
    : [['all', pts]];
  const fits: Array<{ name: BranchName; fit: PolynomialFit; lo: number; hi: number; xLo: number; xHi: number }> = [];
  for (const [name, g] of groups) {
    if (g.length < 3) throw new LineariseError('too_few_points', `The ${name}-sweep has ${g.length} points; a branch needs at least 3.`);
    const v = g.map((p) => p.v);
    const x = g.map((p) => p.x);
    const fit = input.degree === 'auto' ? chooseDegree(v, x) : fitPolynomial(v, x, Math.min(input.degree, g.length - 2));
    const lo = Math.min(...v);
    const hi = Math.max(...v);
    assertMonotonic(name, fit, lo, hi);
    const ends = [evaluatePolynomial(fit, lo), evaluatePolynomial(fit, hi)];
    fits.push({ name, fit, lo, hi, xLo: Math.min(...ends), xHi: Math.max(...ends) });
  }
  const from = Math.max(...fits.map((f) => f.xLo));
  const to = Math.min(...fits.map((f) => f.xHi));
  if (!(to > from)) throw new LineariseError('no_common_range', 'The up and down sweeps reach no common range of positions.');
  const step = input.stepNm ?? (to - from) / 20;
  const rows = Math.floor((to - from) / step + 1e-9) + 1;
  if (rows > MAX_TABLE_ROWS)
    throw new LineariseError('table_too_long', `A step of ${step} nm gives ${rows} rows; at most ${MAX_TABLE_ROWS}. Choose a larger step.`);
  const table: TableRow[] = Array.from({ length: rows }, (_, i) => {
    const targetNm = from + i * step;
    const row: TableRow = { targetNm };
    for (const f of fits) {
      const volts = invertBranch(f.fit, f.lo, f.hi, targetNm);
      if (f.name === 'up') row.voltsUp = volts;
      else if (f.name === 'down') row.voltsDown = volts;
      else row.volts = volts;
    }
    return row;
  });
  const used = labelled ? pts.filter((p) => p.sweep) : pts;
  const xs = used.map((p) => p.x);
  const spanNm = Math.max(...xs) - Math.min(...xs);
  let worst = 0;
  for (const p of used) {
    const f = fits.find((b) => b.name === (labelled ? p.sweep : 'all'))!;
    worst = Math.max(worst, Math.abs(p.x - evaluatePolynomial(f.fit, p.v)));
  }
  const before = fitCalibrationInUnits({
    points: input.points,
    voltageUnit: input.voltageUnit,
    displacementUnit: input.displacementUnit,
    model: 'intercept',
  });
  return {
    branches: Object.fromEntries(
      fits.map((f) => [
        f.name,
        {
          degree: f.fit.degree,
          n: f.fit.n,
          coefficients: f.fit.coefficients,
          coefficientStdErr: f.fit.coefficientStdErr,
          residualStdNm: f.fit.residualStd,
          r2: f.fit.r2,
          voltsRangeV: [f.lo, f.hi],
        },
      ]),
    ),
    table,
    nonlinearityPctBefore: before.nonlinearityPctFs,
    residualNonlinearityPctAfter: spanNm > 0 ? (worst / spanNm) * 100 : 0,
    spanNm,
    unlabelledLeftOut: labelled ? pts.length - used.length : 0,
  };
}
