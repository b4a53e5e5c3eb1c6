// A sine record made ready for the fit: samples checked (enough, not too many, finite, times increasing),
// converted to volts and nanometres, and time taken from the record's middle (keeps the normal equations well
// conditioned [practice]); and a first frequency from the drive's zero crossings with hysteresis of half its rms,
// crossing times interpolated linearly between samples [practice].
import type { SineFitInput } from '../schemas/sine-fit.ts';
import { toNm, toVolts } from '../units.ts';
import { MIN_SINE_SAMPLES, SineFitError } from './sine-fit-error.ts';

export interface SineRecordArrays {
  n: number;
  /** Time from the record's middle (s). */
  t: Float64Array;
  v: Float64Array;
  x: Float64Array;
  durationS: number;
  halfSpanS: number;
}

/** The record as typed arrays; refuses what the fit cannot use with a SineFitError. */
export function prepareSineRecord(input: SineFitInput, maxSamples: number): SineRecordArrays {
  const samples = input.samples;
  const n = samples.length;
  if (n < MIN_SINE_SAMPLES)
    throw new SineFitError('too_few_samples', `A sine record needs at least ${MIN_SINE_SAMPLES} samples; this one has ${n}.`);
  if (n > maxSamples)
    throw new SineFitError('too_many_samples', `A sine record may have at most ${maxSamples} samples; this one has ${n}.`);
  const t = new Float64Array(n);
  const v = new Float64Array(n);
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const s = samples[i];
    for (const field of ['timeS', 'volts', 'displacement'] as const) {
      if (!Number.isFinite(s[field]))
        throw new SineFitError('non_finite_value', `Sample ${i + 1} has no finite ${field}.`, { index: i, field });
    }
    if (i > 0 && !(s.timeS > samples[i - 1].timeS))
      throw new SineFitError('times_not_increasing', `Times must increase from sample to sample; sample ${i + 1} does not.`, {
        index: i,
        field: 'timeS',
      });
    t[i] = s.timeS;
    v[i] = toVolts(s.volts, input.voltageUnit);
    x[i] = toNm(s.displacement, input.displacementUnit);
  }
  const t0 = t[0];
  const t1 = t[n - 1];
  const mid = t0 + (t1 - t0) / 2;
  for (let i = 0; i < n; i++) t[i] = t[i] - mid;
  return { n, t, v, x, durationS: t1 - t0, halfSpanS: (t1 - t0) / 2 };
}

/** Frequency from zero crossings with hysteresis (both directions pooled); null with fewer than two crossings of one kind. */
export function crossingFrequencyHz(rec: SineRecordArrays, mean: number, rms: number): number | null {
  const { t, v, n } = rec;
  const h = 0.5 * rms;
  let state = 0;
  let lastNonPos = -1;
  let lastNonNeg = -1;
  const first = [Number.NaN, Number.NaN];
  const last = [Number.NaN, Number.NaN];
  const count = [0, 0];
  const cross = (k: number, dir: 0 | 1) => {
    const y0 = v[k] - mean;
    const y1 = v[k + 1] - mean;
    const tc = t[k] + ((t[k + 1] - t[k]) * -y0) / (y1 - y0);
    if (count[dir] === 0) first[dir] = tc;
    last[dir] = tc;
    count[dir]++;
  };
  for (let i = 0; i < n; i++) {
    const y = v[i] - mean;
    if (y <= 0) lastNonPos = i;
    if (y >= 0) lastNonNeg = i;
    if (y > h) {
      if (state === -1 && lastNonPos >= 0) cross(lastNonPos, 0);
      state = 1;
    } else if (y < -h) {
      if (state === 1 && lastNonNeg >= 0) cross(lastNonNeg, 1);
      state = -1;
    }
  }
  let intervals = 0;
  let span = 0;
  for (const d of [0, 1]) {
    if (count[d] >= 2) {
      intervals += count[d] - 1;
      span += last[d] - first[d];
    }
  }
  return intervals > 0 && span > 0 ? intervals / span : null;
}
