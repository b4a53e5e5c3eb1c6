import { z } from 'zod';
import { driveLimitsInput } from '@shared/schemas/workbench-extras.ts';
import { faradsPer, hertzPer } from '../quantity-units.ts';

const s = driveLimitsInput.shape;
const scaled = (v: number | undefined, by: number) => (v === undefined ? undefined : v * by);

/** Capacitance in nF/µF, frequency in Hz/kHz, current limit in mA and slew rate in V/µs, converted to SI. */
export const driveLimitsForm = z
  .object({
    capacitance: s.capacitanceF,
    capacitanceUnit: z.enum(['nF', 'uF']),
    amplitudeV: s.amplitudeV,
    frequency: s.frequencyHz,
    frequencyUnit: z.enum(['Hz', 'kHz']),
    rasterSwingPpV: s.rasterSwingPpV,
    lineRateHz: s.lineRateHz,
    currentLimitMa: s.currentLimitA,
    slewRateVPerUs: s.slewRateVPerS,
    outputResistanceOhm: s.outputResistanceOhm,
  })
  .transform((v): z.input<typeof driveLimitsInput> => ({
    capacitanceF: v.capacitance * faradsPer[v.capacitanceUnit],
    amplitudeV: v.amplitudeV,
    frequencyHz: v.frequency * hertzPer[v.frequencyUnit],
    rasterSwingPpV: v.rasterSwingPpV,
    lineRateHz: v.lineRateHz,
    currentLimitA: scaled(v.currentLimitMa, 1e-3),
    slewRateVPerS: scaled(v.slewRateVPerUs, 1e6),
    outputResistanceOhm: v.outputResistanceOhm,
  }))
  .pipe(driveLimitsInput);
