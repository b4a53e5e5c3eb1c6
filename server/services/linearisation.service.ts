import type { Actor } from '@shared/policies.ts';
import { withWriteTransaction } from '../db/write-transaction.ts';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import type { SaveLinearisationInput } from '@shared/schemas/linearise.ts';
import { linearise, type StoredLinearisation } from '@shared/workbench/linearise.ts';
import { driveTableC, driveTableCsv } from '@shared/export/drive-table.ts';
import { Actuator } from '../models/actuator.model.ts';
import { Build } from '../models/build.model.ts';
import { NotFoundError } from '../errors.ts';
import { loadBuildForView, markEdited } from './build-access.ts';
import { loadActuatorForEdit } from './actuator.service.ts';
import { loadActuators } from './build-read.service.ts';
import { asBadRequest } from './workbench.service.ts';

/**
 * Fit the run's branches and store the result with its table on the actuator (replacing an earlier one), under
 * the actuator's edit rules. Returns the actuator and whether it had none before (201 vs 200).
 */
export async function saveLinearisation(
  actor: Actor | null,
  actuatorId: number,
  input: SaveLinearisationInput,
): Promise<{ actuator: ActuatorDto; created: boolean }> {
  const { buildId, created } = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const { actuator, build } = await loadActuatorForEdit(actor, actuatorId, transaction);
    const { measuredOn, ...fitInput } = input;
    const stored: StoredLinearisation = {
      result: asBadRequest(() => linearise(fitInput)),
      measuredOn: measuredOn ?? null,
      savedAt: new Date().toISOString(),
    };
    const created = actuator.linearisationJson == null;
    await actuator.update({ linearisationJson: JSON.stringify(stored) }, { transaction });
    await markEdited(build, transaction);
    return { buildId: build.id, created };
  });
  const all = await loadActuators(buildId, true);
  return { actuator: all.find((a) => a.id === actuatorId)!, created };
}

/** Remove an actuator's saved linearisation (nothing to remove is not an error). */
export async function clearLinearisation(actor: Actor | null, actuatorId: number): Promise<void> {
  await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const { actuator, build } = await loadActuatorForEdit(actor, actuatorId, transaction);
    if (actuator.linearisationJson == null) return;
    await actuator.update({ linearisationJson: null }, { transaction });
    await markEdited(build, transaction);
  });
}

/** The saved drive table as CSV or a C array, for anyone who may see the build. */
export async function driveTableFile(actor: Actor | null, actuatorId: number, format: 'csv' | 'c') {
  const actuator = await Actuator.findByPk(actuatorId, { attributes: ['id', 'buildId', 'linearisationJson'] });
  if (!actuator) throw new NotFoundError('No such actuator.');
  await loadBuildForView(actor, actuator.buildId);
  if (!actuator.linearisationJson) throw new NotFoundError('This actuator has no saved linearisation.');
  const { result } = JSON.parse(actuator.linearisationJson) as StoredLinearisation;
  return format === 'c'
    ? { filename: `actuator-${actuatorId}-drive-table.h`, contentType: 'text/x-c; charset=utf-8', body: driveTableC(result.table) }
    : { filename: `actuator-${actuatorId}-drive-table.csv`, contentType: 'text/csv; charset=utf-8', body: driveTableCsv(result.table) };
}
