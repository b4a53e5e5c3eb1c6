// Inputs of the workbench calculators: one zod schema each, shared by the client forms and the
// server routes. zod 4's z.number() rejects NaN and ±Infinity as well as strings and null.
// The fit's "all voltages equal" rule is not a schema refine: the fit itself throws
// FitInputError('voltages_all_equal'), which the server maps to a 400 (see fit-input-error.ts).
import { z } from 'zod';
import { convertibleUnits, displacementUnits, kindOfUnit, unitKey, voltageUnits } from '../units.ts';
import { MAX_FIT_POINTS, MIN_FIT_POINTS } from '../workbench/fit-input-error.ts';
import { materialKeys } from '../workbench/materials.ts';

const positive = z.number().positive();
const nonNegative = z.number().nonnegative();

/** Largest sample count the creep and mixing fits accept per request. */
export const MAX_WORKBENCH_SAMPLES = 10_000;

/** One recorded calibration point in the run's own units. */
export const fitPoint = z.strictObject({
  volts: z.number(),
  displacement: z.number(),
  sweep: z.enum(['up', 'down']).optional(),
});
/** Parsed (defaults applied) FitPoint as the service and the form receive it. */
export type FitPoint = z.infer<typeof fitPoint>;

/** Body of the gain-fit API and the fit form. */
export const fitInput = z.strictObject({
  points: z.array(fitPoint).min(MIN_FIT_POINTS).max(MAX_FIT_POINTS),
  voltageUnit: z.enum(voltageUnits).default('V'),
  displacementUnit: z.enum(displacementUnits),
  model: z.enum(['intercept', 'origin']).default('intercept'),
});

/** What the fit API returns (a subset of CalibrationFit; r2 and the % of span figures may be null). */
export interface FitResultDto {
  n: number;
  gainNmPerV: number;
  gainStdErrNmPerV: number;
  gainCi95NmPerV: [number, number];
  interceptNm: number;
  r2: number | null;
  residualStdNm: number;
  spanNm: number;
  nonlinearityPctFs: number | null;
  hysteresisPctFs: number | null;
}

/** Peak-to-peak method (sine drive) with reading resolutions. */
export const peakToPeakInput = z.strictObject({
  displacementPpNm: positive,
  voltsPpV: positive,
  displacementResolutionNm: nonNegative,
  voltsResolutionV: nonNegative.optional(),
});

/** Step-and-hold record for the creep fit. */
export const creepInput = z.strictObject({
  samples: z
    .array(z.strictObject({ timeS: positive, displacementNm: z.number() }))
    .min(3)
    .max(MAX_WORKBENCH_SAMPLES),
  /** A later time (s) to project the creep to, besides 10, 100 and 1000 s. */
  projectToS: positive.optional(),
});

/** A built-in material key or the user's own d constants (pm/V). */
export const materialInput = z.union([
  z.enum(materialKeys),
  z.strictObject({ d31PmPerV: z.number().optional(), d33PmPerV: z.number().optional(), d15PmPerV: z.number().optional() }),
]);

const tubeGeometry = { lengthMm: positive, outerDiameterMm: positive, wallMm: positive };
const barGeometry = { lengthMm: positive, thicknessMm: positive };

const tolerance = z.number().nonnegative().optional();

/** What every expected-gain request may add: a measured gain to compare, and ± geometry tolerances (mm). */
const expectedGainExtras = {
  measuredNmPerV: positive.optional(),
  tolerances: z.strictObject({ lengthMm: tolerance, thicknessMm: tolerance, outerDiameterMm: tolerance, wallMm: tolerance }).optional(),
};

/** Expected gain: actuator kind, material and geometry in mm; optionally a measurement and tolerances. */
export const expectedGainInput = z.discriminatedUnion('actuator', [
  z.strictObject({ actuator: z.literal('plate-thickness'), material: materialInput, ...expectedGainExtras }),
  z.strictObject({ actuator: z.literal('plate-length'), material: materialInput, ...barGeometry, ...expectedGainExtras }),
  z.strictObject({ actuator: z.literal('stack'), material: materialInput, layers: z.number().int().min(1), ...expectedGainExtras }),
  z.strictObject({
    actuator: z.literal('shear-plate'),
    material: materialInput,
    plates: z.number().int().min(1).optional(),
    ...expectedGainExtras,
  }),
  z.strictObject({
    actuator: z.enum(['bimorph-series', 'bimorph-parallel']),
    material: materialInput,
    ...barGeometry,
    ...expectedGainExtras,
  }),
  z.strictObject({
    actuator: z.enum(['tube-quadrant', 'tube-opposite-pair', 'tube-axial']),
    material: materialInput,
    ...tubeGeometry,
    ...expectedGainExtras,
  }),
]);
/** Parsed (defaults applied) ExpectedGainInput as the service and the form receive it. */
export type ExpectedGainInput = z.infer<typeof expectedGainInput>;

const gainRow = z.tuple([z.number(), z.number()]);

/** Drive limits of the two mixer channels; each minimum must be below its maximum. */
export const driveLimits = z
  .strictObject({ vaMinV: z.number(), vaMaxV: z.number(), vbMinV: z.number(), vbMaxV: z.number() })
  .refine((l) => l.vaMinV < l.vaMaxV && l.vbMinV < l.vbMaxV, { message: 'Each minimum must be below its maximum.' });

/** Two-axis mixing: G (nm/V, rows x and y), drive limits, and an optional wanted position. */
export const mixingInput = z.strictObject({
  gain: z.tuple([gainRow, gainRow]),
  limits: driveLimits,
  target: z.strictObject({ xNm: z.number(), yNm: z.number() }).optional(),
});

/** Grid of drive pairs and measured tip positions for fitting G. */
export const gainMatrixFitInput = z.strictObject({
  samples: z
    .array(z.strictObject({ vaV: z.number(), vbV: z.number(), xNm: z.number(), yNm: z.number() }))
    .min(3)
    .max(MAX_WORKBENCH_SAMPLES),
  /** 'affine' (or 'intercept', as the gain fit calls it) fits offsets x₀, y₀ too (an indicator's zero); 'origin' forces them to zero. */
  model: z
    .enum(['affine', 'intercept', 'origin'])
    .default('affine')
    .transform((m) => (m === 'origin' ? 'origin' : 'affine') as 'affine' | 'origin'),
});

/** Scan planner: drive chain, raster, and optional resonance and wanted step. */
export const scanPlanInput = z.strictObject({
  dacBits: z.number().int().min(1).max(32),
  dacSpanV: positive,
  ampGainVPerV: positive,
  actuatorGainNmPerV: positive,
  pixelsPerLine: z.number().int().min(1).max(65536),
  lines: z.number().int().min(1).max(65536),
  lineRateHz: positive,
  scanSizeNm: positive.optional(),
  resonanceHz: positive.optional(),
  wantedStepNm: positive.optional(),
});

/** Cantilever resonance (SI units) with an optional tip mass. */
export const resonanceInput = z.strictObject({
  lengthM: positive,
  thicknessM: positive,
  widthM: positive.optional(),
  youngsModulusPa: positive,
  densityKgPerM3: positive,
  tipMassKg: nonNegative.optional(),
});

/** Sine drive into a capacitive load (SI units). */
export const driveCurrentInput = z.strictObject({
  capacitanceF: positive,
  amplitudeV: positive,
  frequencyHz: nonNegative,
});

/** Tunnelling sensitivity from a barrier height in eV, and optionally the barrier for a wanted ratio per Å. */
export const tunnellingInput = z.strictObject({
  workFunctionEv: positive.max(20),
  wantedRatio: z.number().gt(1, 'Must be more than 1.').optional(),
});

/** Unit converter: displacements, voltages or gains, within one kind. */
export const unitConversionInput = z
  .strictObject({
    value: z.number(),
    from: z.preprocess(unitKey, z.enum(convertibleUnits)),
    to: z.preprocess(unitKey, z.enum(convertibleUnits)),
  })
  .refine((v) => kindOfUnit(v.from) === kindOfUnit(v.to), {
    message: 'Both units must measure the same thing (a displacement, a voltage or a gain).',
    path: ['to'],
  });
