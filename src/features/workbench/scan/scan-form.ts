import { z } from 'zod';
import { scanPlanInput } from '@shared/schemas/workbench.ts';
import { HIGH_VOLTAGE_THRESHOLD_V, cautionsFor } from '@shared/workbench/safety.ts';
import {
  bitsNeeded,
  dacResolution,
  frameTiming,
  lineRateCeilings,
  quasiStaticGainError,
} from '@shared/workbench/scan-planner.ts';

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
  .transform(({ resonanceKhz, ...rest }): z.input<typeof scanPlanInput> => ({ ...rest, resonanceHz: resonanceKhz === undefined ? undefined : resonanceKhz * 1000 }))
  .pipe(scanPlanInput);

/** Parsed scan plan in the shared schema's units. */
export type ScanPlan = z.output<typeof scanForm>;

/** DAC resolutions the chart spans around the chosen one. */
function bitsAround(bits: number): number[] {
  const lo = Math.max(1, Math.min(bits - 6, 26));
  return Array.from({ length: 13 }, (_, i) => lo + i).filter((b) => b <= 32);
}

/** Everything the page shows for a drive chain and raster, from the shared scan-planner functions. */
export function computeScanPlan(input: ScanPlan) {
  const resolution = dacResolution(input);
  const ceilings = input.resonanceHz === undefined ? null : lineRateCeilings(input.resonanceHz);
  return {
    plan: input,
    ...resolution,
    ...frameTiming(input),
    bitsNeeded: input.wantedStepNm === undefined ? null : bitsNeeded(resolution.rangeNm, input.wantedStepNm),
    pixelNm: input.scanSizeNm === undefined ? null : input.scanSizeNm / input.pixelsPerLine,
    ceilings,
    gainErrorPct:
      input.resonanceHz !== undefined && input.lineRateHz < input.resonanceHz ? quasiStaticGainError(input.lineRateHz, input.resonanceHz) * 100 : null,
    steps: bitsAround(input.dacBits).map((bits) => ({ bits, lsbNm: dacResolution({ ...input, dacBits: bits }).lsbNm })),
    cautions: cautionsFor({ highVoltage: resolution.outputSpanV > HIGH_VOLTAGE_THRESHOLD_V, storedCharge: false }),
  };
}

/** What computeScanPlan returns. */
export type ScanResult = ReturnType<typeof computeScanPlan>;
