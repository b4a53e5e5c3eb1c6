import { z } from 'zod';
import { tunnellingInput } from '@shared/schemas/workbench.ts';
import {
  currentRatioPerAngstrom,
  decayConstantPerAngstrom,
  gapChangePerDecadeAngstrom,
  workFunctionForRatioEv,
} from '@shared/workbench/tunnelling.ts';

/** The shared input plus an optional wanted current ratio per Å (for the inverse question). */
export const tunnellingForm = tunnellingInput.extend({ wantedRatio: z.number().gt(1, 'Must be more than 1.').optional() });

/** κ, the ratio per Å, the gap per decade, and the barrier that gives a wanted ratio. */
export function computeTunnelling(input: z.output<typeof tunnellingForm>) {
  return {
    kappaPerAngstrom: decayConstantPerAngstrom(input.workFunctionEv),
    ratioPerAngstrom: currentRatioPerAngstrom(input.workFunctionEv),
    gapPerDecadeAngstrom: gapChangePerDecadeAngstrom(input.workFunctionEv),
    workFunctionForWantedEv: input.wantedRatio === undefined ? null : workFunctionForRatioEv(input.wantedRatio),
  };
}
