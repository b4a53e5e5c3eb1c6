// The registry's gain axis: logarithmic, whole decades wide enough to hold every accepted median.
import type { GainHistogramDto } from '@shared/schemas/part.ts';

/** Slider positions per decade of gain. */
export const STEPS_PER_DECADE = 20;

/** A log axis from 10^lo to 10^hi nm/V, with helpers to move between gains, fractions and slider positions. */
export interface GainScale {
  lo: number;
  hi: number;
  steps: number;
  fraction: (gain: number) => number;
  gainAt: (position: number) => number;
  positionOf: (gain: number) => number;
  decades: number[];
}

const clamp = (v: number, a: number, b: number) => Math.min(b, Math.max(a, v));
/** Two significant figures: slider stops read 10, 11, 13, 14, 16, 18 … rather than 12.589. */
const round2 = (v: number) => Number(v.toPrecision(2));

/** The axis for this histogram (1–10 000 nm/V when the registry has no medians yet). */
export function gainScale(histogram: GainHistogramDto | undefined): GainScale {
  const bins = histogram?.bins ?? [];
  let lo = bins.length ? Math.floor(Math.log10(Math.min(...bins.map((b) => b.fromNmPerV))) + 1e-9) : 0;
  let hi = bins.length ? Math.ceil(Math.log10(Math.max(...bins.map((b) => b.toNmPerV))) - 1e-9) : 4;
  if (hi - lo < 2) {
    lo -= 1;
    hi = Math.max(hi, lo + 2);
  }
  const steps = (hi - lo) * STEPS_PER_DECADE;
  return {
    lo,
    hi,
    steps,
    fraction: (gain) => (gain > 0 ? clamp((Math.log10(gain) - lo) / (hi - lo), 0, 1) : 0),
    gainAt: (position) => round2(10 ** (lo + position / STEPS_PER_DECADE)),
    positionOf: (gain) => (gain > 0 ? clamp(Math.round((Math.log10(gain) - lo) * STEPS_PER_DECADE), 0, steps) : 0),
    decades: Array.from({ length: hi - lo + 1 }, (_, i) => 10 ** (lo + i)),
  };
}
