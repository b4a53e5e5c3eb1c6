// What a maker sees before a run is stored or a build is submitted: the same plausibility flags the
// review desk shows (plausibility.ts, each threshold with its reason), each with a plain explanation of
// what to look at, and a warning when the run's drive goes past the actuator's stated maximum.
import type { CreateRunInput } from '../schemas/run.ts';
import { toVolts } from '../units.ts';
import type { RunFit } from '../workbench/run-fit.ts';
import { plausibilityFlags, type FlagCode, type PlausibilityFlag } from './plausibility.ts';

/** What to check when a flag shows, in the maker's terms. */
export const flagAdvice: Readonly<Record<FlagCode, string>> = {
  'poor-fit': 'The points scatter about the line more than a piezo does; look for a slipped indicator, backlash or a misread point.',
  'few-points': 'A moderator cannot see both sweeps with so few points; take a reading at every step up and back down.',
  'large-hysteresis': 'A loop this wide usually means a loose mount or backlash in the indicator, not the piezo itself.',
  outlier: 'The gain is far from every accepted run of this part; check the units and how the part is mounted and wired.',
  'unit-slip': 'The gain differs from the part by a factor a unit mix-up leaves; check the units picked for the readings.',
  'expected-mismatch': 'The gain is far from what the geometry predicts; check the part, its wiring (series or parallel) and the units.',
};

/** A flag with its advice. */
export interface MakerFlag extends PlausibilityFlag {
  advice: string;
}

/**
 * Largest drive a run reaches (V): the largest point, the peak of a sine record, the top of a peak-to-peak swing
 * (taken as a peak), or half a lattice scan's span.
 */
export function runPeakVolts(input: CreateRunInput): number {
  if (input.kind === 'peak-to-peak') return toVolts(input.voltsPp, input.voltageUnit);
  // A scan span is swept at least from −V/2 to +V/2 [calc].
  if (input.kind === 'lattice') return Math.max(input.scanSpanV.x, input.scanSpanV.y) / 2;
  const series = input.kind === 'points' ? input.points : input.samples;
  let m = 0;
  for (const p of series) if (Math.abs(p.volts) > m) m = Math.abs(p.volts);
  return toVolts(m, input.voltageUnit);
}

/** The checks of one run before it is stored: flags against the part's pooled median and the expected gain, and the stated-maximum warning. */
export function makerRunChecks(
  input: CreateRunInput,
  fit: RunFit,
  actuator: { maxVolts: number | null; expectedGainNmPerV: number | null; partMedianNmPerV: number | null },
): { flags: MakerFlag[]; overLimit: string | null } {
  const flags = storedRunFlags({ kind: input.kind, fit }, actuator);
  const peak = runPeakVolts(input);
  const overLimit =
    actuator.maxVolts !== null && peak > Math.abs(actuator.maxVolts)
      ? `This run drives the actuator to ${Number(peak.toPrecision(3))} V, above its stated maximum of ${actuator.maxVolts} V: either the readings or the stated limit are wrong.`
      : null;
  return { flags, overLimit };
}

/** A stored run's flags as the review desk will raise them, with advice, for the maker's own view of a build before submitting. */
export function storedRunFlags(
  run: { kind: CreateRunInput['kind']; fit: { n: number; gainNmPerV: number; r2: number | null; hysteresisPctFs: number | null } },
  actuator: { expectedGainNmPerV: number | null; partMedianNmPerV: number | null },
): MakerFlag[] {
  // The part's median stands in for its accepted gains: the unit-slip check needs only the median;
  // the outlier check needs three runs and stays on the review desk.
  const accepted = actuator.partMedianNmPerV !== null ? [actuator.partMedianNmPerV] : [];
  return plausibilityFlags({ kind: run.kind, ...run.fit }, accepted, actuator.expectedGainNmPerV).map((f) => ({
    ...f,
    advice: flagAdvice[f.code],
  }));
}
