// The image redrawn on a square nanometre grid through the solved pixel → nm map A (lattice-map.ts), so a
// lattice seen through a skewed, anisotropic scanner looks as it is, with the ideal lattice's sites to lay
// over it. Resampling is bilinear interpolation of the four neighbouring pixels [S: Press et al., Numerical
// Recipes, 3rd ed., §3.6.1, "bilinear interpolation"]; points outside the scanned parallelogram are NaN.
import { inverse, type Mat } from './lattice-map.ts';

export interface CorrectedImage {
  width: number;
  height: number;
  /** Side of one output pixel, nm (the same along x and y). */
  nmPerPixel: number;
  /** nm coordinates of output pixel (0, 0). */
  originNm: { x: number; y: number };
  /** Row-major heights; NaN outside the scanned area. */
  data: Float32Array;
}

/** The image on a square nm grid of at most `maxSide` pixels a side. */
export function correctedImage(rows: readonly ArrayLike<number>[], A: Mat, maxSide = 512): CorrectedImage {
  const ny = rows.length;
  const nx = rows[0]?.length ?? 0;
  // The scanned area's corners in nm, and their bounding box.
  const corners = [
    [0, 0],
    [nx - 1, 0],
    [0, ny - 1],
    [nx - 1, ny - 1],
  ].map(([c, r]) => ({ x: A[0][0] * c! + A[0][1] * r!, y: A[1][0] * c! + A[1][1] * r! }));
  const x0 = Math.min(...corners.map((p) => p.x));
  const x1 = Math.max(...corners.map((p) => p.x));
  const y0 = Math.min(...corners.map((p) => p.y));
  const y1 = Math.max(...corners.map((p) => p.y));
  // Keep the finer of the two scales unless that exceeds maxSide.
  const step = Math.max(Math.min(Math.hypot(A[0][0], A[1][0]), Math.hypot(A[0][1], A[1][1])), Math.max(x1 - x0, y1 - y0) / (maxSide - 1));
  const width = Math.floor((x1 - x0) / step) + 1;
  const height = Math.floor((y1 - y0) / step) + 1;
  const inv = inverse(A);
  const data = new Float32Array(width * height);
  for (let j = 0; j < height; j++)
    for (let i = 0; i < width; i++) {
      const x = x0 + i * step;
      const y = y0 + j * step;
      const c = inv[0][0] * x + inv[0][1] * y;
      const r = inv[1][0] * x + inv[1][1] * y;
      data[j * width + i] = c < 0 || r < 0 || c > nx - 1 || r > ny - 1 ? Number.NaN : bilinear(rows, c, r, nx, ny);
    }
  return { width, height, nmPerPixel: step, originNm: { x: x0, y: y0 }, data };
}

function bilinear(rows: readonly ArrayLike<number>[], c: number, r: number, nx: number, ny: number): number {
  const c0 = Math.min(Math.floor(c), nx - 2);
  const r0 = Math.min(Math.floor(r), ny - 2);
  const fc = c - c0;
  const fr = r - r0;
  const a = rows[r0]!;
  const b = rows[r0 + 1]!;
  return (a[c0]! * (1 - fc) + a[c0 + 1]! * fc) * (1 - fr) + (b[c0]! * (1 - fc) + b[c0 + 1]! * fc) * fr;
}

/**
 * Sites of the ideal lattice (hexagonal or square, constant a, a lattice vector at `rotationDeg` from x) over the
 * corrected image, in its pixel coordinates, through the highest point within one cell of the image's centre
 * (an atom, on an STM image of graphite); at most `max` sites.
 */
export function latticeSites(
  img: CorrectedImage,
  lattice: { kind: 'hexagonal' | 'square'; constantNm: number },
  rotationDeg: number,
  max = 20_000,
): { x: number; y: number }[] {
  const a = lattice.constantNm / img.nmPerPixel;
  const t = (rotationDeg * Math.PI) / 180;
  const t2 = t + ((lattice.kind === 'hexagonal' ? 60 : 90) * Math.PI) / 180;
  const a1 = { x: a * Math.cos(t), y: a * Math.sin(t) };
  const a2 = { x: a * Math.cos(t2), y: a * Math.sin(t2) };
  // Anchor: the highest defined point within a cell's reach of the centre.
  const cx = img.width / 2;
  const cy = img.height / 2;
  let anchor = { x: cx, y: cy };
  let best = -Infinity;
  const reach = Math.ceil(a);
  for (let y = Math.max(0, Math.floor(cy - reach)); y <= Math.min(img.height - 1, cy + reach); y++)
    for (let x = Math.max(0, Math.floor(cx - reach)); x <= Math.min(img.width - 1, cx + reach); x++) {
      const v = img.data[y * img.width + x]!;
      if (v > best) {
        best = v;
        anchor = { x, y };
      }
    }
  const sites: { x: number; y: number }[] = [];
  const n = Math.ceil(Math.hypot(img.width, img.height) / Math.max(1e-9, a * (lattice.kind === 'hexagonal' ? Math.sqrt(3) / 2 : 1))) + 1;
  for (let i = -n; i <= n; i++)
    for (let j = -n; j <= n; j++) {
      const x = anchor.x + i * a1.x + j * a2.x;
      const y = anchor.y + i * a1.y + j * a2.y;
      if (x < 0 || y < 0 || x >= img.width || y >= img.height) continue;
      if (Number.isNaN(img.data[Math.floor(y) * img.width + Math.floor(x)]!)) continue;
      sites.push({ x, y });
      if (sites.length >= max) return sites;
    }
  return sites;
}
