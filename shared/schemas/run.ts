import { z } from 'zod';
import { fitInput, type FitPoint, type FitResultDto } from './workbench.ts';
import type { DisplacementUnit, VoltageUnit } from '../units.ts';

export const RUN_METHODS = ['indicator', 'capacitive', 'interferometer', 'optical-lever', 'reference-sample'] as const;
export type RunMethod = (typeof RUN_METHODS)[number];
export const RUN_STATUSES = ['pending', 'accepted', 'rejected'] as const;
export type RunStatus = (typeof RUN_STATUSES)[number];

export const runMethodLabels: Record<RunMethod, string> = {
  indicator: 'Dial or electronic indicator',
  capacitive: 'Capacitive sensor',
  interferometer: 'Interferometer',
  'optical-lever': 'Optical lever',
  'reference-sample': 'Reference sample (known step or lattice)',
};

/** DC steps, or a sine with its frequency and amplitude. */
export const runDrive = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('dc-steps') }),
  z.strictObject({ kind: z.literal('sine'), frequencyHz: z.number().positive().max(1e7), amplitudeV: z.number().positive().max(5000) }),
]);
export type RunDrive = z.infer<typeof runDrive>;

export const runConditions = z.strictObject({
  preload: z.string().trim().max(200).optional(),
  temperatureC: z.number().min(-273.15).max(1000).optional(),
  notes: z.string().trim().max(2000).optional(),
});
export type RunConditions = z.infer<typeof runConditions>;

/** A calibration run as recorded; the server computes the fit from the points. */
export const createRunInput = fitInput.extend({
  method: z.enum(RUN_METHODS),
  drive: runDrive.optional(),
  conditions: runConditions.optional(),
  notes: z.string().trim().max(4000).optional(),
});
export type CreateRunInput = z.infer<typeof createRunInput>;

export const runIdParams = z.strictObject({ runId: z.coerce.number().int().positive() });

export interface RunDto {
  id: number;
  actuatorId: number;
  buildId: number;
  partId: number;
  status: RunStatus;
  method: RunMethod;
  voltageUnit: VoltageUnit;
  displacementUnit: DisplacementUnit;
  model: 'intercept' | 'origin';
  drive: RunDrive | null;
  conditions: RunConditions | null;
  notes: string | null;
  fit: FitResultDto;
  points: FitPoint[];
  reviewNote: string | null;
  createdAt: string;
}
