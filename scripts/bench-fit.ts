// Benchmark of the gain fit: 1,000,000 points with up/down sweeps and seeded noise.
// Run: node --import tsx scripts/bench-fit.ts   (npm run bench:fit)
import { performance } from 'node:perf_hooks';
import {
  fitCalibration,
  fitCalibrationColumns,
  fitCalibrationInUnits,
  type CalibrationPoint,
  type RecordedCalibrationPoint,
} from '../shared/workbench/calibration-fit.ts';
import { fitSineRecord } from '../shared/workbench/sine-fit.ts';
import type { SineFitInput } from '../shared/schemas/sine-fit.ts';
import { analyseLattice } from '../shared/workbench/lattice.ts';
import { seededRandom } from '../shared/stats/seeded-random.ts';

const POINTS = 1_000_000;
const SINE_SAMPLES = 200_000;
const SINE_TARGET_MEDIAN_MS = 100;
const WARMUP_RUNS = 5;
const TIMED_RUNS = 15;
const TARGET_MEDIAN_MS = 100;
const LEVELS = 1001; // 0 … 150 V in 0.15 V steps
const MAX_V = 150;
const GAIN_NM_PER_V = 102.6;
const HALF_LOOP_NM = 300;
const NOISE_SD_NM = 2;

function buildPoints(): CalibrationPoint[] {
  const rand = seededRandom(20240611);
  const gauss = (): number => {
    const u = 1 - rand();
    return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * rand());
  };
  const points: CalibrationPoint[] = new Array(POINTS);
  for (let i = 0; i < POINTS; i++) {
    const step = i % (2 * LEVELS);
    const up = step < LEVELS;
    const level = up ? step : 2 * LEVELS - 1 - step;
    const volts = (level * MAX_V) / (LEVELS - 1);
    const loop = HALF_LOOP_NM * Math.sin((Math.PI * volts) / MAX_V) * (up ? -1 : 1);
    points[i] = {
      volts,
      displacementNm: GAIN_NM_PER_V * volts + loop + NOISE_SD_NM * gauss(),
      sweep: up ? 'up' : 'down',
    };
  }
  return points;
}

function percentile(sorted: number[], q: number): number {
  const idx = Math.min(sorted.length - 1, Math.ceil(q * sorted.length) - 1);
  return sorted[Math.max(0, idx)];
}

function time(label: string, run: () => unknown): number {
  for (let i = 0; i < WARMUP_RUNS; i++) run();
  const ms: number[] = [];
  for (let i = 0; i < TIMED_RUNS; i++) {
    const t0 = performance.now();
    run();
    ms.push(performance.now() - t0);
  }
  ms.sort((a, b) => a - b);
  const median = percentile(ms, 0.5);
  console.log(
    `${label.padEnd(34)} median ${median.toFixed(1).padStart(6)} ms   p90 ${percentile(ms, 0.9)
      .toFixed(1)
      .padStart(6)} ms   (${TIMED_RUNS} runs after ${WARMUP_RUNS} warm-up)`,
  );
  return median;
}

const points = buildPoints();
const recorded: RecordedCalibrationPoint[] = points.map((p) => ({
  volts: p.volts * 1000,
  displacement: p.displacementNm / 1000,
  sweep: p.sweep,
}));
const columns = {
  voltsV: Float64Array.from(points, (p) => p.volts),
  displacementNm: Float64Array.from(points, (p) => p.displacementNm),
  sweep: Uint8Array.from(points, (p) => (p.sweep === 'up' ? 1 : 2)),
};
const unlimited = { maxPoints: Infinity };

const sample = fitCalibration(points, 'intercept', unlimited);
console.log(
  `fit of ${POINTS.toLocaleString('en')} points: gain ${sample.gainNmPerV.toFixed(3)} nm/V ` +
    `[${sample.gainCi95NmPerV.map((g) => g.toFixed(3)).join(', ')}], ` +
    `nonlinearity ${sample.nonlinearityPctFs?.toFixed(3)} %FS, hysteresis ${sample.hysteresisPctFs?.toFixed(3)} %FS`,
);
const median = time('fitCalibration (objects, nm)', () => fitCalibration(points, 'intercept', unlimited));
time('fitCalibration origin model', () => fitCalibration(points, 'origin', unlimited));
time('fitCalibrationInUnits (mV, µm)', () =>
  fitCalibrationInUnits({ points: recorded, voltageUnit: 'mV', displacementUnit: 'um' }, unlimited),
);
time('fitCalibrationColumns (typed)', () => fitCalibrationColumns(columns, 'intercept', unlimited));
console.log(`target: median ≤ ${TARGET_MEDIAN_MS} ms for fitCalibration → ${median <= TARGET_MEDIAN_MS ? 'met' : 'NOT met'}`);

// Sine fit of a 200 000-sample record (IEEE Std 1057 fits, issue 12's target ≤ 100 ms): 103 periods of 10.3 Hz
// at 10 kHz with noise on both channels, frequency unknown (four-parameter) and given (three-parameter).
function buildSineRecord(): SineFitInput {
  const rand = seededRandom(20261202);
  const gauss = (): number => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
  const w = 2 * Math.PI * 10.3;
  const samples = Array.from({ length: SINE_SAMPLES }, (_, i) => {
    const t = 0.25 + i / 10_000;
    return {
      timeS: t,
      volts: 3 + 60 * Math.sin(w * t + 0.4) + 0.3 * gauss(),
      displacement: 6.1 + 6.2 * Math.sin(w * t + 0.4 - 0.15) + 0.02 * gauss(),
    };
  });
  return { samples, voltageUnit: 'V', displacementUnit: 'um' };
}

const sine = buildSineRecord();
const sineSample = fitSineRecord(sine);
console.log(
  `sine fit of ${SINE_SAMPLES.toLocaleString('en')} samples: ${sineSample.frequencyHz.toFixed(6)} Hz after ${sineSample.iterations} iterations, ` +
    `gain ${sineSample.gainNmPerV.toFixed(3)} ± ${sineSample.gainStdUncNmPerV.toFixed(3)} nm/V (u), lag ${sineSample.phaseLagDeg.toFixed(3)}°`,
);
const sineMedian = time('fitSineRecord (frequency unknown)', () => fitSineRecord(sine));
time('fitSineRecord (frequency given)', () => fitSineRecord({ ...sine, frequencyHz: 10.3 }));
console.log(
  `target: median ≤ ${SINE_TARGET_MEDIAN_MS} ms for fitSineRecord of ${SINE_SAMPLES.toLocaleString('en')} samples → ${sineMedian <= SINE_TARGET_MEDIAN_MS ? 'met' : 'NOT met'}`,
);

// Lattice calibration of a 1024 × 1024 image (issue 18's target ≤ 1 s): a hexagonal 0.246 nm lattice at
// 0.012 × 0.013 nm/px, 2° skew, 12° rotation, noise of half the waves' amplitude.
const LATTICE_SIDE = 1024;
const LATTICE_TARGET_MEDIAN_MS = 1000;
function buildLatticeImage(): number[][] {
  const rand = seededRandom(18);
  const gauss = (): number => Math.sqrt(-2 * Math.log(1 - rand())) * Math.cos(2 * Math.PI * rand());
  const len = 2 / (Math.sqrt(3) * 0.246);
  const waves = [42, 102, 162].map((d) => [len * Math.cos((d * Math.PI) / 180), len * Math.sin((d * Math.PI) / 180)] as const);
  const skew = (2 * Math.PI) / 180;
  return Array.from({ length: LATTICE_SIDE }, (_, r) =>
    Array.from({ length: LATTICE_SIDE }, (_, c) => {
      const x = 0.012 * c - 0.013 * Math.sin(skew) * r;
      const y = 0.013 * Math.cos(skew) * r;
      return waves.reduce((z, [bx, by]) => z + Math.cos(2 * Math.PI * (bx * x + by * y)), 0.5 * gauss());
    }),
  );
}
const latticeImage = buildLatticeImage();
const latticeSample = analyseLattice(latticeImage, { kind: 'hexagonal', constantNm: 0.246 });
console.log(
  `lattice of ${LATTICE_SIDE} × ${LATTICE_SIDE}: ${latticeSample.nmPerPixel?.x.toFixed(5)} × ${latticeSample.nmPerPixel?.y.toFixed(5)} nm/px, ` +
    `skew ${latticeSample.skewDeg?.toFixed(2)}°, rotation ${latticeSample.rotationDeg.toFixed(2)}°`,
);
const latticeMedian = time('analyseLattice (1024 × 1024)', () => analyseLattice(latticeImage, { kind: 'hexagonal', constantNm: 0.246 }));
console.log(
  `target: median ≤ ${LATTICE_TARGET_MEDIAN_MS} ms for analyseLattice of ${LATTICE_SIDE} × ${LATTICE_SIDE} → ${latticeMedian <= LATTICE_TARGET_MEDIAN_MS ? 'met' : 'NOT met'}`,
);
