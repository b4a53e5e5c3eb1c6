// Lateral scale from a lattice image: nm per pixel, skew, rotation, the peaks used, gains from the drive
// spans, warnings (weak peaks, few periods, the every-other-atom trap) and the cautions for the drive span.
import { latticeInput, type LatticeInput } from '../../schemas/lattice.ts';
import { analyseLattice, MIN_PERIODS, WEAK_PEAK_RATIO, type LatticeAnalysis } from '../lattice.ts';
import { assessSafety } from '../safety.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

/** Lines within this angle of an axis let a grating's scale stand for that axis's gain [practice]. */
const AXIS_ALIGNED_DEG = 5;

export function latticeWarnings(r: LatticeAnalysis, kind: string): ResultWarning[] {
  const warnings: ResultWarning[] = [];
  const weak = r.peaks.filter((p) => p.strength < WEAK_PEAK_RATIO);
  if (weak.length > 0)
    warnings.push({
      code: 'weak_peaks',
      message:
        `${weak.length === 1 ? 'A chosen peak stands' : 'The chosen peaks stand'} only ${weak.map((p) => p.strength.toFixed(1)).join(' and ')} × ` +
        `above the median of ${weak.length === 1 ? 'its' : 'their'} ring (below ${WEAK_PEAK_RATIO}): the lattice may be noise or an artefact.`,
    });
  if (r.periodsAcross < MIN_PERIODS)
    warnings.push({
      code: 'few_periods',
      message: `The image holds only ${r.periodsAcross.toFixed(1)} periods along a lattice vector (fewer than ${MIN_PERIODS}): the peaks are broad and the scale uncertain; image a larger area.`,
    });
  if (r.sqrt3Hint)
    warnings.push({
      code: 'every_other_atom',
      message:
        'Periods in a ratio near √3 are strong in this image: on graphite, the 0.246 nm lattice and the 0.142 nm bond differ by √3. ' +
        'Check which spacing you see before trusting the scale — a wrong pick mis-scales by √3.',
    });
  if (r.nmPerPixel) {
    const aniso = Math.max(r.nmPerPixel.x, r.nmPerPixel.y) / Math.min(r.nmPerPixel.x, r.nmPerPixel.y);
    if (aniso > 1.25)
      warnings.push({
        code: 'anisotropic_scale',
        message: `nm per pixel differs by ${aniso.toFixed(2)} × between x and y: check the scan's aspect ratio and that the peaks chosen belong to one ${kind} lattice.`,
      });
  }
  if (r.skewDeg !== null && Math.abs(r.skewDeg) > 10)
    warnings.push({
      code: 'large_skew',
      message: `The axes are ${Math.abs(r.skewDeg).toFixed(1)}° from orthogonal: check the lattice kind, or that the image is not drifting.`,
    });
  if (!r.nmPerPixel)
    warnings.push({
      code: 'line_one_axis',
      message:
        'A line grating has one period: only the scale along its normal is found, not x and y separately. Image it again turned by 90° for the other axis.',
    });
  return warnings;
}

/** The page's and the API's result from one analysis (the page's worker analyses once and calls this too). */
export function latticeResult(input: Pick<LatticeInput, 'lattice' | 'scanSpanV'>, r: LatticeAnalysis) {
  const warnings = latticeWarnings(r, input.lattice.kind);
  const span = input.scanSpanV;
  let gainNmPerV: { x: number | null; y: number | null } | undefined;
  let gainMatrixNmPerV: [[number, number], [number, number]] | undefined;
  if (span && r.pixelToNm) {
    // G = A·diag(Nx/Vx, Ny/Vy): the span over the image's N pixels is V/N per pixel [calc].
    const fx = r.width / span.x;
    const fy = r.height / span.y;
    const A = r.pixelToNm;
    gainMatrixNmPerV = [
      [A[0][0] * fx, A[0][1] * fy],
      [A[1][0] * fx, A[1][1] * fy],
    ];
    gainNmPerV = {
      x: Math.hypot(gainMatrixNmPerV[0][0], gainMatrixNmPerV[1][0]),
      y: Math.hypot(gainMatrixNmPerV[0][1], gainMatrixNmPerV[1][1]),
    };
  } else if (span && r.alongNormal) {
    const n = r.alongNormal.angleDeg;
    const alongX = Math.abs(n) <= AXIS_ALIGNED_DEG || Math.abs(Math.abs(n) - 180) <= AXIS_ALIGNED_DEG;
    const alongY = Math.abs(Math.abs(n) - 90) <= AXIS_ALIGNED_DEG;
    gainNmPerV = {
      x: alongX ? (r.alongNormal.nmPerPixel * r.width) / span.x : null,
      y: alongY ? (r.alongNormal.nmPerPixel * r.height) / span.y : null,
    };
  }
  // The span is swept at least from −V/2 to +V/2, so V/2 is the least peak it implies [calc].
  const safety = span ? assessSafety({ peakV: Math.max(span.x, span.y) / 2 }) : { cautions: [], crossed: [] };
  return {
    nmPerPixel: r.nmPerPixel,
    skewDeg: r.skewDeg,
    rotationDeg: r.rotationDeg,
    alongNormal: r.alongNormal,
    pixelToNm: r.pixelToNm,
    peaks: r.peaks.map(({ kx, ky, magnitude, periodPx, strength }) => ({ kx, ky, magnitude, periodPx, strength })),
    width: r.width,
    height: r.height,
    periodsAcross: r.periodsAcross,
    ...(gainNmPerV ? { gainNmPerV } : {}),
    ...(gainMatrixNmPerV ? { gainMatrixNmPerV } : {}),
    warnings,
    cautions: safety.cautions,
    levelsCrossed: safety.crossed,
  };
}

export const latticeCalculator = defineCalculator({
  slug: 'lattice',
  input: latticeInput,
  compute: (input) => latticeResult(input, analyseLattice(input.heights, input.lattice)),
});
