import { z } from 'zod';
import { driveCurrentInput } from '@shared/schemas/workbench.ts';
import { faradsPer, hertzPer } from '../quantity-units.ts';

/** Values in nF/µF and Hz/kHz as people write them, converted to the shared schema's SI units. */
export const driveCurrentForm = z
  .object({
    capacitance: driveCurrentInput.shape.capacitanceF,
    capacitanceUnit: z.enum(['nF', 'uF']),
    amplitudeV: driveCurrentInput.shape.amplitudeV,
    frequency: driveCurrentInput.shape.frequencyHz,
    frequencyUnit: z.enum(['Hz', 'kHz']),
  })
  .transform((v) => ({
    capacitanceF: v.capacitance * faradsPer[v.capacitanceUnit],
    amplitudeV: v.amplitudeV,
    frequencyHz: v.frequency * hertzPer[v.frequencyUnit],
  }))
  .pipe(driveCurrentInput);
