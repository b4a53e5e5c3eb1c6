// Lateral scale from a lattice image: nm per pixel, skew, rotation, the peaks used, gains from the drive
// spans, warnings (weak peaks, few periods, the every-other-atom trap) and the cautions for the drive span.
import { latticeInput, type LatticeInput } from '../../schemas/lattice.ts';
import { analyseLattice, MIN_PERIODS, WEAK_PEAK_RATIO, type LatticeAnalysis } from '../lattice.ts';
import { latticeFigures, MIN_QUADRANTS } from '../lattice-figures.ts';
import { assessSafety } from '../safety.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

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
  const figures = latticeFigures({
    lattice: input.lattice,
    width: r.width,
    height: r.height,
    peaks: r.peaks,
    quadrantPeaks: r.quadrantPeaks,
    scanSpanV: span,
  });
  if (!figures.standardUncertainty)
    warnings.push({
      code: 'no_uncertainty',
      message: `The lattice was found in only ${r.quadrantPeaks.length} of the image's four quarters (at least ${MIN_QUADRANTS} needed): no ± can be given. Image more periods.`,
    });
  // The span is swept at least from −V/2 to +V/2, so V/2 is the least peak it implies [calc].
  const safety = span ? assessSafety({ peakV: Math.max(span.x, span.y) / 2 }) : { cautions: [], crossed: [] };
  return {
    ...figures,
    peaks: r.peaks.map(({ kx, ky, magnitude, periodPx, strength }) => ({ kx, ky, magnitude, periodPx, strength })),
    quadrantPeaks: r.quadrantPeaks,
    width: r.width,
    height: r.height,
    periodsAcross: r.periodsAcross,
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
