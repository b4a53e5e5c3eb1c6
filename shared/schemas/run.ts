import { z } from 'zod';
import { multiLine, singleLine } from './text.ts';
import { fitInput, fitPoint, type FitPoint, type FitResultDto } from './workbench.ts';
import { sineSample } from './sine-fit.ts';
import { imageVector, latticeRunFigures, type LatticeRunFiguresDto } from './lattice.ts';
import { displacementUnits, voltageUnits, type DisplacementUnit, type VoltageUnit } from '../units.ts';
import { RUN_METHODS, type RunMethod, type RunStatus, type RunKind, MAX_RUN_POINTS } from './run-vocabulary.ts';

/** DC steps, or a sine with its frequency and amplitude. */
export const runDrive = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('dc-steps') }),
  z.strictObject({ kind: z.literal('sine'), frequencyHz: z.number().positive().max(1e7), amplitudeV: z.number().positive().max(5000) }),
]);
export type RunDrive = z.infer<typeof runDrive>;

export const runConditions = z.strictObject({
  preload: singleLine(200).optional(),
  temperatureC: z.number().min(-273.15).max(1000).optional(),
  notes: multiLine(2000).trim().optional(),
});
export type RunConditions = z.infer<typeof runConditions>;

/** A calendar date (YYYY-MM-DD) not in the future by more than a day (time zones). */
const measuredOn = z.iso
  .date()
  .refine((d) => Date.parse(`${d}T00:00:00Z`) <= Date.now() + 86_400_000, { message: 'The measurement date is in the future.' });

/** What every kind of run carries besides its data. */
const runCommon = {
  method: z.enum(RUN_METHODS),
  drive: runDrive.optional(),
  conditions: runConditions.optional(),
  notes: multiLine(4000).trim().optional(),
  measuredOn: measuredOn.optional(),
};

/** Calibration points; the server fits them (the shape runs have always had: `kind` may be left out). */
export const pointsRunInput = z.strictObject({
  kind: z.literal('points').default('points'),
  ...fitInput.shape,
  points: z.array(fitPoint).min(3).max(MAX_RUN_POINTS),
  ...runCommon,
});

/** One peak-to-peak reading of a sine drive, in the run's units, with the reading resolutions. */
export const peakToPeakRunInput = z.strictObject({
  kind: z.literal('peak-to-peak'),
  displacementPp: z.number().positive(),
  voltsPp: z.number().positive(),
  displacementUnit: z.enum(displacementUnits),
  voltageUnit: z.enum(voltageUnits).default('V'),
  displacementResolution: z.number().nonnegative(),
  voltsResolution: z.number().nonnegative().optional(),
  frequencyHz: z.number().positive().max(1e7).optional(),
  ...runCommon,
});

/** A sampled record of drive volts and displacement against time; the server fits a sine to each channel. */
export const sineRecordRunInput = z.strictObject({
  kind: z.literal('sine-record'),
  samples: z.array(sineSample).min(8).max(MAX_RUN_POINTS),
  displacementUnit: z.enum(displacementUnits),
  voltageUnit: z.enum(voltageUnits).default('V'),
  frequencyHz: z.number().positive().max(1e7).optional(),
  ...runCommon,
});

/**
 * The lattice of a reference sample in a scan image: the reciprocal vectors measured on the whole image and on
 * its quarters (cycles per pixel, as the lattice page finds them), the image's size and the drive span of each
 * axis. The server solves the pixel → nm map and the ± from them (lattice-figures.ts). The run counts with the
 * gain of its actuator's axis: x or y, or for an XY actuator the mean of the two (a part that drives both).
 */
export const latticeRunInput = z.strictObject({
  kind: z.literal('lattice'),
  lattice: latticeRunFigures.shape.lattice,
  image: latticeRunFigures.shape.image,
  scanSpanV: latticeRunFigures.shape.scanSpanV,
  peaks: z.array(imageVector).length(2),
  quadrantPeaks: z.array(z.array(imageVector).length(2)).min(3).max(4),
  voltageUnit: z.literal('V').default('V'),
  displacementUnit: z.literal('nm').default('nm'),
  ...runCommon,
  method: z.literal('reference-sample').default('reference-sample'),
});

/** A calibration run as recorded; the server computes the fit from it. */
export const createRunInput = z.discriminatedUnion('kind', [pointsRunInput, peakToPeakRunInput, sineRecordRunInput, latticeRunInput]);
export type CreateRunInput = z.infer<typeof createRunInput>;
export type PointsRunInput = z.infer<typeof pointsRunInput>;
export type PeakToPeakRunInput = z.infer<typeof peakToPeakRunInput>;
export type SineRecordRunInput = z.infer<typeof sineRecordRunInput>;
export type LatticeRunInput = z.infer<typeof latticeRunInput>;

/**
 * A change to a run: any of its recorded fields (of its own kind; `kind` cannot change). The server merges
 * it over what is stored, validates the whole run again and refits it.
 */
export const updateRunInput = z
  .strictObject({
    method: runCommon.method.optional(),
    drive: runDrive.nullable().optional(),
    conditions: runConditions.nullable().optional(),
    notes: multiLine(4000).trim().nullable().optional(),
    measuredOn: measuredOn.nullable().optional(),
    voltageUnit: z.enum(voltageUnits).optional(),
    displacementUnit: z.enum(displacementUnits).optional(),
    model: fitInput.shape.model.unwrap().optional(),
    points: pointsRunInput.shape.points.optional(),
    displacementPp: z.number().positive().optional(),
    voltsPp: z.number().positive().optional(),
    displacementResolution: z.number().nonnegative().optional(),
    voltsResolution: z.number().nonnegative().nullable().optional(),
    frequencyHz: z.number().positive().max(1e7).nullable().optional(),
    samples: sineRecordRunInput.shape.samples.optional(),
  })
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change.' });
export type UpdateRunInput = z.infer<typeof updateRunInput>;

/** What a workbench page hands over to be recorded: a run's data of its kind, without method, drive or conditions. */
export type RunRecordData =
  | Pick<PointsRunInput, 'kind' | 'points' | 'voltageUnit' | 'displacementUnit' | 'model'>
  | Pick<
      PeakToPeakRunInput,
      | 'kind'
      | 'displacementPp'
      | 'voltsPp'
      | 'displacementUnit'
      | 'voltageUnit'
      | 'displacementResolution'
      | 'voltsResolution'
      | 'frequencyHz'
    >
  | Pick<SineRecordRunInput, 'kind' | 'samples' | 'voltageUnit' | 'displacementUnit' | 'frequencyHz'>
  | Pick<LatticeRunInput, 'kind' | 'lattice' | 'image' | 'scanSpanV' | 'peaks' | 'quadrantPeaks'>;

export const runIdParams = z.strictObject({ runId: z.coerce.number().int().positive() });

export const RUN_EXPORT_FORMATS = ['csv', 'json'] as const;
export const runExportQuery = z.strictObject({ format: z.enum(RUN_EXPORT_FORMATS).default('csv') });

/** What a peak-to-peak run recorded (in its own units). */
export interface PeakToPeakReadingDto {
  displacementPp: number;
  voltsPp: number;
  displacementResolution: number;
  voltsResolution: number | null;
  frequencyHz: number | null;
}

/** The sine fit of a sine-record run (IEEE Std 1057 fit, SI units). */
export interface SineRecordFitDto {
  frequencyHz: number;
  frequencyKnown: boolean;
  periods: number;
  voltsAmplitudeV: number;
  voltsOffsetV: number;
  displacementAmplitudeNm: number;
  displacementOffsetNm: number;
  phaseLagDeg: number;
}

/**
 * A stored fit. Point runs have the least-squares figures and a 95 % interval; peak-to-peak and sine
 * runs have a standard uncertainty (k = 1) instead (`gainCi95NmPerV` null), peak-to-peak runs also
 * the worst-case bounds, sine runs the sine fit, lattice runs both axes' figures.
 */
export interface RunFitDto extends Omit<FitResultDto, 'gainCi95NmPerV'> {
  gainCi95NmPerV: [number, number] | null;
  gainStdUncertaintyNmPerV: number;
  gainBoundsNmPerV?: [number, number];
  sine?: SineRecordFitDto;
  lattice?: LatticeRunFiguresDto;
}

/** A point of the plot series a page draws: the recorded points, or a decimated series of a large run or record. */
export type RunPlotPoint = FitPoint;

export interface RunDto {
  id: number;
  actuatorId: number;
  buildId: number;
  partId: number;
  kind: RunKind;
  status: RunStatus;
  method: RunMethod;
  voltageUnit: VoltageUnit;
  displacementUnit: DisplacementUnit;
  model: 'intercept' | 'origin';
  drive: RunDrive | null;
  conditions: RunConditions | null;
  notes: string | null;
  measuredOn: string | null;
  fit: RunFitDto;
  /** Points or samples recorded (the raw record is in the export). */
  pointCount: number;
  /** The plot series in the run's units: every point of a small run, else at most PLOT_POINTS chosen by LTTB. */
  points: RunPlotPoint[];
  decimated: boolean;
  reading: PeakToPeakReadingDto | null;
  reviewNote: string | null;
  createdAt: string;
  updatedAt: string;
}
