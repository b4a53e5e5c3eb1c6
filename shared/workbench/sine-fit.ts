// Sine fit of a recorded drive and displacement (a scope or data-acquisition export of a sine-driven
// actuator): gain = displacement amplitude ÷ drive amplitude, and the phase lag of the displacement.
// The steps live beside this file: sine-record.ts (checking and preparing the samples, the first frequency)
// and sine-least-squares.ts (the three- and four-parameter least squares, amplitudes and phases).
//
// Sources and choices:
// - Model y(t) = A·cos ωt + B·sin ωt + C per channel. Three-parameter fit at a known ω: linear least
//   squares in A, B, C; four-parameter fit: ω refined by Gauss–Newton, each step a least-squares solve
//   for A, B, C and Δω with the extra column t·(−A·sin ωt + B·cos ωt), started from a three-parameter
//   fit at an initial estimate [S: IEEE Std 1057-2017, Standard for Digitizing Waveform Recorders, the
//   three- and four-parameter sine-fit algorithms — the issue cites §4.1.3.1 / §4.1.3.3; memory for the
//   clause numbers, not checked against the standard's text]. The four-parameter algorithm comes close
//   to the Cramér–Rao bound for Gaussian noise and degrades for records of a fraction of a period
//   [S: P. Händel, "Properties of the IEEE-STD-1057 four-parameter sine wave fit algorithm", IEEE Trans.
//   Instrum. Meas. 49(6), 1189–1193 (2000)] — hence the two-period minimum below.
// - Amplitude R = √(A² + B²), phase φ = atan2(A, B), so y = R·sin(ωt + φ) + C (FIELD.md "Sine
//   recording"); phase lag = φ_drive − φ_displacement, wrapped to (−180°, 180°].
// - Initial frequency (unknown drive frequency): zero crossings of the drive with hysteresis of half
//   its rms, times interpolated linearly between samples [practice].
// - Numerics: time centred on the record's middle and the normal matrix scaled to a unit diagonal
//   before a Cholesky solve [practice; keeps the 3×3 and 4×4 systems well conditioned]. Typed arrays,
//   one trigonometric pass per iteration.
// - Uncertainties: covariance of the least-squares estimates σ²·(XᵀX)⁻¹ with σ² = SSE/(N − p)
//   [memory: the standard linear least-squares result, e.g. Draper & Smith, Applied Regression
//   Analysis], propagated to R and φ to first order [S: GUM, JCGM 100:2008, 5.1.2]. For evenly spaced
//   samples over whole periods this gives u(R) = σ·√(2/N) [calc]. The gain's relative uncertainties
//   of the two amplitudes add in quadrature (independent channels); the displacement channel is fitted
//   at the drive's frequency, taken as known.
import type { SineFitInput } from '../schemas/sine-fit.ts';
import { SineFitError } from './sine-fit-error.ts';
import { solveNormal } from './small-normal-solve.ts';
import { crossingFrequencyHz, prepareSineRecord } from './sine-record.ts';
import { fillTrig, fourParameterSystem, meanOf, polar, refineFrequency, sumSquaresAbout, threeParameterFit } from './sine-least-squares.ts';

/**
 * Fewest drive periods a record must span: "about two" — below two periods the four-parameter fit
 * separates frequency, phase and offset poorly (Händel 2000); 1.9 leaves room for a fitted frequency a
 * little under the true one [practice].
 */
export const MIN_RECORD_PERIODS = 1.9;

/**
 * Least share of the drive's variance the fitted sine must explain. A square-wave drive puts 8/π² ≈ 81 %
 * of its power in the fundamental and is refused; a triangle drive 96/π⁴ ≈ 98.6 % and passes [calc:
 * Fourier series]; a sine with noise of SD σ at amplitude R explains R²/(R² + 2σ²), so 90 % means
 * σ ≈ R/4.2 [calc]: beyond that the record is noise with a tone in it, not a sine drive [practice].
 */
export const MIN_EXPLAINED_FRACTION = 0.9;

/** The fit of one record: both channels at one frequency, the gain and the phase lag, with standard uncertainties (k = 1). */
export interface SineFit {
  n: number;
  frequencyHz: number;
  frequencyKnown: boolean;
  /** Standard uncertainty of the fitted frequency; null when the frequency was given. */
  frequencyStdUncHz: number | null;
  periods: number;
  samplesPerPeriod: number;
  /** Gauss–Newton steps of the four-parameter fit (0 when the frequency was given). */
  iterations: number;
  voltsAmplitudeV: number;
  voltsAmplitudeStdUncV: number;
  voltsOffsetV: number;
  voltsResidualStdV: number;
  /** Share of the drive's variance the fitted sine explains (R²). */
  voltsExplainedFraction: number;
  displacementAmplitudeNm: number;
  displacementAmplitudeStdUncNm: number;
  displacementOffsetNm: number;
  residualStdNm: number;
  /** R² of the displacement channel; null when the displacement is constant. */
  displacementExplainedFraction: number | null;
  gainNmPerV: number;
  gainStdUncNmPerV: number;
  phaseLagDeg: number;
  phaseLagStdUncDeg: number;
}

/** Options for callers that hold larger records than the API accepts. */
export interface SineFitOptions {
  maxSamples?: number;
}

const TWO_PI = 2 * Math.PI;
const DEG = 180 / Math.PI;

/** An angle in degrees wrapped to (−180, 180]. */
export function wrapDegrees(deg: number): number {
  const w = ((((deg + 180) % 360) + 360) % 360) - 180;
  return w === -180 ? 180 : w;
}

/**
 * Fits the drive (volts) with the three-parameter fit at the given frequency, or the four-parameter fit
 * when none is given, then the displacement at the same frequency; refuses records it cannot use with a
 * SineFitError (see sine-fit-error.ts).
 */
export function fitSineRecord(input: SineFitInput, options?: SineFitOptions): SineFit {
  const rec = prepareSineRecord(input, options?.maxSamples ?? Number.POSITIVE_INFINITY);
  const { n } = rec;
  const vMean = meanOf(rec.v);
  const vSst = sumSquaresAbout(rec.v, vMean);
  if (!(vSst > 0))
    throw new SineFitError('no_clear_sine', 'The drive channel is constant: there is no sine to fit.', { explainedFraction: 0 });
  const tooShort = (periods: number) =>
    new SineFitError(
      'record_too_short',
      `The record spans ${periods < 0.1 ? 'less than a tenth of a period' : `about ${Number(periods.toPrecision(2))} periods`} of the drive; record at least two.`,
      { periods },
    );

  const c = new Float64Array(n);
  const s = new Float64Array(n);
  let omega: number;
  let iterations = 0;
  const known = input.frequencyHz !== undefined;
  if (input.frequencyHz !== undefined) {
    omega = TWO_PI * input.frequencyHz;
    const periods = input.frequencyHz * rec.durationS;
    if (periods < MIN_RECORD_PERIODS) throw tooShort(periods);
  } else {
    const f0 = crossingFrequencyHz(rec, vMean, Math.sqrt(vSst / n));
    if (f0 === null) throw tooShort(0);
    if (f0 * rec.durationS < MIN_RECORD_PERIODS) throw tooShort(f0 * rec.durationS);
    fillTrig(rec.t, TWO_PI * f0, c, s);
    const start = threeParameterFit(c, s, rec.v, vMean);
    ({ omega, iterations } = refineFrequency(rec.t, rec.v, rec.halfSpanS, vMean, TWO_PI * f0, start));
  }

  const frequencyHz = omega / TWO_PI;
  const periods = frequencyHz * rec.durationS;
  if (periods < MIN_RECORD_PERIODS) throw tooShort(periods);
  fillTrig(rec.t, omega, c, s);
  const drive = threeParameterFit(c, s, rec.v, vMean);
  const explained = 1 - drive.sse / vSst;
  if (explained < MIN_EXPLAINED_FRACTION) {
    throw new SineFitError(
      'no_clear_sine',
      `The fitted sine explains only ${Math.max(0, Math.round(explained * 100))} % of the drive channel (at least ${MIN_EXPLAINED_FRACTION * 100} % needed): ` +
        'the drive is noise, not a clean sine, or the frequency is wrong.',
      { explainedFraction: explained },
    );
  }
  const xMean = meanOf(rec.x);
  const xSst = sumSquaresAbout(rec.x, xMean);
  const disp = threeParameterFit(c, s, rec.x, xMean);

  // Drive covariance: the four-parameter system at the solution when ω was fitted (σ² on N − 4), else the three-parameter one.
  let driveInverse = drive.inverse;
  let driveSize = 3;
  let frequencyStdUncHz: number | null = null;
  const driveDf = known ? n - 3 : n - 4;
  const driveSigma2 = drive.sse / driveDf;
  if (!known) {
    const { m } = fourParameterSystem(rec.t, rec.v, vMean, omega, drive.a, drive.b, [c, s]);
    const solved = solveNormal(m, new Float64Array(4), 4);
    if (solved) {
      driveInverse = solved.inverse;
      driveSize = 4;
      frequencyStdUncHz = Math.sqrt(Math.max(0, driveSigma2 * solved.inverse[15])) / TWO_PI;
    }
  }
  const dispSigma2 = disp.sse / (n - 3);
  const dv = polar(drive, driveSigma2, driveInverse, driveSize);
  const dx = polar(disp, dispSigma2, disp.inverse, 3);
  const gain = dx.amplitude / dv.amplitude;
  const relGain = Math.hypot(dx.amplitude > 0 ? dx.amplitudeStdUnc / dx.amplitude : 0, dv.amplitudeStdUnc / dv.amplitude);
  return {
    n,
    frequencyHz,
    frequencyKnown: known,
    frequencyStdUncHz,
    periods,
    samplesPerPeriod: n / periods,
    iterations,
    voltsAmplitudeV: dv.amplitude,
    voltsAmplitudeStdUncV: dv.amplitudeStdUnc,
    voltsOffsetV: drive.offset,
    voltsResidualStdV: Math.sqrt(driveSigma2),
    voltsExplainedFraction: explained,
    displacementAmplitudeNm: dx.amplitude,
    displacementAmplitudeStdUncNm: dx.amplitudeStdUnc,
    displacementOffsetNm: disp.offset,
    residualStdNm: Math.sqrt(dispSigma2),
    displacementExplainedFraction: xSst > 0 ? 1 - disp.sse / xSst : null,
    gainNmPerV: gain,
    gainStdUncNmPerV: dx.amplitude > 0 ? gain * relGain : dx.amplitudeStdUnc / dv.amplitude,
    phaseLagDeg: wrapDegrees((dv.phase - dx.phase) * DEG),
    phaseLagStdUncDeg: Math.hypot(dv.phaseStdUnc, dx.phaseStdUnc) * DEG,
  };
}

/**
 * The four-parameter fit of one channel from a given start frequency (the IEEE 1057 iteration on its
 * own, for checks and for callers with a start of their own): frequency, amplitude, offset, and the
 * phase φ at t = 0 of `timeS`, in y = R·sin(2πf·t + φ) + C. Times must increase; refusals as fitSineRecord's.
 */
export function fourParameterSineFit(
  timeS: ArrayLike<number>,
  values: ArrayLike<number>,
  startHz: number,
): { frequencyHz: number; amplitude: number; offset: number; phaseRad: number; iterations: number } {
  const n = timeS.length;
  const mid = timeS[0] + (timeS[n - 1] - timeS[0]) / 2;
  const t = Float64Array.from(timeS, (v) => v - mid);
  const y = Float64Array.from(values);
  const mean = meanOf(y);
  const c = new Float64Array(n);
  const s = new Float64Array(n);
  fillTrig(t, TWO_PI * startHz, c, s);
  const start = threeParameterFit(c, s, y, mean);
  const { omega, iterations } = refineFrequency(t, y, (timeS[n - 1] - timeS[0]) / 2, mean, TWO_PI * startHz, start);
  fillTrig(t, omega, c, s);
  const fit = threeParameterFit(c, s, y, mean);
  const phase = wrapDegrees((Math.atan2(fit.a, fit.b) - omega * mid) * DEG) / DEG;
  return { frequencyHz: omega / TWO_PI, amplitude: Math.hypot(fit.a, fit.b), offset: fit.offset, phaseRad: phase, iterations };
}

/** What the loop ellipse needs of a fit (also what a stored sine-record run keeps). */
export type SineLoopFigures = Pick<
  SineFit,
  'voltsAmplitudeV' | 'voltsOffsetV' | 'displacementAmplitudeNm' | 'displacementOffsetNm' | 'phaseLagDeg'
>;

/**
 * The fitted loop for plotting: `points` evenly spaced phases of V = V₀ + R_V·sin θ against
 * x = x₀ + R_x·sin(θ − lag), closed (the first point repeated at the end) [calc from the model above].
 */
export function sineLoopEllipse(fit: SineLoopFigures, points = 200): { volts: number; displacementNm: number }[] {
  const lag = fit.phaseLagDeg / DEG;
  return Array.from({ length: points + 1 }, (_, i) => {
    const theta = (TWO_PI * (i % points)) / points;
    return {
      volts: fit.voltsOffsetV + fit.voltsAmplitudeV * Math.sin(theta),
      displacementNm: fit.displacementOffsetNm + fit.displacementAmplitudeNm * Math.sin(theta - lag),
    };
  });
}
