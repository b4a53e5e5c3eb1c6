// Straight-line least squares on columns of numbers, shared by the gain fit and the creep fit.
//
// With intercept, y = a + b·x: b = Sxy/Sxx, a = ȳ − b·x̄, s = √(SSE/(n−2)), se(b) = s/√Sxx,
// se(a) = s·√(1/n + x̄²/Sxx), R² = 1 − SSE/Σ(y−ȳ)². Through the origin, y = b·x: b = Σxy/Σx²,
// s = √(SSE/(n−1)), se(b) = s/√Σx², R² uncentred = 1 − SSE/Σy² (NIST's convention for
// no-intercept models) [S: NIST/ITL Statistical Reference Datasets, linear regression; FIELD.md
// "Calibration fit"]. Sums are centred and two-pass, with the correction term of the corrected
// two-pass algorithm (Chan, Golub & LeVeque, Amer. Statistician 37 (1983) 242) [memory];
// SSE is summed from the residuals, never formed as Syy − b·Sxy.

/** Which straight line is fitted: with a free intercept, or forced through the origin. */
export type FitModel = 'intercept' | 'origin';

/** Everything a straight-line fit yields, in the units of the columns it was given. */
export interface LineFit {
  n: number;
  df: number;
  slope: number;
  slopeStdErr: number;
  intercept: number;
  interceptStdErr: number | null;
  residualSumSquares: number;
  residualStd: number;
  r2: number | null;
  xMin: number;
  xMax: number;
}

/**
 * Fits y on x over the first n entries; callers validate (n ≥ 3, finite, x not all equal) first,
 * so this loop stays branch-free and allocation-free for million-point records.
 */
export function fitLineColumns(x: Float64Array, y: Float64Array, n: number, model: FitModel, residualsOut?: Float64Array): LineFit {
  let sumX = 0;
  let sumY = 0;
  let xMin = Infinity;
  let xMax = -Infinity;
  for (let i = 0; i < n; i++) {
    const xi = x[i];
    sumX += xi;
    sumY += y[i];
    if (xi < xMin) xMin = xi;
    if (xi > xMax) xMax = xi;
  }
  return model === 'intercept'
    ? fitWithIntercept(x, y, n, sumX / n, sumY / n, xMin, xMax, residualsOut)
    : fitThroughOrigin(x, y, n, xMin, xMax, residualsOut);
}

function fitWithIntercept(
  x: Float64Array,
  y: Float64Array,
  n: number,
  meanX: number,
  meanY: number,
  xMin: number,
  xMax: number,
  residualsOut?: Float64Array,
): LineFit {
  let sdx = 0;
  let sdy = 0;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i] - meanX;
    const dy = y[i] - meanY;
    sdx += dx;
    sdy += dy;
    sxx += dx * dx;
    sxy += dx * dy;
    syy += dy * dy;
  }
  sxx -= (sdx * sdx) / n;
  sxy -= (sdx * sdy) / n;
  syy -= (sdy * sdy) / n;
  const slope = sxy / sxx;
  // Shift the means by the mean deviations so the line passes through the exact centroid.
  const cx = meanX + sdx / n;
  const cy = meanY + sdy / n;
  const intercept = cy - slope * cx;
  let sse = 0;
  for (let i = 0; i < n; i++) {
    const r = y[i] - cy - slope * (x[i] - cx);
    sse += r * r;
    if (residualsOut) residualsOut[i] = r;
  }
  const df = n - 2;
  const s = Math.sqrt(sse / df);
  return {
    n,
    df,
    slope,
    slopeStdErr: s / Math.sqrt(sxx),
    intercept,
    interceptStdErr: s * Math.sqrt(1 / n + (cx * cx) / sxx),
    residualSumSquares: sse,
    residualStd: s,
    r2: syy > 0 ? 1 - sse / syy : null,
    xMin,
    xMax,
  };
}

function fitThroughOrigin(x: Float64Array, y: Float64Array, n: number, xMin: number, xMax: number, residualsOut?: Float64Array): LineFit {
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const xi = x[i];
    const yi = y[i];
    sxx += xi * xi;
    sxy += xi * yi;
    syy += yi * yi;
  }
  const slope = sxy / sxx;
  let sse = 0;
  for (let i = 0; i < n; i++) {
    const r = y[i] - slope * x[i];
    sse += r * r;
    if (residualsOut) residualsOut[i] = r;
  }
  const df = n - 1;
  const s = Math.sqrt(sse / df);
  return {
    n,
    df,
    slope,
    slopeStdErr: s / Math.sqrt(sxx),
    intercept: 0,
    interceptStdErr: null,
    residualSumSquares: sse,
    residualStd: s,
    r2: syy > 0 ? 1 - sse / syy : null,
    xMin,
    xMax,
  };
}
