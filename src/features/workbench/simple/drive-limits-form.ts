import { z } from 'zod';
import { driveLimitsInput } from '@shared/schemas/workbench-extras.ts';

const faradsPer = { nF: 1e-9, uF: 1e-6 } as const;
const hertzPer = { Hz: 1, kHz: 1e3 } as const;

/** Capacitance and frequency pickers. */
export const limitCapacitanceUnits = [
  { value: 'nF', label: 'nF' },
  { value: 'uF', label: 'µF' },
] as const;
export const limitFrequencyUnits = [
  { value: 'Hz', label: 'Hz' },
  { value: 'kHz', label: 'kHz' },
] as const;

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
