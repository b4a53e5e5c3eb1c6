// Linearisation page and API: a polynomial per sweep branch and the table that inverts it, with the
// nonlinearity before and after, warnings and the cautions for the voltages in the table.
import { lineariseInput } from '../../schemas/linearise.ts';
import { toVolts } from '../../units.ts';
import { linearise } from '../linearise.ts';
import { assessSafety, largestMagnitude } from '../safety.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

export const lineariseCalculator = defineCalculator({
  slug: 'linearise',
  input: lineariseInput,
  compute(input) {
    const result = linearise(input);
    const warnings: ResultWarning[] = [];
    if (result.unlabelledLeftOut > 0)
      warnings.push({
        code: 'unlabelled_left_out',
        message: `${result.unlabelledLeftOut} point${result.unlabelledLeftOut === 1 ? '' : 's'} without a sweep label left out: label every point up or down, or none.`,
      });
    for (const [name, b] of Object.entries(result.branches))
      if (b && b.n - (b.degree + 1) < 3)
        warnings.push({
          code: 'few_degrees_of_freedom',
          message: `The ${name === 'all' ? '' : `${name}-sweep `}fit has ${b.n} points for ${b.degree + 1} coefficients: take more steps before trusting the table.`,
        });
    const safety = assessSafety({ dcV: largestMagnitude(input.points.map((p) => toVolts(p.volts, input.voltageUnit))) });
    return { ...result, warnings, cautions: safety.cautions, levelsCrossed: safety.crossed };
  },
});
