// Invented calibration points for the demo: a linear gain with a hysteresis loop and noise,
// drawn from a seeded generator so every fresh install shows the same demo.
import { fromNm, type DisplacementUnit } from '@shared/units.ts';
import type { FitPoint } from '@shared/schemas/workbench.ts';
import { seededRandom } from '../../../shared/stats/seeded-random.ts';

/** Up then down sweep from 0 to maxVolts; the loop opens by loopFraction of the span at mid-range. */
export function demoSweep(opts: {
  gainNmPerV: number;
  loopFraction: number;
  noiseNm: number;
  maxVolts: number;
  steps: number;
  unit: DisplacementUnit;
  seed: number;
}): FitPoint[] {
  const rand = seededRandom(opts.seed);
  const gauss = () => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
  const half = (opts.loopFraction * opts.gainNmPerV * opts.maxVolts) / 2;
  const volts = Array.from({ length: opts.steps + 1 }, (_, i) => (opts.maxVolts * i) / opts.steps);
  const point = (v: number, sweep: 'up' | 'down'): FitPoint => {
    const loop = half * Math.sin((Math.PI * v) / opts.maxVolts) * (sweep === 'up' ? -1 : 1);
    const nm = opts.gainNmPerV * v + loop + opts.noiseNm * gauss();
    return { volts: Math.round(v * 100) / 100, displacement: Number(fromNm(nm, opts.unit).toPrecision(5)), sweep };
  };
  return [
    ...volts.map((v) => point(v, 'up')),
    ...volts
      .slice()
      .reverse()
      .map((v) => point(v, 'down')),
  ];
}
