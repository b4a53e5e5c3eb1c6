import { z } from 'zod';
import { scanPlanInput } from '@shared/schemas/workbench.ts';

const s = scanPlanInput.shape;

/** The shared scan-plan input with the resonance entered in kHz. */
export const scanForm = z
  .object({
    dacBits: s.dacBits,
    dacSpanV: s.dacSpanV,
    ampGainVPerV: s.ampGainVPerV,
    actuatorGainNmPerV: s.actuatorGainNmPerV,
    pixelsPerLine: s.pixelsPerLine,
    lines: s.lines,
    lineRateHz: s.lineRateHz,
    scanSizeNm: s.scanSizeNm,
    resonanceKhz: s.resonanceHz,
    wantedStepNm: s.wantedStepNm,
  })
  .transform(({ resonanceKhz, ...rest }): z.input<typeof scanPlanInput> => ({
    ...rest,
    resonanceHz: resonanceKhz === undefined ? undefined : resonanceKhz * 1000,
  }))
  .pipe(scanPlanInput);

/** Parsed scan plan in the shared schema's units. */
export type ScanPlan = z.output<typeof scanForm>;
