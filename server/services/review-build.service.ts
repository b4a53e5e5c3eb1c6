// The desk's build tools: a build's pending runs with their flags, and the combined decision that
// publishes the build and accepts its unflagged runs in one transaction.
import type { Transaction } from 'sequelize';
import type { Actor } from '@shared/policies.ts';
import type { PublishWithRunsInput, PublishWithRunsResultDto, ReviewBuildRunsDto } from '@shared/schemas/review-desk.ts';
import { publishWithRunsPlan, samePlan } from '@shared/review/publish-with-runs.ts';
import { Build } from '../models/build.model.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { Part } from '../models/part.model.ts';
import { RUN_READ_COLUMNS } from '../presenters/run.presenter.ts';
import { authorize } from '../policies/authorize.ts';
import { ConflictError, NotFoundError } from '../errors.ts';
import { recordAudit } from './audit.service.ts';
import { nameRun } from './audit-names.ts';
import { announceCountedRuns } from './news.service.ts';
import { authors, queueRuns } from './review-queue.service.ts';
import { applyBuildDecision, assertBuildWaiting, decide, lockBuildForDecision } from './review.service.ts';

/** A build's pending runs (oldest first) as desk cards with their flags. */
async function pendingRunCards(buildId: number, transaction?: Transaction) {
  const runs = await CalibrationRun.findAll({
    attributes: [...RUN_READ_COLUMNS],
    where: { buildId, status: 'pending' },
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
    transaction,
    ...(transaction ? { lock: transaction.LOCK.UPDATE } : {}),
  });
  const author = await authors(
    runs.map((r) => r.ownerId),
    transaction,
  );
  return { rows: runs, cards: await queueRuns(runs, author, transaction) };
}

/** The build's pending runs as the desk shows them, and what "publish with runs" would do with them. */
export async function getReviewBuildRuns(actor: Actor | null, buildId: number): Promise<ReviewBuildRunsDto> {
  authorize(actor, 'review.access');
  const build = await Build.findByPk(buildId, { attributes: ['id'] });
  if (!build) throw new NotFoundError('No such build.');
  const { cards } = await pendingRunCards(buildId);
  return { buildId, runs: cards, plan: publishWithRunsPlan(cards) };
}

/**
 * Publish a build and accept its pending runs that carry no flag, in one transaction: the build's status,
 * each run's acceptance, the parts' figures, the audit entries and one mail to the owner. Flagged runs stay
 * pending. The moderator must not be the author of the build or of any run it accepts (four eyes), and the
 * runs accepted must be the ones the preview listed.
 */
export async function publishBuildWithRuns(
  actor: Actor | null,
  buildId: number,
  input: PublishWithRunsInput,
): Promise<PublishWithRunsResultDto> {
  return decide(actor, async (me, transaction) => {
    // Runs before the build, as a run decision takes them (run, then its build): the same order cannot deadlock.
    const { rows, cards } = await pendingRunCards(buildId, transaction);
    const build = await lockBuildForDecision(buildId, transaction);
    authorize(me, 'review.decide', { authorIds: [build.ownerId, ...rows.map((r) => r.ownerId)] });
    assertBuildWaiting(build);
    const plan = publishWithRunsPlan(cards);
    if (!samePlan(plan, input.acceptRunIds)) {
      throw new ConflictError(
        'The runs without flags are no longer the ones the preview listed (a run was added, changed or decided); look at the preview again.',
        'plan_changed',
      );
    }
    const accepting = rows.filter((r) => plan.accept.includes(r.id));
    const wasPublished = build.status === 'published';
    // Every part of the build, in id order, before any run changes: a run's status change re-checks its part key,
    // and the build's figures are recomputed over all of them (recomputeBuildParts takes them in the same order).
    const allParts = await CalibrationRun.findAll({ where: { buildId }, attributes: ['partId'], group: ['partId'], transaction });
    const partIds = allParts.map((r) => r.partId).sort((a, b) => a - b);
    for (const id of partIds) await Part.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] });
    const now = new Date();
    const accepted: PublishWithRunsResultDto['accepted'] = [];
    for (const run of accepting) {
      await run.update({ status: 'accepted', reviewNote: null, reviewedById: me.id, reviewedAt: now }, { transaction });
      const name = await nameRun(run, transaction);
      await recordAudit(me, { action: 'run.accept', targetType: 'run', targetId: run.id, targetLabel: name }, transaction);
      accepted.push({ id: run.id, name });
    }
    const stayPending: PublishWithRunsResultDto['stayPending'] = [];
    for (const p of plan.stayPending)
      stayPending.push({
        ...p,
        name: await nameRun(
          rows.find((r) => r.id === p.id)!,
          transaction,
        ),
      });
    const lines = [
      ...(accepted.length ? [`Accepted with it: ${accepted.map((a) => a.name).join('; ')}.`] : []),
      ...(stayPending.length ? [`Still waiting for a closer look: ${stayPending.map((a) => a.name).join('; ')}.`] : []),
    ];
    // Recomputes the build's parts once it is published, with the runs accepted above in their figures; a first
    // publish also tells followers of the parts about those runs.
    await applyBuildDecision(me, build, { decision: 'publish', note: input.note, notePublic: input.notePublic }, transaction, lines);
    if (wasPublished)
      await announceCountedRuns(
        accepted.map((a) => a.id),
        build.title,
        transaction,
      );
    return { id: build.id, status: 'published', accepted, stayPending };
  });
}
