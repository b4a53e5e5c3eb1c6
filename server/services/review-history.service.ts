// The snapshot of what a moderator reviewed at each build decision (write-up + run summary), and the
// history the desk shows: earlier decisions with their notes, and what changed since the last review.
import { Op, type Transaction } from 'sequelize';
import type { Actor } from '@shared/policies.ts';
import type { ReviewDecisionDto, ReviewedRun, ReviewHistoryDto } from '@shared/schemas/review-desk.ts';
import { formatPlusMinus } from '@shared/format/measured-number.ts';
import { runGainPlusMinus } from '@shared/export/run-figures.ts';
import { runChanges, writeUpChanges } from '@shared/review/resubmission-diff.ts';
import { Actuator } from '../models/actuator.model.ts';
import { AuditEntry } from '../models/audit-entry.model.ts';
import { Build } from '../models/build.model.ts';
import { BuildReviewSnapshot } from '../models/build-review-snapshot.model.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { Part } from '../models/part.model.ts';
import { User } from '../models/user.model.ts';
import { RUN_READ_COLUMNS, presentRun } from '../presenters/run.presenter.ts';
import { authorize } from '../policies/authorize.ts';
import { NotFoundError } from '../errors.ts';

/** Every run of the build (oldest first) as a moderator sees it: actuator and part, gain as printed, status. */
async function reviewedRuns(buildId: number, transaction?: Transaction): Promise<ReviewedRun[]> {
  const runs = await CalibrationRun.findAll({
    attributes: [...RUN_READ_COLUMNS],
    where: { buildId },
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
    transaction,
  });
  if (runs.length === 0) return [];
  const actuators = await Actuator.findAll({
    where: { id: [...new Set(runs.map((r) => r.actuatorId))] },
    attributes: ['id', 'label', 'axis'],
    transaction,
  });
  const parts = await Part.findAll({ where: { id: [...new Set(runs.map((r) => r.partId))] }, attributes: ['id', 'name'], transaction });
  const actuator = new Map(actuators.map((a) => [a.id, a]));
  const part = new Map(parts.map((p) => [p.id, p.name]));
  return runs.map((r) => {
    const a = actuator.get(r.actuatorId);
    const { fit } = presentRun(r);
    const pm = runGainPlusMinus(fit);
    return {
      id: r.id,
      actuator: `${a?.label?.trim() || `${a?.axis ?? '?'} axis`} · ${part.get(r.partId) ?? `part ${r.partId}`}`,
      gain: formatPlusMinus(fit.gainNmPerV, pm.halfWidth, pm.kind),
      status: r.status,
    };
  });
}

/** Keep what the moderator decided on, inside the decision's transaction. */
export async function snapshotReview(me: Actor, build: Build, decision: string, transaction: Transaction): Promise<void> {
  await BuildReviewSnapshot.create(
    {
      buildId: build.id,
      moderatorId: me.id,
      decision,
      body: build.body,
      runsJson: JSON.stringify(await reviewedRuns(build.id, transaction)),
    },
    { transaction },
  );
}

/** The build's decisions and notes (its own and its runs', newest first) and its changes since the last review. */
export async function getReviewHistory(actor: Actor | null, buildId: number): Promise<ReviewHistoryDto> {
  authorize(actor, 'review.access');
  const build = await Build.findByPk(buildId, { attributes: ['id', 'body'] });
  if (!build) throw new NotFoundError('No such build.');
  const [runIds, last] = await Promise.all([
    CalibrationRun.findAll({ where: { buildId }, attributes: ['id'] }),
    BuildReviewSnapshot.findOne({ where: { buildId }, order: [['id', 'DESC']] }),
  ]);
  const entries = await AuditEntry.findAll({
    where: {
      [Op.or]: [
        { targetType: 'build', targetId: buildId, action: { [Op.like]: 'build.%' } },
        ...(runIds.length ? [{ targetType: 'run', targetId: runIds.map((r) => r.id), action: { [Op.like]: 'run.%' } }] : []),
      ],
    },
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: 200,
  });
  const userIds = [...new Set([...entries.map((e) => e.actorId), ...(last ? [last.moderatorId] : [])])];
  const users = userIds.length ? await User.findAll({ where: { id: userIds }, attributes: ['id', 'login'] }) : [];
  const login = (id: number) => users.find((u) => u.id === id)?.login ?? 'unknown';
  const decisions: ReviewDecisionDto[] = entries.map((e) => ({
    id: e.id,
    action: e.action,
    targetType: e.targetType as 'build' | 'run',
    targetId: e.targetId,
    targetLabel: e.targetLabel,
    moderator: login(e.actorId),
    note: e.note,
    createdAt: e.createdAt.toISOString(),
  }));
  if (!last) return { buildId, decisions, lastReview: null, writeUp: null, runs: null };
  const now = await reviewedRuns(buildId);
  return {
    buildId,
    decisions,
    lastReview: { decision: last.decision, moderator: login(last.moderatorId), at: last.createdAt.toISOString() },
    writeUp: writeUpChanges(last.body, build.body),
    runs: runChanges(JSON.parse(last.runsJson) as ReviewedRun[], now),
  };
}
