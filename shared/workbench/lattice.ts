// Lateral scale of a scanner read off an image of a lattice of known spacing (graphite 0.246 nm, a grating
// of stated pitch): the lattice's peaks in the image's 2-D spectrum are compared with the ideal lattice's.
// Steps, each with its source:
// 1. A least-squares plane z = a + b·x + c·y is removed. On a full rectangular grid with centred coordinates
//    the normal equations are diagonal, so a = mean z, b = Σ(x−x̄)z / Σ(x−x̄)², c likewise [calc: ordinary least
//    squares, orthogonal design].
// 2. A 2-D Hann window w(x)·w(y), w(n) = 0.5 − 0.5·cos(2πn/(N−1)), tames leakage from the image edges
//    [S: Harris, Proc. IEEE 66, 51 (1978)].
// 3. 2-D DFT as row FFTs then column FFTs (the DFT is separable), both sides zero-padded to one power of two
//    P ≥ the longer side, with fft.js (radix-4). A real image's spectrum is Hermitian, so only the half-plane
//    u ≥ 0 is computed and searched [calc].
// 4. Peaks: local maxima of |F| outside a disc round DC (2.5 cycles across the image: the Hann main lobe is
//    ±2 bins), suppressed within 2 unpadded bins of a stronger one; each is refined to sub-bin position by
//    Gaussian interpolation — a parabola through the log-magnitude of the three bins on each axis,
//    δ = (ln M₋ − ln M₊) / (2·(ln M₋ − 2 ln M₀ + ln M₊)) [S: Gasior & Gonzalez, "Improving FFT frequency
//    measurement resolution by parabolic and Gaussian spectrum interpolation", AIP Conf. Proc. 732, 276 (2004)].
//    The 2-D spectrum of a windowed plane wave is the product of the two 1-D window spectra, so the two axes
//    are refined separately [calc].
// 5. Strength: a peak's magnitude over the median magnitude in its ring (|k| ± 1.5 bins, the peaks' own
//    neighbourhoods left out) [practice]. Below NO_PERIODICITY_RATIO the image is refused; below
//    WEAK_PEAK_RATIO a warning.
// 6. The affine map A (nm per pixel) takes pixel coordinates p = (column, row) to nanometres, r = A·p, solved
//    from the measured reciprocal vectors (lattice-map.ts, where its sources are named).
// 7. Gains, G = A·diag(Nx/Vx, Ny/Vy) nm/V, and the ± of every figure from the image's quarters
//    (lattice-quadrants.ts, lattice-figures.ts).
// Steps 1–5 live in lattice-spectrum.ts.
import { LatticeError, NO_PERIODICITY_RATIO, type LatticeKind } from './lattice-limits.ts';
import { lineGratingScale, orderPair, solveLatticeMap, type ImageVector, type Mat } from './lattice-map.ts';
import { quadrantPeaks } from './lattice-quadrants.ts';
import { centredLogSpectrum, checkImage, imageSpectrum, refinePeak, ringMedian, strongestMaxima } from './lattice-spectrum.ts';

export { LatticeError, MIN_PERIODS, WEAK_PEAK_RATIO } from './lattice-limits.ts';
export type { LatticeKind } from './lattice-limits.ts';

const SQRT3 = Math.sqrt(3);

export interface LatticePeak extends ImageVector {
  magnitude: number;
  /** Period along the vector, pixels. */
  periodPx: number;
  /** Magnitude over the median of its ring. */
  strength: number;
}

export interface LatticeAnalysis {
  width: number;
  height: number;
  paddedSize: number;
  /** The chosen peaks: two for hexagonal and square lattices, one for a line grating. */
  peaks: LatticePeak[];
  /** The chosen peaks measured again in each quarter of the image where they were found (for the ±). */
  quadrantPeaks: ImageVector[][];
  /** Other strong peaks seen (for display), strongest first. */
  candidates: LatticePeak[];
  /** nm per pixel; null for a line grating, where x and y cannot both be found. */
  nmPerPixel: { x: number; y: number } | null;
  skewDeg: number | null;
  /** Angle of a lattice vector (hexagonal, square) or of the grating's lines from the x axis, degrees. */
  rotationDeg: number;
  /** A as [[a00, a01], [a10, a11]] nm per pixel; null for a line grating. */
  pixelToNm: Mat | null;
  /** Line grating: scale along the normal to its lines, and the normal's angle from x. */
  alongNormal: { nmPerPixel: number; angleDeg: number } | null;
  /** Fewest periods across the image along a chosen vector. */
  periodsAcross: number;
  /** Ratios that hint at the every-other-atom trap, if any. */
  sqrt3Hint: boolean;
}

export interface LatticeOptions {
  /** Also return the log-magnitude spectrum, centred, P × P, for display. */
  withSpectrum?: boolean;
}

/** Analyses a height image of a lattice of known kind and constant. */
export function analyseLattice(
  heights: readonly ArrayLike<number>[],
  lattice: { kind: LatticeKind; constantNm: number },
  options: LatticeOptions = {},
): LatticeAnalysis & { spectrum?: Float32Array } {
  const { nx, ny } = checkImage(heights);
  const s = imageSpectrum(heights, nx, ny);
  const P = s.P;
  const kept = strongestMaxima(s);
  if (kept.length === 0) throw new LatticeError('no_periodicity', 'The image shows no periodic pattern: its spectrum is flat.');

  const toPeak = (p: (typeof kept)[number]): LatticePeak => {
    const q = refinePeak(p, s.at);
    const kx = q.u / P;
    const ky = q.v / P;
    const bg = ringMedian(s, q, kept);
    return { kx, ky, magnitude: q.m, periodPx: 1 / Math.hypot(kx, ky), strength: bg > 0 ? q.m / bg : Number.MAX_VALUE };
  };
  const candidates = kept.map(toPeak);
  const first = candidates[0]!;
  if (!(first.strength >= NO_PERIODICITY_RATIO))
    throw new LatticeError(
      'no_periodicity',
      `The strongest peak in the spectrum is only ${first.strength.toFixed(1)} × its background (at least ${NO_PERIODICITY_RATIO} needed): no lattice found.`,
    );

  const spectrum = options.withSpectrum ? centredLogSpectrum(s) : undefined;
  const periodsAlong = (k: LatticePeak) => Math.abs(k.kx) * nx + Math.abs(k.ky) * ny;

  if (lattice.kind === 'line') {
    const line = lineGratingScale(first, lattice.constantNm);
    return {
      width: nx,
      height: ny,
      paddedSize: P,
      peaks: [first],
      quadrantPeaks: quadrantPeaks(heights, nx, ny, [first]),
      candidates,
      nmPerPixel: null,
      skewDeg: null,
      rotationDeg: line.rotationDeg,
      pixelToNm: null,
      alongNormal: { nmPerPixel: line.nmPerPixel, angleDeg: line.angleDeg },
      periodsAcross: periodsAlong(first),
      sqrt3Hint: false,
      ...(spectrum ? { spectrum } : {}),
    };
  }

  // Second vector: not collinear with the first (more than 15° off), preferring one of similar length.
  const len = (k: LatticePeak) => Math.hypot(k.kx, k.ky);
  const sinAngle = (a: LatticePeak, b: LatticePeak) => Math.abs(a.kx * b.ky - a.ky * b.kx) / (len(a) * len(b));
  const nonCollinear = candidates.slice(1).filter((c) => sinAngle(first, c) > Math.sin((15 * Math.PI) / 180));
  if (nonCollinear.length === 0)
    throw new LatticeError('no_periodicity', 'Only one direction of periodicity was found: for a line grating choose "line".');
  const similar = nonCollinear.filter((c) => len(c) / len(first) > 0.75 && len(c) / len(first) < 1.33);
  const second = similar.find((c) => c.strength >= NO_PERIODICITY_RATIO) ?? nonCollinear[0]!;
  const [k1, k2] = orderPair(first, second);
  const map = solveLatticeMap(k1, k2, { kind: lattice.kind, constantNm: lattice.constantNm });
  const { x: sx, y: sy } = map.nmPerPixel;

  const ratio = len(k2) / len(k1);
  const near = (x: number, target: number) => Math.abs(x / target - 1) < 0.08;
  const strongOthers = candidates.filter((p) => p.magnitude >= 0.3 * first.magnitude);
  const sqrt3Hint =
    lattice.kind === 'hexagonal' &&
    (near(ratio, SQRT3) ||
      near(ratio, 1 / SQRT3) ||
      strongOthers.some((p) => near(len(p) / len(first), SQRT3) || near(len(p) / len(first), 1 / SQRT3)) ||
      near(Math.max(sx, sy) / Math.min(sx, sy), SQRT3));

  return {
    width: nx,
    height: ny,
    paddedSize: P,
    peaks: [k1, k2],
    quadrantPeaks: quadrantPeaks(heights, nx, ny, [k1, k2]),
    candidates,
    nmPerPixel: map.nmPerPixel,
    skewDeg: map.skewDeg,
    rotationDeg: map.rotationDeg,
    pixelToNm: map.pixelToNm,
    alongNormal: null,
    periodsAcross: Math.min(periodsAlong(k1), periodsAlong(k2)),
    sqrt3Hint,
    ...(spectrum ? { spectrum } : {}),
  };
}
