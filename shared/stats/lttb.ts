// Largest-Triangle-Three-Buckets downsampling for plots [S: S. Steinarsson, "Downsampling Time Series
// for Visual Representation", MSc thesis, University of Iceland, 2013, §4.2 (LTTB)]: keep the first and
// last points; split the rest into threshold − 2 buckets of (nearly) equal size; from each bucket keep
// the point forming the largest triangle with the point kept in the previous bucket and the average of
// the next bucket. The x of a point is its position in the record (the order it was measured in), so
// a calibration loop or a sine record decimates along its own course.

/** Indices (ascending) of the points LTTB keeps out of `n`, judged on the series `y`; all indices when n ≤ threshold. */
export function lttbIndices(y: ArrayLike<number>, threshold: number): number[] {
  const n = y.length;
  if (threshold >= n || threshold < 3) return Array.from({ length: threshold < 3 ? Math.min(n, Math.max(0, threshold)) : n }, (_, i) => i);
  const kept: number[] = [0];
  const every = (n - 2) / (threshold - 2);
  let a = 0;
  for (let i = 0; i < threshold - 2; i++) {
    // Average of the next bucket (the last bucket's "next" is the final point).
    const nextStart = Math.floor((i + 1) * every) + 1;
    const nextEnd = Math.min(Math.floor((i + 2) * every) + 1, n);
    let avgX = 0;
    let avgY = 0;
    const nextLen = nextEnd - nextStart;
    if (nextLen > 0) {
      for (let j = nextStart; j < nextEnd; j++) {
        avgX += j;
        avgY += y[j]!;
      }
      avgX /= nextLen;
      avgY /= nextLen;
    } else {
      avgX = n - 1;
      avgY = y[n - 1]!;
    }
    const start = Math.floor(i * every) + 1;
    const end = Math.floor((i + 1) * every) + 1;
    const ax = a;
    const ay = y[a]!;
    let best = start;
    let bestArea = -1;
    for (let j = start; j < end; j++) {
      // Twice the triangle's area; the factor does not change which point wins.
      const area = Math.abs((ax - avgX) * (y[j]! - ay) - (ax - j) * (avgY - ay));
      if (area > bestArea) {
        bestArea = area;
        best = j;
      }
    }
    kept.push(best);
    a = best;
  }
  kept.push(n - 1);
  return kept;
}

/** The points LTTB keeps (at most `threshold`), judged on `valueOf`; the input itself when it is short enough. */
export function lttb<T>(points: readonly T[], threshold: number, valueOf: (p: T) => number): T[] {
  if (points.length <= threshold) return points.slice();
  const ys = new Float64Array(points.length);
  for (let i = 0; i < points.length; i++) ys[i] = valueOf(points[i]!);
  return lttbIndices(ys, threshold).map((i) => points[i]!);
}
