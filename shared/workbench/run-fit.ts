// The fit stored with a calibration run, for each kind of run. The server computes it at write time
// and the pages preview it with the same code, so a stored run equals what the page showed.
// - points: least-squares gain fit (calibration-fit.ts: NIST StRD conventions, ISA-51.1 terms);
// - peak-to-peak: Δx_pp / ΔV_pp with the resolution-limited standard uncertainty, each reading
//   rectangular ±r/2 so a difference of two readings has u = r/√6, and the exact worst-case bounds
//   (peak-to-peak.ts) [S: JCGM 100:2008 (GUM) 4.3.7, 5.1.2 — memory for the clauses];
// - sine-record: the IEEE Std 1057 sine fit of each channel (sine-fit.ts), gain = displacement
//   amplitude ÷ drive amplitude;
// - lattice: both lateral axes solved from the image's reciprocal vectors (lattice-run-fit.ts).
import type { ActuatorAxis } from '../schemas/actuator-vocabulary.ts';
import type { LatticeRunFiguresDto } from '../schemas/lattice.ts';
import type { CreateRunInput, PeakToPeakRunInput, RunPlotPoint, SineRecordFitDto } from '../schemas/run.ts';
import { toNm, toVolts } from '../units.ts';
import { lttb } from '../stats/lttb.ts';
import { fitCalibrationInUnits } from './calibration-fit.ts';
import { peakToPeakGain } from './peak-to-peak.ts';
import { fitSineRecord } from './sine-fit.ts';
import { fitLatticeRun } from './lattice-run-fit.ts';

/** Points a stored plot series holds at most (LTTB keeps the shape; the raw record is in the export). */
export const PLOT_POINTS = 2000;

/** The fit columns every kind of run stores; kind-specific figures ride along. */
export interface RunFit {
  n: number;
  gainNmPerV: number;
  /** Standard error of the slope (points) or standard uncertainty (peak-to-peak, sine), k = 1. */
  gainStdUncertaintyNmPerV: number;
  gainCi95NmPerV: [number, number] | null;
  interceptNm: number;
  r2: number | null;
  residualStdNm: number | null;
  spanNm: number;
  nonlinearityPctFs: number | null;
  hysteresisPctFs: number | null;
  gainBoundsNmPerV?: [number, number];
  sine?: SineRecordFitDto;
  lattice?: LatticeRunFiguresDto;
}

/** Gain of one peak-to-peak reading, in the run's units. */
export function fitPeakToPeakRun(input: PeakToPeakRunInput): RunFit {
  const dxNm = toNm(input.displacementPp, input.displacementUnit);
  const dvV = toVolts(input.voltsPp, input.voltageUnit);
  const rxNm = toNm(input.displacementResolution, input.displacementUnit);
  const rvV = input.voltsResolution === undefined ? undefined : toVolts(input.voltsResolution, input.voltageUnit);
  const g = peakToPeakGain({ displacementPpNm: dxNm, voltsPpV: dvV, displacementResolutionNm: rxNm, voltsResolutionV: rvV });
  return {
    n: 2,
    gainNmPerV: g.gainNmPerV,
    gainStdUncertaintyNmPerV: g.gainStdUncNmPerV,
    gainCi95NmPerV: null,
    interceptNm: 0,
    r2: null,
    residualStdNm: null,
    spanNm: dxNm,
    nonlinearityPctFs: null,
    hysteresisPctFs: null,
    gainBoundsNmPerV: g.gainBoundsNmPerV,
  };
}

/**
 * The fit stored with a run of any kind (throws the fits' own refusals, which the API turns into 400s). A
 * lattice run needs its actuator's axis: it says which gain the run counts with (without one, the mean of x and y).
 */
export function fitRun(input: CreateRunInput, axis?: ActuatorAxis): RunFit {
  if (input.kind === 'peak-to-peak') return fitPeakToPeakRun(input);
  if (input.kind === 'lattice') {
    const l = fitLatticeRun(input, axis ?? 'XY');
    return {
      n: 2,
      gainNmPerV: l.gainNmPerV,
      gainStdUncertaintyNmPerV: l.gainStdUncertaintyNmPerV,
      gainCi95NmPerV: null,
      interceptNm: 0,
      r2: null,
      residualStdNm: null,
      spanNm: l.spanNm,
      nonlinearityPctFs: null,
      hysteresisPctFs: null,
      lattice: l.lattice,
    };
  }
  if (input.kind === 'sine-record') {
    const s = fitSineRecord({
      samples: input.samples,
      voltageUnit: input.voltageUnit,
      displacementUnit: input.displacementUnit,
      ...(input.frequencyHz !== undefined ? { frequencyHz: input.frequencyHz } : {}),
    });
    return {
      n: s.n,
      gainNmPerV: s.gainNmPerV,
      gainStdUncertaintyNmPerV: s.gainStdUncNmPerV,
      gainCi95NmPerV: null,
      interceptNm: s.displacementOffsetNm,
      r2: null,
      residualStdNm: s.residualStdNm,
      spanNm: 2 * s.displacementAmplitudeNm,
      nonlinearityPctFs: null,
      hysteresisPctFs: null,
      sine: {
        frequencyHz: s.frequencyHz,
        frequencyKnown: s.frequencyKnown,
        periods: s.periods,
        voltsAmplitudeV: s.voltsAmplitudeV,
        voltsOffsetV: s.voltsOffsetV,
        displacementAmplitudeNm: s.displacementAmplitudeNm,
        displacementOffsetNm: s.displacementOffsetNm,
        phaseLagDeg: s.phaseLagDeg,
      },
    };
  }
  const f = fitCalibrationInUnits(input, { maxPoints: input.points.length });
  return {
    n: f.n,
    gainNmPerV: f.gainNmPerV,
    gainStdUncertaintyNmPerV: f.gainStdErrNmPerV,
    gainCi95NmPerV: f.gainCi95NmPerV,
    interceptNm: f.interceptNm,
    r2: f.r2,
    residualStdNm: f.residualStdNm,
    spanNm: f.spanNm,
    nonlinearityPctFs: f.nonlinearityPctFs,
    hysteresisPctFs: f.hysteresisPctFs,
  };
}

/** Points or samples a run holds (what counts against the per-run and per-build limits). */
export function recordedCount(input: CreateRunInput): number {
  if (input.kind === 'points') return input.points.length;
  if (input.kind === 'sine-record') return input.samples.length;
  if (input.kind === 'lattice') return input.peaks.length * (1 + input.quadrantPeaks.length);
  return 2;
}

/**
 * The series a page plots, in the run's units: a point run's points, a sine record's (drive, displacement)
 * loop, or nothing for a peak-to-peak reading or a lattice image; at most `max` points, chosen by LTTB along the
 * record.
 */
export function plotSeries(input: CreateRunInput, max = PLOT_POINTS): RunPlotPoint[] {
  if (input.kind === 'peak-to-peak' || input.kind === 'lattice') return [];
  const series: RunPlotPoint[] =
    input.kind === 'points' ? input.points : input.samples.map((s) => ({ volts: s.volts, displacement: s.displacement }));
  return lttb(series, max, (p) => p.displacement);
}

/** A stored plot series thinned further for a page that shows many runs at once. */
export function thinPlot(points: readonly RunPlotPoint[], max: number): RunPlotPoint[] {
  return lttb(points, Math.max(3, max), (p) => p.displacement);
}
