// Peak-to-peak page and API: one gain from a sine drive read at its peaks, with what the reading
// resolution allows.
import { peakToPeakInput } from '../../schemas/workbench.ts';
import { peakToPeakGain } from '../peak-to-peak.ts';
import { assessSafety } from '../safety.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

/** Below about this many divisions a reading carries little information (FIELD.md "Peak-to-peak method") [practice]. */
export const FEW_DIVISIONS = 2;

const divisions = (n: number) => Number(n.toPrecision(2));

/** Gain ± standard uncertainty, worst-case bounds, a warning for coarse readings, and cautions for the drive. */
export const peakToPeakCalculator = defineCalculator({
  slug: 'peak-to-peak',
  input: peakToPeakInput,
  compute(input) {
    const result = peakToPeakGain(input);
    const warnings: ResultWarning[] = [];
    const rx = input.displacementResolutionNm;
    const rv = input.voltsResolutionV ?? 0;
    if (rx > 0 && input.displacementPpNm < FEW_DIVISIONS * rx) {
      warnings.push({
        code: 'few_divisions',
        message:
          `The swing is only ${divisions(input.displacementPpNm / rx)} divisions of the indicator: below about two ` +
          `divisions the figure carries little information. Drive harder or read a finer indicator.`,
      });
    }
    if (rv > 0 && input.voltsPpV < FEW_DIVISIONS * rv) {
      warnings.push({
        code: 'few_volt_divisions',
        message: `The voltage swing is only ${divisions(input.voltsPpV / rv)} divisions of the voltage reading: the figure carries little information.`,
      });
    }
    // The sine's peak against ground is not known (it may ride on an offset): judge the whole swing as a peak.
    const safety = assessSafety({ peakV: input.voltsPpV });
    const levelsCrossed = safety.highVoltage
      ? [
          `a ${Number(input.voltsPpV.toPrecision(3))} V peak-to-peak swing may peak at ${Number(input.voltsPpV.toPrecision(3))} V on an offset, above the 42.4 V peak level`,
        ]
      : [];
    return { ...result, warnings, cautions: safety.cautions, levelsCrossed };
  },
});
