import { z } from 'zod';
import { noiseFloorInput } from '@shared/schemas/workbench-extras.ts';
import { hertzPer } from '../quantity-units.ts';

const s = noiseFloorInput.shape;

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
