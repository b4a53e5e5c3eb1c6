// Plausibility flags for a pending calibration run, shown on the review desk. Each flag names its
// threshold and why. They help a moderator look; they never decide.
import { summarize } from '../stats/quantiles.ts';
import type { RunKind } from '../schemas/run-vocabulary.ts';

/** R² below this on a quasi-static run suggests misread or slipped readings. [practice: a piezo read
 * on an indicator over its range is near-linear; hysteresis alone keeps R² above ~0.98] */
export const POOR_FIT_R2 = 0.98;
/** Fewer points than this cannot show both sweeps with a middle point each. [practice] */
export const FEW_POINTS = 6;
/** Loop width above this exceeds what open-loop PZT shows at full drive (10–15 %)
 * [S: PI piezo tutorial / catalogue 1998–2006], so a loose mount or backlash is likely. */
export const LARGE_HYSTERESIS_PCT = 20;
/** Modified z-score above this marks an outlier [S: Iglewicz & Hoaglin, How to Detect and Handle
 * Outliers, ASQC 1993: M = 0.6745·(x − median)/MAD, |M| > 3.5]. */
export const ROBUST_Z_LIMIT = 3.5;
/** The outlier test needs this many accepted runs to say anything. [practice] */
export const MIN_RUNS_FOR_OUTLIER = 3;
/** Unit slips and the factor each one leaves, with what it usually means. [practice; 25.4 exact per
 * NBS 1959; 2√2 is the peak-to-peak ÷ rms ratio of a sine, calc] */
export const UNIT_SLIPS = [
  { factor: 25.4, label: '25.4', cause: 'inches against millimetres, or µin against nm' },
  { factor: 1000, label: '1000', cause: 'µm entered as nm, or mV as V' },
  { factor: 10, label: '10', cause: 'Å entered as nm' },
  { factor: 2, label: '2', cause: 'peak amplitude against peak-to-peak' },
  { factor: 2 * Math.SQRT2, label: '2√2', cause: 'rms against peak-to-peak of a sine' },
] as const;
/** How close (relative) the ratio must be to a factor; ±12 % keeps the bands of 2 and 2√2 apart [practice]. */
export const UNIT_SLIP_TOLERANCE = 0.12;

/** The unit slip a ratio to the part median is closest to, if it lies within the tolerance of one. */
export function matchUnitSlip(ratio: number): { factor: number; inverse: boolean; label: string; cause: string } | null {
  let best: { factor: number; inverse: boolean; label: string; cause: string; distance: number } | null = null;
  for (const s of UNIT_SLIPS) {
    for (const inverse of [false, true]) {
      const f = inverse ? 1 / s.factor : s.factor;
      const distance = Math.abs(Math.log(ratio / f));
      if (Math.abs(ratio / f - 1) <= UNIT_SLIP_TOLERANCE && (!best || distance < best.distance)) {
        best = { factor: f, inverse, label: inverse ? `1/${s.label}` : s.label, cause: s.cause, distance };
      }
    }
  }
  return best && { factor: best.factor, inverse: best.inverse, label: best.label, cause: best.cause };
}
/** Measured ÷ expected outside this band: free-gain formulas overestimate loaded parts, but not by
 * more than ×4, and measuring above ×2 the free gain is suspicious. [practice] */
export const EXPECTED_RATIO_BAND = [0.25, 2] as const;

export type FlagCode = 'poor-fit' | 'few-points' | 'large-hysteresis' | 'outlier' | 'unit-slip' | 'expected-mismatch';

export interface PlausibilityFlag {
  code: FlagCode;
  message: string;
}

export interface RunForFlags {
  /** Point runs only are judged on their point count (a peak-to-peak reading is two readings by design). Default 'points'. */
  kind?: RunKind;
  n: number;
  gainNmPerV: number;
  r2: number | null;
  hysteresisPctFs: number | null;
}

/** Median absolute deviation (unscaled) of a sample. */
export function medianAbsoluteDeviation(values: readonly number[]): number | null {
  const m = summarize(values).median;
  if (m === null) return null;
  return summarize(values.map((v) => Math.abs(v - m))).median;
}

/** Iglewicz–Hoaglin modified z-score of x within the sample; null when the MAD is zero or the sample too small. */
export function modifiedZScore(x: number, sample: readonly number[]): number | null {
  if (sample.length < MIN_RUNS_FOR_OUTLIER) return null;
  const m = summarize(sample).median!;
  const mad = medianAbsoluteDeviation(sample)!;
  if (mad === 0) return null;
  return (0.6745 * (x - m)) / mad;
}

const fmt = (x: number) => Number(x.toPrecision(3)).toString();

/** The flags of one run, given the gains (nm/V, magnitudes) of the part's accepted runs and its expected gain. */
export function plausibilityFlags(
  run: RunForFlags,
  acceptedGainsNmPerV: readonly number[],
  expectedGainNmPerV: number | null,
): PlausibilityFlag[] {
  const flags: PlausibilityFlag[] = [];
  const gain = Math.abs(run.gainNmPerV);
  if (run.r2 !== null && run.r2 < POOR_FIT_R2)
    flags.push({ code: 'poor-fit', message: `R² ${run.r2.toFixed(4)} is below ${POOR_FIT_R2}.` });
  if ((run.kind ?? 'points') === 'points' && run.n < FEW_POINTS)
    flags.push({ code: 'few-points', message: `Only ${run.n} points (fewer than ${FEW_POINTS}).` });
  if (run.hysteresisPctFs !== null && run.hysteresisPctFs > LARGE_HYSTERESIS_PCT) {
    flags.push({
      code: 'large-hysteresis',
      message: `Hysteresis ${fmt(run.hysteresisPctFs)} % of span exceeds ${LARGE_HYSTERESIS_PCT} %.`,
    });
  }
  const median = summarize(acceptedGainsNmPerV).median;
  let slip = false;
  if (median !== null && median > 0 && gain > 0) {
    const ratio = gain / median;
    const match = matchUnitSlip(ratio);
    if (match) {
      slip = true;
      flags.push({
        code: 'unit-slip',
        message: `Gain is ${fmt(ratio)}× the part median ${fmt(median)} nm/V — close to a factor of ${match.label} (${match.cause}).`,
      });
    }
  }
  const z = modifiedZScore(gain, acceptedGainsNmPerV);
  if (!slip && z !== null && Math.abs(z) > ROBUST_Z_LIMIT) {
    flags.push({ code: 'outlier', message: `Gain is far from this part's accepted runs (modified z ${fmt(z)}, limit ${ROBUST_Z_LIMIT}).` });
  }
  if (expectedGainNmPerV !== null && expectedGainNmPerV > 0) {
    const ratio = gain / expectedGainNmPerV;
    if (ratio < EXPECTED_RATIO_BAND[0] || ratio > EXPECTED_RATIO_BAND[1]) {
      flags.push({
        code: 'expected-mismatch',
        message: `Measured is ${fmt(ratio)}× the expected ${fmt(expectedGainNmPerV)} nm/V (band ${EXPECTED_RATIO_BAND[0]}–${EXPECTED_RATIO_BAND[1]}).`,
      });
    }
  }
  return flags;
}
