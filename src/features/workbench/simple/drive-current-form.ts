import { z } from 'zod';
import { driveCurrentInput } from '@shared/schemas/workbench.ts';

const faradsPer = { nF: 1e-9, uF: 1e-6 } as const;
const hertzPer = { Hz: 1, kHz: 1e3 } as const;

/** Capacitance and frequency pickers for the form. */
export const capacitanceUnits = [
  { value: 'nF', label: 'nF' },
  { value: 'uF', label: 'µF' },
] as const;
export const frequencyUnits = [
  { value: 'Hz', label: 'Hz' },
  { value: 'kHz', label: 'kHz' },
] as const;

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
