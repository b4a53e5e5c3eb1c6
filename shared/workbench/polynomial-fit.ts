// Least-squares polynomial y = c0 + c1·x + … + cd·x^d, fitted in a numerically careful way:
// - x is centred and scaled to t = (x − m)/s with t in [−1, 1], so the Vandermonde columns stay well
//   conditioned; the least-squares problem A·b ≈ y is solved by Householder QR (never the normal
//   equations, which square the condition number) [S: Golub & Van Loan, Matrix Computations, §5.3
//   "the full-rank least squares problem" — memory for the section number; Björck, Numerical Methods
//   for Least Squares Problems, SIAM 1996, ch. 2];
// - the covariance of b is σ²·(RᵀR)⁻¹ with σ² = SSE/(n − p) [S: NIST/SEMATECH e-Handbook §4.4.4 —
//   memory for the section], and maps to the ascending coefficients in x by the exact linear change
//   of basis c = T·b, Cov(c) = T·Cov(b)·Tᵀ (binomial expansion of ((x − m)/s)^j) [calc].
// Checked against NIST StRD Pontius (quadratic, certified) and Wampler1 (degree 5, exact) in the tests.

/** Raised for a fit that cannot be made; `code` becomes the API's error code. */
export class PolynomialFitError extends RangeError {
  constructor(
    readonly code: 'too_few_points' | 'degenerate_x' | 'non_finite_value',
    message: string,
  ) {
    super(message);
  }
}

/** A fitted polynomial: ascending coefficients in x, their standard errors, and the fit's figures. */
export interface PolynomialFit {
  degree: number;
  n: number;
  coefficients: number[];
  coefficientStdErr: number[];
  residualStd: number;
  residualSumSquares: number;
  r2: number | null;
  /** Centre and scale used for the solve; `evaluate` uses them for accuracy. */
  centre: number;
  scale: number;
  /** Coefficients in t = (x − centre)/scale (ascending), the well-conditioned form to evaluate with. */
  scaledCoefficients: number[];
}

/** p(x) by Horner's rule in the scaled variable (more accurate than the ascending x coefficients far from 0). */
export function evaluatePolynomial(fit: Pick<PolynomialFit, 'centre' | 'scale' | 'scaledCoefficients'>, x: number): number {
  const t = (x - fit.centre) / fit.scale;
  let v = 0;
  for (let j = fit.scaledCoefficients.length - 1; j >= 0; j--) v = v * t + fit.scaledCoefficients[j]!;
  return v;
}

/** dp/dx at x. */
export function evaluateDerivative(fit: Pick<PolynomialFit, 'centre' | 'scale' | 'scaledCoefficients'>, x: number): number {
  const t = (x - fit.centre) / fit.scale;
  let v = 0;
  for (let j = fit.scaledCoefficients.length - 1; j >= 1; j--) v = v * t + j * fit.scaledCoefficients[j]!;
  return v / fit.scale;
}

function binomial(n: number, k: number): number {
  let r = 1;
  for (let i = 1; i <= k; i++) r = (r * (n - k + i)) / i;
  return r;
}

/** Householder QR least squares of the n × p matrix A (row-major, overwritten) against y; returns b, R and SSE. */
function qrSolve(a: Float64Array, y: Float64Array, n: number, p: number): { b: number[]; r: number[][]; sse: number } {
  const qty = Float64Array.from(y);
  for (let k = 0; k < p; k++) {
    let norm = 0;
    for (let i = k; i < n; i++) norm += a[i * p + k]! ** 2;
    norm = Math.sqrt(norm);
    if (norm === 0) throw new PolynomialFitError('degenerate_x', 'The voltages do not spread enough for a polynomial of this degree.');
    const alpha = a[k * p + k]! > 0 ? -norm : norm;
    // v = a_k − α·e_k, stored in place; H = I − 2vvᵀ/(vᵀv).
    a[k * p + k] = a[k * p + k]! - alpha;
    let vv = 0;
    for (let i = k; i < n; i++) vv += a[i * p + k]! ** 2;
    if (vv > 0) {
      for (let j = k + 1; j < p; j++) {
        let dot = 0;
        for (let i = k; i < n; i++) dot += a[i * p + k]! * a[i * p + j]!;
        const f = (2 * dot) / vv;
        for (let i = k; i < n; i++) a[i * p + j] = a[i * p + j]! - f * a[i * p + k]!;
      }
      let dot = 0;
      for (let i = k; i < n; i++) dot += a[i * p + k]! * qty[i]!;
      const f = (2 * dot) / vv;
      for (let i = k; i < n; i++) qty[i] = qty[i]! - f * a[i * p + k]!;
    }
    a[k * p + k] = alpha;
  }
  const r = Array.from({ length: p }, (_, i) => Array.from({ length: p }, (_, j) => (j >= i ? a[i * p + j]! : 0)));
  const b = new Array<number>(p).fill(0);
  for (let i = p - 1; i >= 0; i--) {
    let s = qty[i]!;
    for (let j = i + 1; j < p; j++) s -= r[i]![j]! * b[j]!;
    b[i] = s / r[i]![i]!;
  }
  let sse = 0;
  for (let i = p; i < n; i++) sse += qty[i]! ** 2;
  return { b, r, sse };
}

/** R⁻¹ of an upper-triangular R. */
function invertUpper(r: number[][]): number[][] {
  const p = r.length;
  const inv = Array.from({ length: p }, () => new Array<number>(p).fill(0));
  for (let j = 0; j < p; j++) {
    inv[j]![j] = 1 / r[j]![j]!;
    for (let i = j - 1; i >= 0; i--) {
      let s = 0;
      for (let k = i + 1; k <= j; k++) s += r[i]![k]! * inv[k]![j]!;
      inv[i]![j] = -s / r[i]![i]!;
    }
  }
  return inv;
}

/** Least-squares polynomial of the given degree through (x, y); needs at least degree + 2 points (one degree of freedom). */
export function fitPolynomial(x: readonly number[], y: readonly number[], degree: number): PolynomialFit {
  const n = x.length;
  const p = degree + 1;
  if (n !== y.length) throw new RangeError('x and y differ in length');
  if (n < p + 1)
    throw new PolynomialFitError('too_few_points', `A degree-${degree} polynomial needs at least ${p + 1} points; there are ${n}.`);
  for (let i = 0; i < n; i++)
    if (!Number.isFinite(x[i]) || !Number.isFinite(y[i]))
      throw new PolynomialFitError('non_finite_value', `Point ${i + 1} is not a finite number.`);
  let lo = Infinity;
  let hi = -Infinity;
  for (const v of x) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  const centre = (lo + hi) / 2;
  const scale = (hi - lo) / 2;
  if (!(scale > 0)) throw new PolynomialFitError('degenerate_x', 'All voltages are equal: nothing to fit a curve to.');
  const a = new Float64Array(n * p);
  for (let i = 0; i < n; i++) {
    const t = (x[i]! - centre) / scale;
    let pow = 1;
    for (let j = 0; j < p; j++) {
      a[i * p + j] = pow;
      pow *= t;
    }
  }
  const { b, r, sse } = qrSolve(a, Float64Array.from(y), n, p);
  const df = n - p;
  const sigma2 = sse / df;
  const rInv = invertUpper(r);
  // Cov(b) = σ²·R⁻¹R⁻ᵀ
  const covB = Array.from({ length: p }, (_, i) =>
    Array.from({ length: p }, (_, j) => {
      let s = 0;
      for (let k = Math.max(i, j); k < p; k++) s += rInv[i]![k]! * rInv[j]![k]!;
      return sigma2 * s;
    }),
  );
  // c_k = Σ_{j≥k} b_j · s^{−j} · C(j, k) · (−m)^{j−k}
  const t = Array.from({ length: p }, (_, k) =>
    Array.from({ length: p }, (_, j) => (j >= k ? (binomial(j, k) * (-centre) ** (j - k)) / scale ** j : 0)),
  );
  const coefficients = t.map((row) => row.reduce((s, tkj, j) => s + tkj * b[j]!, 0));
  const coefficientStdErr = t.map((row) => {
    let v = 0;
    for (let i = 0; i < p; i++) for (let j = 0; j < p; j++) v += row[i]! * covB[i]![j]! * row[j]!;
    return Math.sqrt(Math.max(0, v));
  });
  const mean = y.reduce((s, v) => s + v, 0) / n;
  const sst = y.reduce((s, v) => s + (v - mean) ** 2, 0);
  return {
    degree,
    n,
    coefficients,
    coefficientStdErr,
    residualStd: Math.sqrt(sigma2),
    residualSumSquares: sse,
    r2: sst > 0 ? 1 - sse / sst : null,
    centre,
    scale,
    scaledCoefficients: b,
  };
}
