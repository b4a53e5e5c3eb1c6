import { z } from 'zod';
import { peakToPeakInput } from '@shared/schemas/workbench.ts';
import { displacementUnits, toNm } from '@shared/units.ts';

const s = peakToPeakInput.shape;

/** Readings in the indicator's own unit, converted to the shared schema's nm. */
export const peakToPeakForm = z
  .object({
    unit: z.enum(displacementUnits),
    displacementPp: s.displacementPpNm,
    displacementResolution: s.displacementResolutionNm,
    voltsPpV: s.voltsPpV,
    voltsResolutionV: s.voltsResolutionV,
  })
  .transform((v): z.input<typeof peakToPeakInput> => ({
    displacementPpNm: toNm(v.displacementPp, v.unit),
    voltsPpV: v.voltsPpV,
    displacementResolutionNm: toNm(v.displacementResolution, v.unit),
    voltsResolutionV: v.voltsResolutionV,
  }))
  .pipe(peakToPeakInput);

/** The fields that hold displacements, converted when the unit changes. */
export const peakToPeakLengthFields = ['displacementPp', 'displacementResolution'] as const;
