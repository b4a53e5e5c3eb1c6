import { Router, type RequestHandler } from 'express';
import type { z } from 'zod';
import {
  creepInput,
  driveCurrentInput,
  expectedGainInput,
  fitInput,
  gainMatrixFitInput,
  mixingInput,
  peakToPeakInput,
  resonanceInput,
  scanPlanInput,
  tunnellingInput,
  unitConversionInput,
} from '@shared/schemas/workbench.ts';
import { validate } from '../middleware/validate.ts';
import {
  computeConversion,
  computeCreep,
  computeDriveCurrent,
  computeExpectedGain,
  computeFit,
  computeMixing,
  computeMixingFit,
  computePeakToPeak,
  computeResonance,
  computeScanPlan,
  computeTunnelling,
} from '../services/workbench.service.ts';

function answer<S extends z.ZodType>(compute: (input: z.output<S>) => unknown): RequestHandler {
  return (_req, res) => {
    res.json(compute(res.locals.body as z.output<S>));
  };
}

/** Pure calculations; no sign-in, nothing stored. */
export function workbenchRoutes(): Router {
  const r = Router();
  const post = <S extends z.ZodType>(slug: string, schema: S, compute: (input: z.output<S>) => unknown) =>
    r.post(`/api/workbench/${slug}`, validate(schema), answer<S>(compute));
  post('fit', fitInput, computeFit);
  post('peak-to-peak', peakToPeakInput, computePeakToPeak);
  post('creep', creepInput, computeCreep);
  post('expected-gain', expectedGainInput, computeExpectedGain);
  post('mixing', mixingInput, computeMixing);
  post('mixing-fit', gainMatrixFitInput, computeMixingFit);
  post('scan-plan', scanPlanInput, computeScanPlan);
  post('resonance', resonanceInput, computeResonance);
  post('drive-current', driveCurrentInput, computeDriveCurrent);
  post('tunnelling', tunnellingInput, computeTunnelling);
  post('convert', unitConversionInput, computeConversion);
  return r;
}
