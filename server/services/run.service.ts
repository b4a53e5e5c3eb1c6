import { fn, col, type Transaction } from 'sequelize';
import { withWriteTransaction } from '../db/write-transaction.ts';
import { can, type Actor } from '@shared/policies.ts';
import { createRunInput, type CreateRunInput, type RunDto, type UpdateRunInput } from '@shared/schemas/run.ts';
import { MAX_BUILD_POINTS, MAX_BUILD_RUNS } from '@shared/schemas/run-vocabulary.ts';
import { fitRun, plotSeries, recordedCount, type RunFit } from '@shared/workbench/run-fit.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { Build } from '../models/build.model.ts';
import { AppError, ConflictError, NotFoundError } from '../errors.ts';
import { presentRun, RUN_READ_COLUMNS, type RunDetail } from '../presenters/run.presenter.ts';
import { loadBuildForView, markEdited } from './build-access.ts';
import { loadActuatorForEdit } from './actuator.service.ts';
import { recomputePartStats } from './part-stats.service.ts';
import { asBadRequest } from './workbench.service.ts';
import { assertChangeFitsKind, storedRunInput } from './run-record.ts';

/** The stored columns of a run: what was recorded, and the fit the server computed from it. */
export function runColumns(input: CreateRunInput, fit: RunFit) {
  const detail: RunDetail = {};
  if (input.kind === 'peak-to-peak') {
    detail.reading = {
      displacementPp: input.displacementPp,
      voltsPp: input.voltsPp,
      displacementResolution: input.displacementResolution,
      voltsResolution: input.voltsResolution ?? null,
      frequencyHz: input.frequencyHz ?? null,
    };
  }
  if (fit.gainBoundsNmPerV) detail.gainBoundsNmPerV = fit.gainBoundsNmPerV;
  if (fit.sine) detail.sine = fit.sine;
  if (fit.lattice) detail.lattice = fit.lattice;
  const record =
    input.kind === 'points'
      ? input.points
      : input.kind === 'sine-record'
        ? input.samples
        : input.kind === 'lattice'
          ? {
              lattice: input.lattice,
              image: input.image,
              scanSpanV: input.scanSpanV,
              peaks: input.peaks,
              quadrantPeaks: input.quadrantPeaks,
            }
          : [];
  return {
    kind: input.kind,
    method: input.method,
    voltageUnit: input.voltageUnit,
    displacementUnit: input.displacementUnit,
    model: input.kind === 'points' ? input.model : ('origin' as const),
    driveJson: input.drive ? JSON.stringify(input.drive) : null,
    conditionsJson: input.conditions ? JSON.stringify(input.conditions) : null,
    notes: input.notes ?? null,
    measuredOn: input.measuredOn ?? null,
    pointsJson: JSON.stringify(record),
    plotJson: JSON.stringify(plotSeries(input)),
    detailJson: Object.keys(detail).length > 0 ? JSON.stringify(detail) : null,
    pointCount: recordedCount(input),
    gainNmPerV: fit.gainNmPerV,
    gainStdErrNmPerV: fit.gainStdUncertaintyNmPerV,
    gainCi95LoNmPerV: fit.gainCi95NmPerV?.[0] ?? null,
    gainCi95HiNmPerV: fit.gainCi95NmPerV?.[1] ?? null,
    interceptNm: fit.interceptNm,
    r2: fit.r2,
    residualStdNm: fit.residualStdNm,
    spanNm: fit.spanNm,
    nonlinearityPctFs: fit.nonlinearityPctFs,
    hysteresisPctFs: fit.hysteresisPctFs,
  };
}

/** Refuse a run that would take its build past the run or point budget (413: the record is too large to keep). */
async function assertBuildBudget(buildId: number, adding: number, transaction: Transaction, replacing?: CalibrationRun): Promise<void> {
  const row = (await CalibrationRun.findOne({
    where: { buildId },
    attributes: [
      [fn('COUNT', col('id')), 'runs'],
      [fn('COALESCE', fn('SUM', col('point_count')), 0), 'points'],
    ],
    raw: true,
    transaction,
  })) as unknown as { runs: number | string; points: number | string } | null;
  const runs = Number(row?.runs ?? 0) - (replacing ? 1 : 0);
  const points = Number(row?.points ?? 0) - (replacing?.pointCount ?? 0);
  if (!replacing && runs + 1 > MAX_BUILD_RUNS)
    throw new AppError(413, 'build_runs_limit', `A build holds at most ${MAX_BUILD_RUNS} calibration runs; remove an old run first.`);
  if (points + adding > MAX_BUILD_POINTS)
    throw new AppError(
      413,
      'build_points_limit',
      `A build's runs hold at most ${MAX_BUILD_POINTS.toLocaleString('en-GB')} points and samples together; this run would take it to ${(points + adding).toLocaleString('en-GB')}.`,
    );
}

/** Store a run and the fit the server computes from it (never numbers sent by the client). */
export async function createRun(actor: Actor | null, actuatorId: number, input: CreateRunInput): Promise<RunDto> {
  const run = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const { actuator, build } = await loadActuatorForEdit(actor, actuatorId, transaction);
    const fit = asBadRequest(() => fitRun(input, actuator.axis));
    await assertBuildBudget(build.id, recordedCount(input), transaction);
    const r = await CalibrationRun.create(
      { actuatorId, buildId: build.id, partId: actuator.partId, ownerId: build.ownerId, ...runColumns(input, fit) },
      { transaction },
    );
    await markEdited(build, transaction);
    return r;
  });
  return presentRun(run);
}

/** A run the actor may see (rejected runs only by those who may see unpublished work), without its raw record. */
async function loadRunForView(actor: Actor | null, runId: number, withRecord = false): Promise<CalibrationRun> {
  const run = await CalibrationRun.findByPk(runId, withRecord ? {} : { attributes: [...RUN_READ_COLUMNS] });
  if (!run) throw new NotFoundError('No such calibration run.');
  await loadBuildForView(actor, run.buildId);
  if (run.status === 'rejected' && !can(actor, 'build.view-unpublished', { ownerId: run.ownerId }))
    throw new NotFoundError('No such calibration run.');
  return run;
}

/** One run with its fit and plot series, visible wherever its build is. */
export async function getRun(actor: Actor | null, runId: number): Promise<RunDto> {
  return presentRun(await loadRunForView(actor, runId));
}

/** A run with its raw record, for the export. */
export async function getRunRecord(actor: Actor | null, runId: number): Promise<{ run: RunDto; record: unknown[] }> {
  const row = await loadRunForView(actor, runId, true);
  return { run: presentRun(row), record: JSON.parse(row.pointsJson) as unknown[] };
}

/**
 * Correct a run: the change is merged over what is stored, validated as a whole and refitted. An accepted
 * run goes back to pending (and out of the part's figures, recomputed in the same transaction); a rejected
 * one is resubmitted.
 */
export async function updateRun(actor: Actor | null, runId: number, change: UpdateRunInput): Promise<RunDto> {
  const run = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const r = await CalibrationRun.findByPk(runId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!r) throw new NotFoundError('No such calibration run.');
    const { actuator, build } = await loadActuatorForEdit(actor, r.actuatorId, transaction);
    assertChangeFitsKind(r.kind, change);
    const merged = createRunInput.parse(storedRunInput(r, change));
    const fit = asBadRequest(() => fitRun(merged, actuator.axis));
    await assertBuildBudget(build.id, recordedCount(merged), transaction, r);
    const wasAccepted = r.status === 'accepted';
    await r.update(
      { ...runColumns(merged, fit), status: 'pending', reviewNote: null, reviewedById: null, reviewedAt: null },
      { transaction },
    );
    if (wasAccepted) await recomputePartStats(r.partId, transaction);
    await markEdited(build, transaction);
    return r;
  });
  return presentRun(run);
}

/** The owner withdraws a run that has not been accepted. */
export async function deleteRun(actor: Actor | null, runId: number): Promise<void> {
  await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const run = await CalibrationRun.findByPk(runId, { transaction, attributes: ['id', 'actuatorId', 'status'] });
    if (!run) throw new NotFoundError('No such calibration run.');
    await loadActuatorForEdit(actor, run.actuatorId, transaction);
    if (run.status === 'accepted')
      throw new ConflictError('Accepted runs count in the parts registry and cannot be deleted.', 'run_accepted');
    await run.destroy({ transaction });
  });
}
