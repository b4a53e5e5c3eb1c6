// Two-axis mixer page and API: G⁻¹, the reachable region and the volts for a wanted point; and
// the fit of G (with offsets) from a grid of drive pairs.
import { gainMatrixFitInput, mixingInput } from '../../schemas/workbench.ts';
import { fitGainMatrix, invertGain, isReachable, mixingSinAngle, reachableRegion, voltsFor } from '../mixing.ts';
import { assessSafety, largestMagnitude } from '../safety.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

/** Below this |sin| of the angle between the actuators, small gain errors move the tip a lot [practice]. */
export const POORLY_CONDITIONED_SIN = 0.2;

/** G⁻¹, how far from parallel the actuators are, the region the limits allow, the wanted point, cautions. */
export const mixingCalculator = defineCalculator({
  slug: 'mixing',
  input: mixingInput,
  compute(input) {
    const { gain, limits, target } = input;
    const inverseVPerNm = invertGain(gain);
    const sinAngle = mixingSinAngle(gain);
    const warnings: ResultWarning[] = [];
    if (sinAngle < POORLY_CONDITIONED_SIN) {
      warnings.push({
        code: 'nearly_parallel',
        message:
          `The two actuators move nearly along one line (|sin| of the angle ${Number(sinAngle.toPrecision(2))}): small ` +
          `gain errors become large position errors, and the region is a thin sliver.`,
      });
    }
    // A drive limit bounds whatever waveform is sent: judged as a peak.
    const safety = assessSafety({ peakV: largestMagnitude([limits.vaMinV, limits.vaMaxV, limits.vbMinV, limits.vbMaxV]) });
    return {
      limits,
      inverseVPerNm,
      sinAngle,
      regionNm: reachableRegion(gain, limits),
      target: target
        ? { ...target, ...voltsFor(gain, target.xNm, target.yNm), reachable: isReachable(gain, limits, target.xNm, target.yNm) }
        : null,
      warnings,
      cautions: safety.cautions,
      levelsCrossed: safety.crossed,
    };
  },
});

/** Least-squares G (nm/V) and offsets from a grid of drive pairs and measured tip positions. */
export const mixingFitCalculator = defineCalculator({
  slug: 'mixing-fit',
  input: gainMatrixFitInput,
  compute(input) {
    const fit = fitGainMatrix(input.samples, input.model);
    const safety = assessSafety({ peakV: largestMagnitude(input.samples.flatMap((s) => [s.vaV, s.vbV])) });
    return {
      n: fit.n,
      model: fit.model,
      gainNmPerV: fit.gain,
      offsetNm: fit.offsetNm,
      residualStdXNm: fit.residualStdXNm,
      residualStdYNm: fit.residualStdYNm,
      sinAngle: mixingSinAngle(fit.gain),
      warnings: [] as ResultWarning[],
      cautions: safety.cautions,
      levelsCrossed: safety.crossed,
    };
  },
});
