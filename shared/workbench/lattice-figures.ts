// The lattice figures (nm per pixel, skew, rotation, gains) and their standard uncertainties, from the measured
// reciprocal vectors of the whole image and of its quarters (lattice-quadrants.ts). The page, the API and a
// stored lattice run all compute them here, so a run holds what the page showed.
// Uncertainty (k = 1), two components combined in quadrature [S: JCGM 100:2008 (GUM) 5.1.2]:
// - Type A: each figure is also computed from each quarter's vectors; its scatter gives the experimental
//   standard deviation of the mean of those n estimates, s/√n [S: GUM 4.2.2–4.2.3]. Given only when at least
//   three quarters gave an estimate. For white noise alone this is about twice the whole image's own scatter —
//   a quarter has half the periods along each axis and a quarter of the pixels, and the Cramér–Rao bound of a
//   frequency estimate scales as 1/(periods × √pixels) [S: Rife & Boorstyn, IEEE Trans. Inf. Theory 20, 591
//   (1974)], so four quarters average to 2× — and it also holds what makes one part of a scan differ from
//   another (drift, creep), which the whole image's peak cannot show. Cautious on purpose.
// - Type B: Gaussian interpolation on a Hann-windowed spectrum is biased by up to GAUSSIAN_BIAS_BINS of a bin
//   on each axis, depending on where the peak falls between bins [calc: a Hann-windowed cosine evaluated at
//   offsets −0.5…0.5 bin, the largest error of the three-point Gaussian estimate; cf. Gasior & Gonzalez 2004,
//   who show the same order]. Taken as rectangular, u = bias/√3 on each vector component [S: GUM 4.3.7], carried
//   to each figure by the law of propagation with central-difference derivatives [S: GUM 5.1.2, 5.1.3].
import { lineGratingScale, solveLatticeMap, wrapDeg, type ImageVector, type LatticeMap, type Mat } from './lattice-map.ts';
import type { LatticeKind } from './lattice-limits.ts';

/** Lines within this angle of an axis let a grating's scale stand for that axis's gain [practice]. */
const AXIS_ALIGNED_DEG = 5;
/** Fewest quarters whose scatter gives a ± (two would give one degree of freedom) [practice]. */
export const MIN_QUADRANTS = 3;

export interface LatticeFiguresInput {
  lattice: { kind: LatticeKind; constantNm: number };
  width: number;
  height: number;
  /** Two vectors (hexagonal, square) or one (line), cycles per pixel. */
  peaks: readonly ImageVector[];
  quadrantPeaks: readonly (readonly ImageVector[])[];
  scanSpanV?: { x: number; y: number } | undefined;
}

/** Standard uncertainties (k = 1) of the figures, each where the figure exists. */
export interface LatticeUncertainty {
  quadrants: number;
  nmPerPixel: { x: number; y: number } | null;
  skewDeg: number | null;
  rotationDeg: number;
  alongNormalNmPerPixel: number | null;
  gainNmPerV: { x: number | null; y: number | null } | null;
  crossCouplingNmPerV: number | null;
}

export interface LatticeFigures {
  nmPerPixel: { x: number; y: number } | null;
  skewDeg: number | null;
  rotationDeg: number;
  pixelToNm: Mat | null;
  alongNormal: { nmPerPixel: number; angleDeg: number } | null;
  gainNmPerV?: { x: number | null; y: number | null };
  /** G = A·diag(Nx/Vx, Ny/Vy) nm/V; [0][1] is the y drive's motion along x (cross-coupling). */
  gainMatrixNmPerV?: Mat;
  /** null when fewer than MIN_QUADRANTS quarters gave an estimate. */
  standardUncertainty: LatticeUncertainty | null;
}

interface OneEstimate {
  map: LatticeMap | null;
  line: ReturnType<typeof lineGratingScale> | null;
}

function estimate(lattice: LatticeFiguresInput['lattice'], peaks: readonly ImageVector[]): OneEstimate {
  if (lattice.kind === 'line') return { map: null, line: lineGratingScale(peaks[0]!, lattice.constantNm) };
  return { map: solveLatticeMap(peaks[0]!, peaks[1]!, { kind: lattice.kind, constantNm: lattice.constantNm }), line: null };
}

/** G = A·diag(Nx/Vx, Ny/Vy): the span over the image's N pixels is V/N per pixel [calc]. */
function gainMatrix(A: Mat, width: number, height: number, span: { x: number; y: number }): Mat {
  const fx = width / span.x;
  const fy = height / span.y;
  return [
    [A[0][0] * fx, A[0][1] * fy],
    [A[1][0] * fx, A[1][1] * fy],
  ];
}

/** Gains per axis: the columns' lengths of G; a line grating gives the axis its normal lies along, if any. */
function gains(e: OneEstimate, input: LatticeFiguresInput): { x: number | null; y: number | null } | undefined {
  const span = input.scanSpanV;
  if (!span) return undefined;
  if (e.map) {
    const G = gainMatrix(e.map.pixelToNm, input.width, input.height, span);
    return { x: Math.hypot(G[0][0], G[1][0]), y: Math.hypot(G[0][1], G[1][1]) };
  }
  const n = e.line!.angleDeg;
  const alongX = Math.abs(n) <= AXIS_ALIGNED_DEG || Math.abs(Math.abs(n) - 180) <= AXIS_ALIGNED_DEG;
  const alongY = Math.abs(Math.abs(n) - 90) <= AXIS_ALIGNED_DEG;
  return {
    x: alongX ? (e.line!.nmPerPixel * input.width) / span.x : null,
    y: alongY ? (e.line!.nmPerPixel * input.height) / span.y : null,
  };
}

/** Largest bias of the three-point Gaussian interpolation on a Hann window, in bins (see the header) [calc]. */
export const GAUSSIAN_BIAS_BINS = 0.016;

/** Every scalar figure of one estimate, by name (those the estimate has). */
type Scalars = Partial<Record<'nmx' | 'nmy' | 'skew' | 'rotation' | 'along' | 'gx' | 'gy' | 'cross', number>>;

function scalars(e: OneEstimate, input: LatticeFiguresInput): Scalars {
  const g = gains(e, input);
  const out: Scalars = { rotation: e.map?.rotationDeg ?? e.line!.rotationDeg };
  if (e.map) {
    out.nmx = e.map.nmPerPixel.x;
    out.nmy = e.map.nmPerPixel.y;
    out.skew = e.map.skewDeg;
    if (input.scanSpanV) out.cross = gainMatrix(e.map.pixelToNm, input.width, input.height, input.scanSpanV)[0][1];
  }
  if (e.line) out.along = e.line.nmPerPixel;
  if (g?.x != null) out.gx = g.x;
  if (g?.y != null) out.gy = g.y;
  return out;
}

/** s/√n of values around their mean (GUM 4.2.3). */
function meanStdUncertainty(values: readonly number[]): number {
  const n = values.length;
  const mean = values.reduce((a, b) => a + b, 0) / n;
  const s2 = values.reduce((a, b) => a + (b - mean) ** 2, 0) / (n - 1);
  return Math.sqrt(s2 / n);
}

/** The figures of the whole image with their ± (Type A from its quarters, Type B from the interpolation). */
export function latticeFigures(input: LatticeFiguresInput): LatticeFigures {
  const whole = estimate(input.lattice, input.peaks);
  const g = gains(whole, input);
  const G = whole.map && input.scanSpanV ? gainMatrix(whole.map.pixelToNm, input.width, input.height, input.scanSpanV) : undefined;
  const figures: LatticeFigures = {
    nmPerPixel: whole.map?.nmPerPixel ?? null,
    skewDeg: whole.map?.skewDeg ?? null,
    rotationDeg: whole.map?.rotationDeg ?? whole.line!.rotationDeg,
    pixelToNm: whole.map?.pixelToNm ?? null,
    alongNormal: whole.line ? { nmPerPixel: whole.line.nmPerPixel, angleDeg: whole.line.angleDeg } : null,
    ...(g ? { gainNmPerV: g } : {}),
    ...(G ? { gainMatrixNmPerV: G } : {}),
    standardUncertainty: null,
  };
  if (input.quadrantPeaks.length < MIN_QUADRANTS) return figures;

  const centre = scalars(whole, input);
  const symmetry = input.lattice.kind === 'hexagonal' ? 60 : input.lattice.kind === 'square' ? 90 : 180;
  // Angles as offsets from the whole image's, so a figure near the wrap point does not split [calc].
  const offset = (name: keyof Scalars, v: number) => (name === 'rotation' ? wrapDeg(v - centre.rotation!, symmetry) : v);
  const parts = input.quadrantPeaks.map((q) => scalars(estimate(input.lattice, q), input));
  const typeA = (name: keyof Scalars): number | null =>
    parts.every((p) => p[name] !== undefined) ? meanStdUncertainty(parts.map((p) => offset(name, p[name]!))) : null;

  // Type B: each vector component moved by ±h, the figure's change over 2h times u_B, summed in quadrature.
  // Bins of the whole image's spectrum are 1/P cycles per pixel, P the padded side [calc].
  let P = 4;
  while (P < Math.max(input.width, input.height)) P *= 2;
  const uB = GAUSSIAN_BIAS_BINS / Math.sqrt(3) / P;
  const h = uB;
  const moved: Scalars[][] = [];
  input.peaks.forEach((_, i) =>
    (['kx', 'ky'] as const).forEach((c) => {
      const shift = (d: number) => input.peaks.map((k, j) => (j === i ? { ...k, [c]: k[c] + d } : k));
      moved.push([scalars(estimate(input.lattice, shift(h)), input), scalars(estimate(input.lattice, shift(-h)), input)]);
    }),
  );
  const typeB = (name: keyof Scalars): number =>
    Math.sqrt(moved.reduce((acc, [up, down]) => acc + (((offset(name, up[name]!) - offset(name, down[name]!)) / (2 * h)) * uB) ** 2, 0));

  const u = (name: keyof Scalars): number | null => {
    if (centre[name] === undefined) return null;
    const a = typeA(name);
    return a === null ? null : Math.hypot(a, typeB(name));
  };
  figures.standardUncertainty = {
    quadrants: parts.length,
    nmPerPixel: whole.map ? { x: u('nmx')!, y: u('nmy')! } : null,
    skewDeg: u('skew'),
    rotationDeg: u('rotation')!,
    alongNormalNmPerPixel: u('along'),
    gainNmPerV: g ? { x: u('gx'), y: u('gy') } : null,
    crossCouplingNmPerV: u('cross'),
  };
  return figures;
}
