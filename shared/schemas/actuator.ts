import { z } from 'zod';
import { multiLine, singleLine } from './text.ts';
import type { PartSummaryDto } from './part.ts';
import type { RunDto } from './run.ts';
import type { DriveMatrixDto } from './drive-matrix.ts';
import type { LinearisationDto } from './linearise.ts';
import { ACTUATOR_AXES, type ActuatorAxis, ACTUATOR_DRIVES, type ActuatorDrive } from './actuator-vocabulary.ts';

const optionalText = (max: number) => singleLine(max).optional();

export const createActuatorInput = z.strictObject({
  partId: z.number().int().positive(),
  label: optionalText(120),
  axis: z.enum(ACTUATOR_AXES),
  drive: z.enum(ACTUATOR_DRIVES),
  amplifier: optionalText(200),
  maxVolts: z.number().positive().max(5000).optional(),
  notes: multiLine(4000).trim().optional(),
});
export type CreateActuatorInput = z.infer<typeof createActuatorInput>;

export const updateActuatorInput = createActuatorInput
  .partial()
  .refine((v) => Object.keys(v).length > 0, { message: 'Nothing to change.' });
export type UpdateActuatorInput = z.infer<typeof updateActuatorInput>;

export const actuatorIdParams = z.strictObject({ actuatorId: z.coerce.number().int().positive() });

/** An actuator with its part, its runs (newest first) and, where geometry allows, the expected gain. */
export interface ActuatorDto {
  id: number;
  buildId: number;
  label: string | null;
  axis: ActuatorAxis;
  drive: ActuatorDrive;
  amplifier: string | null;
  maxVolts: number | null;
  notes: string | null;
  part: PartSummaryDto;
  expectedGain: { gainNmPerV: number; lowNmPerV: number; highNmPerV: number; basis: string } | null;
  /** A two-axis mixer result saved onto an XY pair (PUT /api/actuators/:id/drive-matrix); null when none. */
  driveMatrix: DriveMatrixDto | null;
  linearisation: LinearisationDto | null;
  runs: RunDto[];
}
