// The lattice's peaks found again in each quadrant of the image, for the ± of the lattice figures
// (lattice-figures.ts). Each quarter is levelled, windowed and transformed on its own (lattice-spectrum.ts);
// the whole image's reciprocal vectors say where each peak must be (a vector in cycles per pixel is the same in
// any part of the image), so each is the largest magnitude within two unpadded bins of that place, refined by
// the same Gaussian interpolation. A quarter whose peak stands less than NO_PERIODICITY_RATIO × its ring's
// median, or whose largest value sits at the search window's edge, gives no estimate.
import { MIN_IMAGE_SIDE, NO_PERIODICITY_RATIO } from './lattice-limits.ts';
import type { ImageVector } from './lattice-map.ts';
import { imageSpectrum, maximumNear, refinePeak, ringMedian, type BinPeak } from './lattice-spectrum.ts';

/** Rows of a quarter of the image: rows [r0, r0 + h), columns [c0, c0 + w). */
function quarter(heights: readonly ArrayLike<number>[], r0: number, c0: number, w: number, h: number): ArrayLike<number>[] {
  const rows: ArrayLike<number>[] = [];
  for (let r = r0; r < r0 + h; r++) {
    const row = heights[r]!;
    rows.push(
      ArrayBuffer.isView(row) ? (row as unknown as Float64Array).subarray(c0, c0 + w) : Array.prototype.slice.call(row, c0, c0 + w),
    );
  }
  return rows;
}

/**
 * The vectors `peaks` (cycles/px, found on the whole nx × ny image) measured again in each of its four
 * quarters; quarters where any peak is not found are left out. Empty when a quarter would be smaller than
 * the analysis accepts.
 */
export function quadrantPeaks(
  heights: readonly ArrayLike<number>[],
  nx: number,
  ny: number,
  peaks: readonly ImageVector[],
): ImageVector[][] {
  const w = Math.floor(nx / 2);
  const h = Math.floor(ny / 2);
  if (w < MIN_IMAGE_SIDE || h < MIN_IMAGE_SIDE) return [];
  const found: ImageVector[][] = [];
  for (const [r0, c0] of [
    [0, 0],
    [0, w],
    [h, 0],
    [h, w],
  ] as const) {
    const s = imageSpectrum(quarter(heights, r0, c0, w, h), w, h);
    const raw: BinPeak[] = [];
    for (const k of peaks) {
      const p = maximumNear(s, k.kx * s.P, k.ky * s.P, 2 * Math.max(s.binX, s.binY));
      if (!p) break;
      raw.push(p);
    }
    if (raw.length !== peaks.length) continue;
    if (raw.some((p) => !(p.m >= NO_PERIODICITY_RATIO * ringMedian(s, p, raw)))) continue;
    found.push(
      raw.map((p, i) => {
        const q = refinePeak(p, s.at);
        // Same sign as the whole image's vector (the half-plane search may have mirrored it).
        const sign = q.u * peaks[i]!.kx + q.v * peaks[i]!.ky < 0 ? -1 : 1;
        return { kx: (sign * q.u) / s.P, ky: (sign * q.v) / s.P };
      }),
    );
  }
  return found;
}
