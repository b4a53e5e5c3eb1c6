import type { Actor } from '@shared/policies.ts';
import { withWriteTransaction } from '../db/write-transaction.ts';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import type { DriveMatrixDto, DriveMatrixInput } from '@shared/schemas/drive-matrix.ts';
import { Build } from '../models/build.model.ts';
import { ConflictError } from '../errors.ts';
import { markEdited } from './build-access.ts';
import { loadActuatorForEdit } from './actuator.service.ts';
import { loadActuators } from './build-read.service.ts';

async function presentOne(buildId: number, actuatorId: number): Promise<ActuatorDto> {
  const all = await loadActuators(buildId, true);
  return all.find((a) => a.id === actuatorId)!;
}

/**
 * Save a two-axis mixer result onto an XY-pair actuator (replacing any earlier one), under the same
 * edit rules as other actuator changes; only an XY pair has two drive channels to mix (409 `not_xy_pair`).
 * Returns the actuator and whether it had none before (201 vs 200).
 */
export async function saveDriveMatrix(
  actor: Actor | null,
  actuatorId: number,
  input: DriveMatrixInput,
): Promise<{ actuator: ActuatorDto; created: boolean }> {
  const { buildId, created } = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const { actuator, build } = await loadActuatorForEdit(actor, actuatorId, transaction);
    if (actuator.axis !== 'XY')
      throw new ConflictError('A drive matrix belongs to an XY pair: this actuator drives one axis.', 'not_xy_pair');
    const saved: DriveMatrixDto = {
      gainNmPerV: input.gainNmPerV,
      offsetNm: input.offsetNm,
      limits: input.limits,
      model: input.model,
      measuredOn: input.measuredOn ?? null,
      savedAt: new Date().toISOString(),
    };
    const created = actuator.driveMatrixJson == null;
    await actuator.update({ driveMatrixJson: JSON.stringify(saved) }, { transaction });
    await markEdited(build, transaction);
    return { buildId: build.id, created };
  });
  return { actuator: await presentOne(buildId, actuatorId), created };
}

/** Remove the saved mixer result of an actuator (nothing to remove is not an error). */
export async function clearDriveMatrix(actor: Actor | null, actuatorId: number): Promise<void> {
  await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const { actuator, build } = await loadActuatorForEdit(actor, actuatorId, transaction);
    if (actuator.driveMatrixJson == null) return;
    await actuator.update({ driveMatrixJson: null }, { transaction });
    await markEdited(build, transaction);
  });
}
