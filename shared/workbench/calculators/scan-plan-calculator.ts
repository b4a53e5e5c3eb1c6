// Scan planner page and API: from DAC code to tip motion, frame timing and the line-rate ceilings
// of the first resonance.
import { scanPlanInput } from '../../schemas/workbench.ts';
import { assessSafety } from '../safety.ts';
import { bitsNeeded, dacResolution, frameTiming, lineRateCeilings, quasiStaticGainError } from '../scan-planner.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

/** DAC resolutions the step chart spans around the chosen one. */
function bitsAround(bits: number): number[] {
  const lo = Math.max(1, Math.min(bits - 6, 26));
  return Array.from({ length: 13 }, (_, i) => lo + i).filter((b) => b <= 32);
}

/** Step and range, frame timing, ceilings, the gain error at the line rate, the step chart and cautions. */
export const scanPlanCalculator = defineCalculator({
  slug: 'scan-plan',
  input: scanPlanInput,
  compute(input) {
    const resolution = dacResolution(input);
    const timing = frameTiming(input);
    const ceilings = input.resonanceHz === undefined ? null : lineRateCeilings(input.resonanceHz);
    const warnings: ResultWarning[] = [];
    if (ceilings && input.lineRateHz > ceilings.sineLikeHz) {
      warnings.push({
        code: 'line_rate_above_ceiling',
        message: 'The line rate is above f₀/10: the scanner will ring and the image will distort (common practice).',
      });
    } else if (ceilings && input.lineRateHz > ceilings.triangleHz) {
      warnings.push({
        code: 'line_rate_above_triangle_ceiling',
        message:
          'The line rate is above f₀/100: a sharp triangular raster will ring at its turning points; round the turns or slow down (Bae & Granick 2000).',
      });
    }
    if (input.scanSizeNm !== undefined && input.scanSizeNm > resolution.rangeNm) {
      warnings.push({ code: 'scan_beyond_range', message: 'The scan size is larger than the range the drive chain can reach.' });
    }
    // The amplifier's output may swing over its whole span: judged as a peak.
    const safety = assessSafety({ peakV: resolution.outputSpanV });
    return {
      lsbNm: resolution.lsbNm,
      rangeNm: resolution.rangeNm,
      outputSpanV: resolution.outputSpanV,
      bitsNeeded: input.wantedStepNm === undefined ? null : bitsNeeded(resolution.rangeNm, input.wantedStepNm),
      frameTimeS: timing.frameTimeS,
      pixelTimeS: timing.pixelTimeS,
      tipSpeedNmPerS: timing.tipSpeedNmPerS,
      pixelNm: input.scanSizeNm === undefined ? null : input.scanSizeNm / input.pixelsPerLine,
      lineRateCeilingSineLikeHz: ceilings?.sineLikeHz ?? null,
      lineRateCeilingTriangleHz: ceilings?.triangleHz ?? null,
      gainErrorAtLineRatePct:
        input.resonanceHz !== undefined && input.lineRateHz < input.resonanceHz
          ? quasiStaticGainError(input.lineRateHz, input.resonanceHz) * 100
          : null,
      steps: bitsAround(input.dacBits).map((bits) => ({ bits, lsbNm: dacResolution({ ...input, dacBits: bits }).lsbNm })),
      warnings,
      cautions: safety.cautions,
      levelsCrossed: safety.crossed,
    };
  },
});
