import { Op } from 'sequelize';
import { withWriteTransaction } from '../db/write-transaction.ts';
import type { Actor } from '@shared/policies.ts';
import type { ActuatorDto, CreateActuatorInput, UpdateActuatorInput } from '@shared/schemas/actuator.ts';
import { Actuator } from '../models/actuator.model.ts';
import { Part } from '../models/part.model.ts';
import { Build } from '../models/build.model.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { ConflictError, NotFoundError, ValidationError } from '../errors.ts';
import { loadBuildForEdit, markEdited } from './build-access.ts';
import { loadActuators } from './build-read.service.ts';
import type { Transaction } from 'sequelize';

/** Parts an actuator may point at: listed ones, or ones the actor proposed and are still waiting. */
async function usablePart(actor: Actor, partId: number, transaction: Transaction): Promise<Part> {
  const part = await Part.findOne({
    where: { id: partId, mergedIntoId: null, [Op.or]: [{ status: 'accepted' }, { status: 'proposed', proposedById: actor.id }] },
    transaction,
  });
  if (!part) throw new ValidationError('Pick a part from the registry.', [{ path: 'partId', message: 'No such part in the registry.' }]);
  return part;
}

async function presentOne(buildId: number, actuatorId: number): Promise<ActuatorDto> {
  const all = await loadActuators(buildId, true);
  return all.find((a) => a.id === actuatorId)!;
}

/** Record that a build uses a part on some axis, and how it is driven. */
export async function createActuator(actor: Actor | null, buildId: number, input: CreateActuatorInput): Promise<ActuatorDto> {
  const id = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const build = await loadBuildForEdit(actor, buildId, transaction);
    await usablePart(actor!, input.partId, transaction);
    const a = await Actuator.create(
      {
        buildId,
        partId: input.partId,
        axis: input.axis,
        drive: input.drive,
        label: input.label ?? null,
        amplifier: input.amplifier ?? null,
        maxVolts: input.maxVolts ?? null,
        notes: input.notes ?? null,
      },
      { transaction },
    );
    await markEdited(build, transaction);
    return a.id;
  });
  return presentOne(buildId, id);
}

/** The actuator and its build, for edits by the build's owner. */
export async function loadActuatorForEdit(actor: Actor | null, actuatorId: number, transaction: Transaction) {
  const actuator = await Actuator.findByPk(actuatorId, { transaction });
  if (!actuator) throw new NotFoundError('No such actuator.');
  const build = await loadBuildForEdit(actor, actuator.buildId, transaction);
  return { actuator, build };
}

/** Change how an actuator is described; its part cannot change once runs exist (their statistics belong to that part). */
export async function updateActuator(actor: Actor | null, actuatorId: number, input: UpdateActuatorInput): Promise<ActuatorDto> {
  const buildId = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const { actuator, build } = await loadActuatorForEdit(actor, actuatorId, transaction);
    if (input.partId !== undefined && input.partId !== actuator.partId) {
      const runs = await CalibrationRun.count({ where: { actuatorId }, transaction });
      if (runs > 0) throw new ConflictError('This actuator has calibration runs; add a new actuator for a different part.', 'has_runs');
      await usablePart(actor!, input.partId, transaction);
    }
    await actuator.update(input, { transaction });
    await markEdited(build, transaction);
    return build.id;
  });
  return presentOne(buildId, actuatorId);
}

/** Remove an actuator that has no accepted runs (accepted data is part of the registry). */
export async function deleteActuator(actor: Actor | null, actuatorId: number): Promise<void> {
  await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const { actuator, build } = await loadActuatorForEdit(actor, actuatorId, transaction);
    const accepted = await CalibrationRun.count({ where: { actuatorId, status: 'accepted' }, transaction });
    if (accepted > 0)
      throw new ConflictError('This actuator has accepted calibration runs that count in the parts registry.', 'has_accepted_runs');
    await CalibrationRun.destroy({ where: { actuatorId }, transaction });
    await actuator.destroy({ transaction });
    await markEdited(build, transaction);
  });
}
