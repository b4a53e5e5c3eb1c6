// Sine-fit page and API: gain and phase lag from a recorded sine drive and displacement (IEEE Std 1057
// fits, shared/workbench/sine-fit.ts), warnings where the figure is weak, and cautions for the drive's peak.
import { sineFitInput } from '../../schemas/sine-fit.ts';
import { assessSafety } from '../safety.ts';
import { fitSineRecord } from '../sine-fit.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

/** Below this share of variance explained the drive is a sine with visible harmonics or noise: said, not refused [practice]. */
export const CLEAN_DRIVE_FRACTION = 0.99;
/** Fewer samples per period than this and the record under-resolves each cycle [practice]. */
const FEW_SAMPLES_PER_PERIOD = 10;
/** A relative standard uncertainty of the gain above this is worth a word [practice]. */
const LARGE_REL_UNCERTAINTY = 0.1;

const pct = (f: number) => `${Number((f * 100).toPrecision(3))} %`;

/** The fit's figures, the warnings that qualify them, and the IEC 61010-1 cautions for the drive's peak (|offset| + amplitude). */
export const sineFitCalculator = defineCalculator({
  slug: 'sine-fit',
  input: sineFitInput,
  compute(input) {
    const fit = fitSineRecord(input);
    const warnings: ResultWarning[] = [];
    if (fit.voltsExplainedFraction < CLEAN_DRIVE_FRACTION) {
      warnings.push({
        code: 'drive_not_clean',
        message:
          `The fitted sine explains ${pct(fit.voltsExplainedFraction)} of the drive: it carries harmonics or noise. ` +
          'The gain is that of the fundamental.',
      });
    }
    if (fit.samplesPerPeriod < FEW_SAMPLES_PER_PERIOD) {
      warnings.push({
        code: 'few_samples_per_period',
        message: `Only ${Number(fit.samplesPerPeriod.toPrecision(2))} samples per period: sample faster, or check that the drive frequency is not aliased.`,
      });
    }
    if (fit.gainNmPerV > 0 && fit.gainStdUncNmPerV / fit.gainNmPerV > LARGE_REL_UNCERTAINTY) {
      warnings.push({
        code: 'noisy_displacement',
        message: `The gain's standard uncertainty is ${pct(fit.gainStdUncNmPerV / fit.gainNmPerV)} of it: the displacement swing is small against its noise.`,
      });
    }
    if (Math.abs(fit.phaseLagDeg) > 90) {
      warnings.push({
        code: 'displacement_inverted',
        message:
          'The displacement moves against the drive (phase lag beyond ±90°): the indicator or the wiring may be reversed, ' +
          'or the drive is above a resonance.',
      });
    }
    const peakV = Math.abs(fit.voltsOffsetV) + fit.voltsAmplitudeV;
    const safety = assessSafety({ peakV });
    return { ...fit, warnings, cautions: safety.cautions, levelsCrossed: safety.crossed };
  },
});
