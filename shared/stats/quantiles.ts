// Order statistics for pooled part figures.
//
// Quantiles use Hyndman & Fan (1996) definition 7 — linear interpolation between order
// statistics at h = (n − 1)·p — the default of R's quantile() and NumPy's percentile()
// [S: R. J. Hyndman & Y. Fan, "Sample quantiles in statistical packages", The American
// Statistician 50(4), 361–365 (1996)].

/** Quantile p ∈ [0, 1] of already sorted values (Hyndman–Fan type 7); null for no values. */
export function quantileSorted(sorted: readonly number[], p: number): number | null {
  const n = sorted.length;
  if (n === 0) return null;
  if (!(p >= 0 && p <= 1)) throw new RangeError('p must lie in [0, 1]');
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(lo + 1, n - 1);
  return sorted[lo]! + (h - lo) * (sorted[hi]! - sorted[lo]!);
}

/** Median, quartiles and extremes of a sample of gains (or anything else). */
export interface Summary {
  n: number;
  min: number | null;
  p25: number | null;
  median: number | null;
  p75: number | null;
  max: number | null;
}

/** Five-number summary with type-7 quartiles; finite values only. */
export function summarize(values: readonly number[]): Summary {
  const sorted = values
    .filter(Number.isFinite)
    .slice()
    .sort((a, b) => a - b);
  return {
    n: sorted.length,
    min: sorted[0] ?? null,
    p25: quantileSorted(sorted, 0.25),
    median: quantileSorted(sorted, 0.5),
    p75: quantileSorted(sorted, 0.75),
    max: sorted.length ? sorted[sorted.length - 1]! : null,
  };
}
