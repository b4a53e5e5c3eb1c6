import { z } from 'zod';
import { displacementUnits, voltageUnits } from '../units.ts';
import { MAX_FIT_POINTS } from '../workbench/fit-input-error.ts';
import { fitPoint } from './workbench.ts';

/** Highest polynomial degree the linearisation fits. */
export const MAX_LINEARISE_DEGREE = 5;
/** Most rows of a drive table. */
export const MAX_TABLE_ROWS = 4096;

/** Body of POST /api/workbench/linearise: a run's points (with sweeps for a loop), units, the degree or "auto", and the table's step. */
export const lineariseInput = z.strictObject({
  points: z.array(fitPoint).min(3).max(MAX_FIT_POINTS),
  voltageUnit: z.enum(voltageUnits).default('V'),
  displacementUnit: z.enum(displacementUnits),
  degree: z.union([z.number().int().min(1).max(MAX_LINEARISE_DEGREE), z.literal('auto')]).default('auto'),
  /** Step of the table's targets (nm); by default the common range in 20 steps. */
  stepNm: z.number().positive().optional(),
});
export type LineariseInput = z.infer<typeof lineariseInput>;

/** Body of PUT /api/actuators/:actuatorId/linearisation: the run to linearise (the server fits it) and when it was measured. */
export const saveLinearisationInput = lineariseInput.extend({ measuredOn: z.iso.date().optional() });
export type SaveLinearisationInput = z.infer<typeof saveLinearisationInput>;

export const driveTableQuery = z.strictObject({ format: z.enum(['csv', 'c']).default('csv') });

/** A saved linearisation as an actuator shows it: per branch its degree and residual, the nonlinearity before and after, the table's size. */
export interface LinearisationDto {
  branches: Partial<Record<'up' | 'down' | 'all', { degree: number; n: number; residualStdNm: number; r2: number | null }>>;
  nonlinearityPctBefore: number | null;
  residualNonlinearityPctAfter: number;
  spanNm: number;
  tableRows: number;
  measuredOn: string | null;
  savedAt: string;
}
