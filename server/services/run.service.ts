import { can, type Actor } from '@shared/policies.ts';
import type { CreateRunInput, RunDto } from '@shared/schemas/run.ts';
import { fitCalibrationInUnits, type CalibrationFit } from '@shared/workbench/calibration-fit.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { Build } from '../models/build.model.ts';
import { ConflictError, NotFoundError } from '../errors.ts';
import { presentRun } from '../presenters/run.presenter.ts';
import { loadBuildForView, markEdited } from './build-access.ts';
import { loadActuatorForEdit } from './actuator.service.ts';
import { asBadRequest } from './workbench.service.ts';

/** The stored columns of a run: what was recorded, and the fit the server computed from it. */
export function runColumns(input: CreateRunInput, fit: CalibrationFit) {
  return {
    method: input.method,
    voltageUnit: input.voltageUnit,
    displacementUnit: input.displacementUnit,
    model: input.model,
    driveJson: input.drive ? JSON.stringify(input.drive) : null,
    conditionsJson: input.conditions ? JSON.stringify(input.conditions) : null,
    notes: input.notes ?? null,
    pointsJson: JSON.stringify(input.points),
    pointCount: fit.n,
    gainNmPerV: fit.gainNmPerV,
    gainStdErrNmPerV: fit.gainStdErrNmPerV,
    gainCi95LoNmPerV: fit.gainCi95NmPerV[0],
    gainCi95HiNmPerV: fit.gainCi95NmPerV[1],
    interceptNm: fit.interceptNm,
    r2: fit.r2,
    residualStdNm: fit.residualStdNm,
    spanNm: fit.spanNm,
    nonlinearityPctFs: fit.nonlinearityPctFs,
    hysteresisPctFs: fit.hysteresisPctFs,
  };
}

/** Store a run's points and the fit the server computes from them (never numbers sent by the client). */
export async function createRun(actor: Actor | null, actuatorId: number, input: CreateRunInput): Promise<RunDto> {
  const run = await Build.sequelize!.transaction(async (transaction) => {
    const { actuator, build } = await loadActuatorForEdit(actor, actuatorId, transaction);
    const fit = asBadRequest(() => fitCalibrationInUnits(input));
    const r = await CalibrationRun.create(
      { actuatorId, buildId: build.id, partId: actuator.partId, ownerId: build.ownerId, ...runColumns(input, fit) },
      { transaction },
    );
    await markEdited(build, transaction);
    return r;
  });
  return presentRun(run);
}

/** One run with its points, visible wherever its build is. */
export async function getRun(actor: Actor | null, runId: number): Promise<RunDto> {
  const run = await CalibrationRun.findByPk(runId);
  if (!run) throw new NotFoundError('No such calibration run.');
  await loadBuildForView(actor, run.buildId);
  if (run.status === 'rejected' && !can(actor, 'build.view-unpublished', { ownerId: run.ownerId }))
    throw new NotFoundError('No such calibration run.');
  return presentRun(run);
}

/** The owner withdraws a run that has not been accepted. */
export async function deleteRun(actor: Actor | null, runId: number): Promise<void> {
  await Build.sequelize!.transaction(async (transaction) => {
    const run = await CalibrationRun.findByPk(runId, { transaction });
    if (!run) throw new NotFoundError('No such calibration run.');
    await loadActuatorForEdit(actor, run.actuatorId, transaction);
    if (run.status === 'accepted')
      throw new ConflictError('Accepted runs count in the parts registry and cannot be deleted.', 'run_accepted');
    await run.destroy({ transaction });
  });
}
