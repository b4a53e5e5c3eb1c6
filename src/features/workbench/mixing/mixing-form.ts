import type { UseFormReturn } from 'react-hook-form';
import { z } from 'zod';
import { driveLimits, mixingInput } from '@shared/schemas/workbench.ts';
import type { CalculatorResult } from '@shared/workbench/calculators/calculator.ts';
import type { mixingCalculator } from '@shared/workbench/calculators/mixing-calculators.ts';
import { driveMatrixInput, type DriveMatrixInput } from '@shared/schemas/drive-matrix.ts';

/**
 * G, the drive limits (both shared) and an optional wanted point as two fields; the offsets x₀, y₀ and the
 * model of a grid fit ride along for saving the result onto an actuator (the mixer itself works relative to rest).
 */
export const mixingForm = z
  .object({
    gain: mixingInput.shape.gain,
    limits: driveLimits,
    targetXNm: z.number().optional(),
    targetYNm: z.number().optional(),
    offsetXNm: z.number().optional(),
    offsetYNm: z.number().optional(),
    model: z.enum(['affine', 'origin']).optional(),
  })
  .transform((v): z.input<typeof mixingInput> => ({
    gain: v.gain,
    limits: v.limits,
    target: v.targetXNm !== undefined && v.targetYNm !== undefined ? { xNm: v.targetXNm, yNm: v.targetYNm } : undefined,
  }))
  .pipe(mixingInput);

/** Field values of the mixer form. */
export type MixingFormValues = z.input<typeof mixingForm>;

/** The mixer page's react-hook-form handle. */
export type MixingFormApi = UseFormReturn<MixingFormValues, unknown, z.output<typeof mixingForm>>;

/** What the shared mixer calculator returns. */
export type MixingResult = CalculatorResult<typeof mixingCalculator>;

/** A matrix rounded to 6 significant figures, for filling the form's fields legibly. */
export const roundMatrix = (g: readonly (readonly number[])[]): [[number, number], [number, number]] => [
  [Number(g[0][0].toPrecision(6)), Number(g[0][1].toPrecision(6))],
  [Number(g[1][0].toPrecision(6)), Number(g[1][1].toPrecision(6))],
];

/**
 * The mixer's inputs as a drive matrix to save onto an actuator, or null while they are not usable (G without an
 * inverse, limits the wrong way round). The model is the grid fit's, else "with offsets" when any offset is set.
 */
export function driveMatrixFromForm(values: MixingFormValues): DriveMatrixInput | null {
  const offsetNm: [number, number] = [values.offsetXNm ?? 0, values.offsetYNm ?? 0];
  const parsed = driveMatrixInput.safeParse({
    gainNmPerV: values.gain,
    offsetNm,
    limits: values.limits,
    model: values.model ?? (offsetNm[0] !== 0 || offsetNm[1] !== 0 ? 'affine' : 'origin'),
  });
  return parsed.success ? parsed.data : null;
}
