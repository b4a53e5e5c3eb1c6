// Creep after a voltage step: x(t) = x(0.1 s)·[1 + γ·log10(t / 0.1 s)], γ ≈ 0.01–0.02
// [S: PI catalogue 1998–2006]. Fitted by least squares of x against log10(t / 0.1 s): the
// intercept is x(0.1 s) and γ = slope / intercept [calc].
import { fitLineColumns } from './line-fit.ts';

/** Reference time of the creep law (s): displacement is quoted relative to x at 0.1 s. */
export const CREEP_REFERENCE_TIME_S = 0.1;

/** One sample of a step-and-hold record: time since the step and displacement. */
export interface CreepSample {
  timeS: number;
  displacementNm: number;
}

/** Fitted creep law with the quality of the fit. */
export interface CreepFit {
  n: number;
  displacementAt0p1sNm: number;
  gamma: number;
  residualStdNm: number;
  r2: number | null;
}

/** Fits the logarithmic creep law to a step-and-hold record (needs ≥ 3 samples at ≥ 2 times). */
export function fitCreep(samples: readonly CreepSample[]): CreepFit {
  const n = samples.length;
  if (n < 3) throw new RangeError('a creep fit needs at least 3 samples');
  const logT = new Float64Array(n);
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const { timeS, displacementNm } = samples[i];
    if (!(timeS > 0) || !Number.isFinite(timeS)) throw new RangeError('times must be positive and finite');
    if (!Number.isFinite(displacementNm)) throw new RangeError('displacements must be finite');
    logT[i] = Math.log10(timeS / CREEP_REFERENCE_TIME_S);
    x[i] = displacementNm;
  }
  if (logT.every((value) => value === logT[0])) throw new RangeError('a creep fit needs at least two times');
  const line = fitLineColumns(logT, x, n, 'intercept');
  if (line.intercept === 0) throw new RangeError('displacement at 0.1 s fits to zero; γ is undefined');
  return {
    n,
    displacementAt0p1sNm: line.intercept,
    gamma: line.slope / line.intercept,
    residualStdNm: line.residualStd,
    r2: line.r2,
  };
}

/** Creep beyond the 0.1 s value at time t, in percent: γ·log10(t / 0.1 s)·100. */
export function creepPct(gamma: number, timeS: number): number {
  if (!(timeS > 0)) throw new RangeError('time must be positive');
  return gamma * Math.log10(timeS / CREEP_REFERENCE_TIME_S) * 100;
}

/** Displacement predicted by the creep law at time t, for plotting the fitted curve. */
export function creepDisplacementNm(displacementAt0p1sNm: number, gamma: number, timeS: number): number {
  return displacementAt0p1sNm * (1 + creepPct(gamma, timeS) / 100);
}
