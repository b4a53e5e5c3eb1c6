// Solves the small symmetric normal equations of the sine fit (3×3, 4×4): the matrix is scaled to a
// unit diagonal (Jacobi scaling) and factored by Cholesky, which is stable for a symmetric positive
// definite matrix [memory: Golub & Van Loan, Matrix Computations, ch. 4]; the inverse (for the
// covariance of the estimates) comes from the same factor.

/** Below this pivot (of the unit-diagonal matrix) the columns are taken as dependent [practice]. */
const MIN_PIVOT = 1e-12;

/**
 * x with M·x = r for a symmetric positive definite M (row-major, p × p), and M⁻¹; null when M is
 * singular or not positive definite to working precision.
 */
export function solveNormal(m: Float64Array, r: Float64Array, p: number): { x: Float64Array; inverse: Float64Array } | null {
  const d = new Float64Array(p);
  for (let i = 0; i < p; i++) {
    const mii = m[i * p + i];
    if (!(mii > 0) || !Number.isFinite(mii)) return null;
    d[i] = 1 / Math.sqrt(mii);
  }
  // Cholesky factor L of D·M·D (lower triangle, row-major).
  const l = new Float64Array(p * p);
  for (let i = 0; i < p; i++) {
    for (let j = 0; j <= i; j++) {
      let sum = m[i * p + j] * d[i] * d[j];
      for (let k = 0; k < j; k++) sum -= l[i * p + k] * l[j * p + k];
      if (i === j) {
        if (!(sum > MIN_PIVOT)) return null;
        l[i * p + i] = Math.sqrt(sum);
      } else l[i * p + j] = sum / l[j * p + j];
    }
  }
  const solveScaled = (rhs: Float64Array): Float64Array => {
    const z = new Float64Array(p);
    for (let i = 0; i < p; i++) {
      let sum = rhs[i];
      for (let k = 0; k < i; k++) sum -= l[i * p + k] * z[k];
      z[i] = sum / l[i * p + i];
    }
    for (let i = p - 1; i >= 0; i--) {
      let sum = z[i];
      for (let k = i + 1; k < p; k++) sum -= l[k * p + i] * z[k];
      z[i] = sum / l[i * p + i];
    }
    return z;
  };
  const x = solveScaled(Float64Array.from(r, (v, i) => v * d[i]));
  for (let i = 0; i < p; i++) x[i] *= d[i];
  const inverse = new Float64Array(p * p);
  for (let j = 0; j < p; j++) {
    const e = new Float64Array(p);
    e[j] = 1;
    const col = solveScaled(e);
    for (let i = 0; i < p; i++) inverse[i * p + j] = col[i] * d[i] * d[j];
  }
  return { x, inverse };
}
