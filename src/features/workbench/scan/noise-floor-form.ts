import { z } from 'zod';
import { noiseFloorInput } from '@shared/schemas/workbench-extras.ts';

const s = noiseFloorInput.shape;
const hertzPer = { Hz: 1, kHz: 1e3 } as const;

/** Bandwidth picker. */
export const bandwidthUnits = [
  { value: 'Hz', label: 'Hz' },
  { value: 'kHz', label: 'kHz' },
] as const;

/** Noise density in nV/√Hz and bandwidth in Hz/kHz, converted to the shared schema's SI input. */
export const noiseFloorForm = z
  .object({
    actuatorGainNmPerV: s.actuatorGainNmPerV,
    ampGainVPerV: s.ampGainVPerV,
    noiseDensityNvPerRtHz: s.noiseDensityVPerRtHz,
    bandwidth: s.bandwidthHz,
    bandwidthUnit: z.enum(['Hz', 'kHz']),
    dacBits: s.dacBits,
    dacSpanV: s.dacSpanV,
    cantileverStiffnessNPerM: s.cantileverStiffnessNPerM,
    temperatureK: s.temperatureK,
  })
  .transform(({ noiseDensityNvPerRtHz, bandwidth, bandwidthUnit, ...rest }): z.input<typeof noiseFloorInput> => ({
    ...rest,
    noiseDensityVPerRtHz: noiseDensityNvPerRtHz === undefined ? undefined : noiseDensityNvPerRtHz * 1e-9,
    bandwidthHz: bandwidth === undefined ? undefined : bandwidth * hertzPer[bandwidthUnit],
  }))
  .pipe(noiseFloorInput);
