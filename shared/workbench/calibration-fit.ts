// Gain fit of a calibration run: displacement x (nm) against drive V (volts).
// Definitions follow FIELD.md "Calibration fit":
// - least squares with or without intercept, se(b), R² (uncentred through the origin), and the
//   95 % interval b ± t(0.975, df)·se(b), df = n − 2 or n − 1 [S: NIST/ITL StRD conventions];
// - nonlinearity (independent linearity on the calibration curve) = max over distinct voltages of
//   |mean reading at V (up and down sweeps averaged) − (a + b·V)| / span × 100 %,
//   span = |b|·(Vmax − Vmin), the line fitted through all points [S: ISA-51.1 / ANSI/ISA-S37.1 terms:
//   linearity is judged on the calibration curve, the average of upscale and downscale readings —
//   memory for the clause]; a single sweep read once per voltage gives max |residual| / span;
// - hysteresis = max over voltages present in both sweeps of |mean x_up(V) − mean x_down(V)| /
//   span × 100 % [practice; how loop width is quoted].
import type { FitResultDto } from '../schemas/workbench.ts';
import { toNm, toVolts, type DisplacementUnit, type VoltageUnit } from '../units.ts';
import { FitInputError, MAX_FIT_POINTS, MIN_FIT_POINTS } from './fit-input-error.ts';
import { fitLineColumns, type FitModel } from './line-fit.ts';
import { groupByVoltage, maxCurveDeviationNm, maxSweepGapNm } from './voltage-groups.ts';
import { tCritical95 } from './student-t.ts';

/** Direction of the drive sweep a point was taken on; hysteresis needs both. */
export type Sweep = 'up' | 'down';

/** One calibration point already in volts and nanometres. */
export interface CalibrationPoint {
  volts: number;
  displacementNm: number;
  sweep?: Sweep;
}

/** One calibration point as recorded, in the run's own units. */
export interface RecordedCalibrationPoint {
  volts: number;
  displacement: number;
  sweep?: Sweep;
}

/** Column form of a run, the zero-copy input for large records (e.g. parsed CSV). */
export interface CalibrationColumns {
  voltsV: Float64Array;
  displacementNm: Float64Array;
  sweep?: Uint8Array;
}

/** Knobs for the fit: the API limit (raise it only for trusted callers) and residual output. */
export interface FitOptions {
  maxPoints?: number;
  includeResiduals?: boolean;
}

/** Full result of a gain fit; `FitResultDto` is the subset the API returns. */
export interface CalibrationFit {
  model: FitModel;
  n: number;
  df: number;
  gainNmPerV: number;
  gainStdErrNmPerV: number;
  gainCi95NmPerV: [number, number];
  tCritical95: number;
  interceptNm: number;
  interceptStdErrNm: number | null;
  /** null when the sum of squares it divides by is zero (all displacements equal / all zero). */
  r2: number | null;
  residualStdNm: number;
  residualSumSquaresNm2: number;
  spanNm: number;
  voltsMinV: number;
  voltsMaxV: number;
  /** Independent linearity on the calibration curve (% of span); null when the span is zero. */
  nonlinearityPctFs: number | null;
  /** null when no voltage appears in both sweeps, or the span is zero. */
  hysteresisPctFs: number | null;
  /** End points of the fitted line over [Vmin, Vmax], for plotting. */
  lineNm: [number, number];
  residualsNm?: number[];
}

// Packing buffers reused between calls so a large fit allocates nothing per point and leaves
// no garbage; they grow to the largest run fitted (17 bytes per point) and are never exposed.
let scratch: { v: Float64Array; x: Float64Array; sweep: Uint8Array } | null = null;

function scratchColumns(n: number): { v: Float64Array; x: Float64Array; sweep: Uint8Array } {
  if (!scratch || scratch.v.length < n) {
    scratch = { v: new Float64Array(n), x: new Float64Array(n), sweep: new Uint8Array(n) };
  }
  return scratch;
}

function checkCount(n: number, options: FitOptions | undefined): void {
  if (n < MIN_FIT_POINTS) {
    throw new FitInputError('too_few_points', `A fit needs at least ${MIN_FIT_POINTS} points.`);
  }
  const max = options?.maxPoints ?? MAX_FIT_POINTS;
  if (n > max) throw new FitInputError('too_many_points', `A fit takes at most ${max} points.`);
}

function nonFinite(index: number, field: 'volts' | 'displacement'): FitInputError {
  return new FitInputError('non_finite_value', `Point ${index + 1} has a ${field} that is not a finite number.`, {
    index,
    field,
  });
}

/** Fits gain from points in volts and nm: the entry point for the client's live preview. */
export function fitCalibration(points: readonly CalibrationPoint[], model: FitModel = 'intercept', options?: FitOptions): CalibrationFit {
  const n = points.length;
  checkCount(n, options);
  const { v, x, sweep } = scratchColumns(n);
  let sweeps = 0;
  for (let i = 0; i < n; i++) {
    const p = points[i];
    const vi = p.volts;
    const xi = p.displacementNm;
    if (!Number.isFinite(vi)) throw nonFinite(i, 'volts');
    if (!Number.isFinite(xi)) throw nonFinite(i, 'displacement');
    v[i] = vi;
    x[i] = xi;
    const code = p.sweep === 'up' ? 1 : p.sweep === 'down' ? 2 : 0;
    sweep[i] = code;
    sweeps |= code;
  }
  return fitPacked(v, x, sweeps === 0 ? null : sweep, n, model, options);
}

/** Fits gain from points in their recorded units (V or mV; nm, µm, Å, µin, mil): the API path. */
export function fitCalibrationInUnits(
  input: {
    points: readonly RecordedCalibrationPoint[];
    voltageUnit?: VoltageUnit;
    displacementUnit: DisplacementUnit;
    model?: FitModel;
  },
  options?: FitOptions,
): CalibrationFit {
  const { points, displacementUnit } = input;
  const voltageUnit = input.voltageUnit ?? 'V';
  const n = points.length;
  checkCount(n, options);
  const { v, x, sweep } = scratchColumns(n);
  let sweeps = 0;
  for (let i = 0; i < n; i++) {
    const p = points[i];
    if (!Number.isFinite(p.volts)) throw nonFinite(i, 'volts');
    if (!Number.isFinite(p.displacement)) throw nonFinite(i, 'displacement');
    v[i] = toVolts(p.volts, voltageUnit);
    x[i] = toNm(p.displacement, displacementUnit);
    if (!Number.isFinite(x[i])) {
      throw new FitInputError('numeric_overflow', `Point ${i + 1} is too large to convert to nm.`, {
        index: i,
        field: 'displacement',
      });
    }
    const code = p.sweep === 'up' ? 1 : p.sweep === 'down' ? 2 : 0;
    sweep[i] = code;
    sweeps |= code;
  }
  return fitPacked(v, x, sweeps === 0 ? null : sweep, n, input.model ?? 'intercept', options);
}

/** Fits gain from typed-array columns without copying: the fast path for large records. */
export function fitCalibrationColumns(columns: CalibrationColumns, model: FitModel = 'intercept', options?: FitOptions): CalibrationFit {
  const { voltsV, displacementNm } = columns;
  const n = voltsV.length;
  if (displacementNm.length !== n || (columns.sweep && columns.sweep.length !== n)) {
    throw new RangeError('columns must have equal lengths');
  }
  checkCount(n, options);
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(voltsV[i])) throw nonFinite(i, 'volts');
    if (!Number.isFinite(displacementNm[i])) throw nonFinite(i, 'displacement');
  }
  return fitPacked(voltsV, displacementNm, columns.sweep ?? null, n, model, options);
}

function fitPacked(
  v: Float64Array,
  x: Float64Array,
  sweep: Uint8Array | null,
  n: number,
  model: FitModel,
  options: FitOptions | undefined,
): CalibrationFit {
  const v0 = v[0];
  let allEqual = true;
  for (let i = 1; i < n; i++) {
    if (v[i] !== v0) {
      allEqual = false;
      break;
    }
  }
  if (allEqual) throw new FitInputError('voltages_all_equal', 'All voltages are equal; a gain needs at least two.');

  const residuals = options?.includeResiduals ? new Float64Array(n) : undefined;
  const line = fitLineColumns(v, x, n, model, residuals);
  const gain = line.slope;
  const t = tCritical95(line.df);
  const halfWidth = t * line.slopeStdErr;
  const spanNm = Math.abs(gain) * (line.xMax - line.xMin);
  const groups = groupByVoltage(v, x, sweep, n);
  const gapNm = maxSweepGapNm(groups);
  const deviationNm = maxCurveDeviationNm(groups, line.intercept, gain);
  if (![gain, line.slopeStdErr, line.residualStd, line.intercept, spanNm].every(Number.isFinite)) {
    throw new FitInputError('numeric_overflow', 'The values are too large to fit in double precision.');
  }
  return {
    model,
    n,
    df: line.df,
    gainNmPerV: gain,
    gainStdErrNmPerV: line.slopeStdErr,
    gainCi95NmPerV: [gain - halfWidth, gain + halfWidth],
    tCritical95: t,
    interceptNm: line.intercept,
    interceptStdErrNm: line.interceptStdErr,
    r2: line.r2,
    residualStdNm: line.residualStd,
    residualSumSquaresNm2: line.residualSumSquares,
    spanNm,
    voltsMinV: line.xMin,
    voltsMaxV: line.xMax,
    nonlinearityPctFs: spanNm > 0 ? (deviationNm / spanNm) * 100 : null,
    hysteresisPctFs: gapNm !== null && spanNm > 0 ? (gapNm / spanNm) * 100 : null,
    lineNm: [line.intercept + gain * line.xMin, line.intercept + gain * line.xMax],
    ...(residuals ? { residualsNm: Array.from(residuals) } : {}),
  };
}

/** The allow-listed fields the API returns for a fit, so server and client agree on the shape. */
export function toFitResultDto(fit: CalibrationFit): FitResultDto {
  return {
    n: fit.n,
    gainNmPerV: fit.gainNmPerV,
    gainStdErrNmPerV: fit.gainStdErrNmPerV,
    gainCi95NmPerV: [fit.gainCi95NmPerV[0], fit.gainCi95NmPerV[1]],
    interceptNm: fit.interceptNm,
    r2: fit.r2,
    residualStdNm: fit.residualStdNm,
    spanNm: fit.spanNm,
    nonlinearityPctFs: fit.nonlinearityPctFs,
    hysteresisPctFs: fit.hysteresisPctFs,
  };
}
