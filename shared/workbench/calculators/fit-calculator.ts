// Gain-fit page and API: the calibration fit exactly as runs store it, plus what the page prints
// beside it (the fitted line's ends, the t factor) and the cautions for the voltages used.
import { fitInput, type FitResultDto } from '../../schemas/workbench.ts';
import { toVolts } from '../../units.ts';
import { fitCalibrationInUnits, toFitResultDto } from '../calibration-fit.ts';
import { assessSafety, largestMagnitude } from '../safety.ts';
import { defineCalculator } from './calculator.ts';

/** The stored-run figures (FitResultDto) and the page's extras: line ends, t, df, model. */
export const fitCalculator = defineCalculator({
  slug: 'fit',
  input: fitInput,
  compute(input) {
    const fit = fitCalibrationInUnits(input);
    const maxVolts = largestMagnitude(input.points.map((p) => toVolts(p.volts, input.voltageUnit)));
    // Calibration points are quasi-static steps: judged against the DC level.
    const safety = assessSafety({ dcV: maxVolts });
    const dto: FitResultDto = toFitResultDto(fit);
    return {
      ...dto,
      model: fit.model,
      df: fit.df,
      tCritical95: fit.tCritical95,
      interceptStdErrNm: fit.interceptStdErrNm,
      voltsMinV: fit.voltsMinV,
      voltsMaxV: fit.voltsMaxV,
      lineNm: fit.lineNm,
      warnings: [],
      cautions: safety.cautions,
      levelsCrossed: safety.crossed,
    };
  },
});
