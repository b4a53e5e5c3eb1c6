import { seededRandom } from '../../shared/stats/seeded-random.ts';
// Generated sine records for the sine-fit tests: drive V(t) = V₀ + R_V·sin(2πf·t + φ) and displacement
// x(t) = x₀ + R_x·sin(2πf·t + φ − lag), each with seeded Gaussian noise, sampled at a fixed rate.

/** Standard normal numbers by Box–Muller from a seeded uniform generator. */
export function gaussian(seed: number): () => number {
  const rand = seededRandom(seed);
  return () => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
}

/** What a generated record is made of (volts in V, displacement in nm, lag in degrees). */
export interface SineRecordSpec {
  n: number;
  sampleRateHz: number;
  frequencyHz: number;
  startS?: number;
  voltsAmplitude: number;
  voltsOffset?: number;
  phaseRad?: number;
  displacementAmplitude: number;
  displacementOffset?: number;
  lagDeg?: number;
  voltsNoiseSd?: number;
  displacementNoiseSd?: number;
  seed?: number;
}

/** The samples of a generated record, in V and nm. */
export function sineRecord(spec: SineRecordSpec): { timeS: number; volts: number; displacement: number }[] {
  const g = gaussian(spec.seed ?? 1);
  const w = 2 * Math.PI * spec.frequencyHz;
  const phase = spec.phaseRad ?? 0;
  const lag = ((spec.lagDeg ?? 0) * Math.PI) / 180;
  return Array.from({ length: spec.n }, (_, i) => {
    const timeS = (spec.startS ?? 0) + i / spec.sampleRateHz;
    return {
      timeS,
      volts: (spec.voltsOffset ?? 0) + spec.voltsAmplitude * Math.sin(w * timeS + phase) + (spec.voltsNoiseSd ?? 0) * g(),
      displacement:
        (spec.displacementOffset ?? 0) +
        spec.displacementAmplitude * Math.sin(w * timeS + phase - lag) +
        (spec.displacementNoiseSd ?? 0) * g(),
    };
  });
}
