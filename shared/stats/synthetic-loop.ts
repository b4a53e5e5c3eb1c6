// A synthetic calibration record for benchmarks and tests (never for the demo's measured data): a loop over ±60 V,
// up then down, with a parabolic hysteresis lag of 4 % of the full-scale displacement and ±2 nm of seeded uniform
// noise. Invented numbers [calc]; its only job is to be long and look like a real loop.
import { seededRandom } from './seeded-random.ts';

/** `n` readings as CSV text (`volts,displacement,sweep` header), gain `gainNmPerV`, seeded by `n`. */
export function syntheticLoopCsv(n: number, gainNmPerV: number): string {
  const rand = seededRandom(n);
  const lines = ['volts,displacement,sweep'];
  for (let i = 0; i < n; i++) {
    const phase = i / n;
    const up = phase < 0.5;
    const volts = up ? -60 + 240 * phase : 60 - 240 * (phase - 0.5);
    const lag = (up ? -1 : 1) * 0.04 * gainNmPerV * 60 * (1 - (volts / 60) ** 2);
    const nm = gainNmPerV * volts + lag + (rand() - 0.5) * 4;
    lines.push(`${volts.toFixed(4)},${nm.toFixed(3)},${up ? 'up' : 'down'}`);
  }
  return lines.join('\n');
}
