import { z } from 'zod';
import { loadedGainInput } from '@shared/schemas/workbench-extras.ts';

const s = loadedGainInput.shape;
const maybe = z.number().positive().optional();

/** Where the actuator's stiffness comes from: typed in, or worked out from a bender's geometry. */
export const stiffnessSources = [
  { value: 'entered', label: 'Known stiffness' },
  { value: 'bender', label: 'From a bender' },
] as const;

const benderFields = ['benderLengthMm', 'benderWidthMm', 'benderThicknessMm', 'benderModulusGpa'] as const;

// A missing field was already reported by the superRefine; NaN fails the shared schema as well.
const given = (v: number | undefined) => v ?? Number.NaN;

/**
 * Gain in nm/V, stiffnesses in N/m, the bender in mm and GPa, preload in N, converted to the shared
 * schema's SI input. Only the fields of the chosen stiffness source are needed.
 */
export const loadedGainForm = z
  .object({
    freeGainNmPerV: s.freeGainNmPerV,
    stiffnessSource: z.enum(['entered', 'bender']),
    actuatorStiffnessNPerM: maybe,
    benderLengthMm: maybe,
    benderWidthMm: maybe,
    benderThicknessMm: maybe,
    benderModulusGpa: maybe,
    springRateNPerM: s.springRateNPerM,
    preloadForceN: s.preloadForceN,
  })
  .superRefine((v, ctx) => {
    const needed = v.stiffnessSource === 'entered' ? (['actuatorStiffnessNPerM'] as const) : benderFields;
    for (const name of needed) if (v[name] === undefined) ctx.addIssue({ code: 'custom', path: [name], message: 'Enter a number.' });
  })
  .transform((v): z.input<typeof loadedGainInput> => ({
    freeGainNmPerV: v.freeGainNmPerV,
    ...(v.stiffnessSource === 'entered'
      ? { actuatorStiffnessNPerM: v.actuatorStiffnessNPerM }
      : {
          bender: {
            lengthM: given(v.benderLengthMm) * 1e-3,
            widthM: given(v.benderWidthMm) * 1e-3,
            thicknessM: given(v.benderThicknessMm) * 1e-3,
            youngsModulusPa: given(v.benderModulusGpa) * 1e9,
          },
        }),
    springRateNPerM: v.springRateNPerM,
    preloadForceN: v.preloadForceN,
  }))
  .pipe(loadedGainInput);
