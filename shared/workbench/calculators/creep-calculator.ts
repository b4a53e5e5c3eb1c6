// Creep page and API: the logarithmic creep law fitted to a step-and-hold record, its projection
// to later times, and a warning when γ is far from what open-loop PZT shows.
import { creepInput } from '../../schemas/workbench.ts';
import { creepDisplacementNm, creepPct, fitCreep } from '../creep.ts';
import { defineCalculator, type ResultWarning } from './calculator.ts';

/**
 * Typical γ of open-loop PZT: about 0.01–0.02 [S: PI catalogue 1998–2006; vendor catalogues, from
 * memory]. A fitted γ below a quarter of the low end or above four times the high end is flagged
 * as far outside [practice; our bound].
 */
export const TYPICAL_GAMMA = [0.01, 0.02] as const;
export const FAR_OUTSIDE_FACTOR = 4;

const STANDARD_TIMES_S = [10, 100, 1000];
const CURVE_POINTS = 40;

function logSpaced(from: number, to: number, n: number): number[] {
  const a = Math.log10(from);
  const b = Math.log10(to);
  return Array.from({ length: n }, (_, i) => 10 ** (a + ((b - a) * i) / (n - 1)));
}

function gammaWarnings(gamma: number): ResultWarning[] {
  const g = Number(gamma.toPrecision(2));
  if (gamma < 0) {
    return [
      {
        code: 'gamma_negative',
        message:
          `γ = ${g} is negative: the reading falls after the step. Creep of a piezo adds to the step; check the sign of ` +
          `the readings, drift of the indicator, or whether the record starts after the step settled. The projections ` +
          `below are not meaningful.`,
      },
    ];
  }
  if (gamma < TYPICAL_GAMMA[0] / FAR_OUTSIDE_FACTOR || gamma > TYPICAL_GAMMA[1] * FAR_OUTSIDE_FACTOR) {
    return [
      {
        code: 'gamma_atypical',
        message:
          `γ = ${g} is far outside the 0.01–0.02 typical of open-loop PZT (vendor catalogues, recalled value, not yet ` +
          `checked against a source): check the record before trusting the projections.`,
      },
    ];
  }
  return [];
}

/** x(0.1 s), γ, fit quality, creep at 10/100/1000 s (and a chosen time), the fitted curve, warnings. */
export const creepCalculator = defineCalculator({
  slug: 'creep',
  input: creepInput,
  compute(input) {
    const fit = fitCreep(input.samples);
    let tMin = Infinity;
    let tMax = -Infinity;
    for (const s of input.samples) {
      if (s.timeS < tMin) tMin = s.timeS;
      if (s.timeS > tMax) tMax = s.timeS;
    }
    const times =
      input.projectToS !== undefined && !STANDARD_TIMES_S.includes(input.projectToS)
        ? [...STANDARD_TIMES_S, input.projectToS]
        : STANDARD_TIMES_S;
    const projections = times.map((timeS) => ({ timeS, pct: creepPct(fit.gamma, timeS) }));
    const curve = logSpaced(tMin, Math.max(tMax, input.projectToS ?? 0), CURVE_POINTS).map((timeS) => ({
      timeS,
      displacementNm: creepDisplacementNm(fit.displacementAt0p1sNm, fit.gamma, timeS),
    }));
    return {
      ...fit,
      creepAt10sPct: creepPct(fit.gamma, 10),
      creepAt100sPct: creepPct(fit.gamma, 100),
      creepAt1000sPct: creepPct(fit.gamma, 1000),
      projections,
      curve,
      warnings: gammaWarnings(fit.gamma),
      cautions: [],
    };
  },
});
