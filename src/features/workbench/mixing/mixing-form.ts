import type { UseFormReturn } from 'react-hook-form';
import { z } from 'zod';
import { driveLimits, mixingInput } from '@shared/schemas/workbench.ts';
import { invertGain, isReachable, mixingSinAngle, reachableRegion, voltsFor } from '@shared/workbench/mixing.ts';
import { HIGH_VOLTAGE_THRESHOLD_V, cautionsFor } from '@shared/workbench/safety.ts';

/** G, the drive limits (both shared) and an optional wanted point as two fields. */
export const mixingForm = z
  .object({
    gain: mixingInput.shape.gain,
    limits: driveLimits,
    targetXNm: z.number().optional(),
    targetYNm: z.number().optional(),
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

/** G⁻¹, how far from parallel the actuators are, the reachable region, the wanted point's volts, and cautions. */
export function computeMixing(input: z.output<typeof mixingForm>) {
  const { gain, limits, target } = input;
  const volts = target ? voltsFor(gain, target.xNm, target.yNm) : null;
  const { vaMinV, vaMaxV, vbMinV, vbMaxV } = limits;
  return {
    limits,
    inverseVPerNm: invertGain(gain),
    sinAngle: mixingSinAngle(gain),
    region: reachableRegion(gain, limits),
    target: target && volts ? { ...target, ...volts, reachable: isReachable(gain, limits, target.xNm, target.yNm) } : null,
    cautions: cautionsFor({ highVoltage: [vaMinV, vaMaxV, vbMinV, vbMaxV].some((v) => Math.abs(v) > HIGH_VOLTAGE_THRESHOLD_V), storedCharge: false }),
  };
}

/** What computeMixing returns. */
export type MixingResult = ReturnType<typeof computeMixing>;

/** A matrix rounded to 6 significant figures, for filling the form's fields legibly. */
export const roundMatrix = (g: readonly (readonly number[])[]): [[number, number], [number, number]] => [
  [Number(g[0][0].toPrecision(6)), Number(g[0][1].toPrecision(6))],
  [Number(g[1][0].toPrecision(6)), Number(g[1][1].toPrecision(6))],
];
