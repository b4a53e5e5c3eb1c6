import type { Transaction } from 'sequelize';
import { withWriteTransaction } from '../db/write-transaction.ts';
import type { Actor } from '@shared/policies.ts';
import type { AcceptRejectInput, BuildDecisionInput, ReportDecisionInput } from '@shared/schemas/review.ts';
import { Build } from '../models/build.model.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { Part } from '../models/part.model.ts';
import { Listing } from '../models/listing.model.ts';
import { Report } from '../models/report.model.ts';
import { BuildComment } from '../models/build-comment.model.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { ConflictError, NotFoundError } from '../errors.ts';
import { recordAudit } from './audit.service.ts';
import { recomputeBuildParts, recomputePartStats } from './part-stats.service.ts';
import { RUN_DECIDABLE_BUILD_STATUSES } from '@shared/review/run-counting.ts';
import { enqueueMail, kickOutbox } from './outbox.service.ts';
import { noticeMail } from './review-mails.ts';
import { invalidateRegistryCounts } from './registry-count-cache.ts';
import { nameListing, nameRun, RUN_NAME_COLUMNS } from './audit-names.ts';
import { notify } from './notification.service.ts';
import { announceCountedRuns, announcePublished } from './news.service.ts';
import { snapshotReview } from './review-history.service.ts';

const notWaiting = (what: string) => new ConflictError(`This ${what} is not waiting for a decision.`, 'not_waiting');

/** Run a decision in one transaction (change + audit + stats + queued mail), then nudge the mail worker. */
export async function decide<T>(actor: Actor | null, work: (actor: Actor, t: Transaction) => Promise<T>): Promise<T> {
  authorize(actor, 'review.access');
  const result = await withWriteTransaction(Build.sequelize!, (t) => work(actor, t));
  kickOutbox();
  return result;
}

async function recipient(userId: number | null, transaction: Transaction) {
  return userId ? User.findByPk(userId, { transaction, attributes: ['id', 'login', 'email', 'mailOptOut'] }) : null;
}

/** The thing a report is about: who owns it (a part's proposer), so a moderator never settles a report on their own work, and its name. */
async function reported(report: Report, transaction: Transaction): Promise<{ ownerId: number | null; label: string }> {
  const id = report.targetId;
  const gone = { ownerId: null, label: `${report.targetType} ${id} (gone)` };
  switch (report.targetType) {
    case 'build': {
      const build = await Build.findByPk(id, { transaction, attributes: ['id', 'ownerId', 'title'] });
      return build ? { ownerId: build.ownerId, label: `build “${build.title}”` } : gone;
    }
    case 'run': {
      const run = await CalibrationRun.findByPk(id, { transaction, attributes: [...RUN_NAME_COLUMNS] });
      return run ? { ownerId: run.ownerId, label: await nameRun(run, transaction) } : gone;
    }
    case 'part': {
      const part = await Part.findByPk(id, { transaction, attributes: ['id', 'proposedById', 'name'] });
      return part ? { ownerId: part.proposedById, label: `part “${part.name}”` } : gone;
    }
    case 'listing': {
      const listing = await Listing.findByPk(id, { transaction });
      return listing ? { ownerId: listing.ownerId, label: `listing ${await nameListing(listing, transaction)}` } : gone;
    }
    case 'comment': {
      const comment = await BuildComment.findByPk(id, { transaction, attributes: ['id', 'authorId', 'buildId'] });
      if (!comment) return gone;
      const [author, build] = await Promise.all([
        User.findByPk(comment.authorId, { transaction, attributes: ['login'] }),
        Build.findByPk(comment.buildId, { transaction, attributes: ['title'] }),
      ]);
      return {
        ownerId: comment.authorId,
        label: `comment by ${author?.login ?? 'a former maker'} on “${build?.title ?? 'a deleted build'}”`,
      };
    }
  }
}

const BUILD_OUTCOME = { publish: 'published', return: 'returned', decline: 'declined' } as const;

/** Publish, return (with notes, editable again) or decline a submitted build; also clears "edited since review" on published ones. */
export async function decideBuild(actor: Actor | null, buildId: number, input: BuildDecisionInput) {
  return decide(actor, async (me, transaction) => {
    const build = await lockBuildForDecision(buildId, transaction);
    authorize(me, 'review.decide', { authorIds: [build.ownerId] });
    return applyBuildDecision(me, build, input, transaction);
  });
}

/** The build under an update lock; 404 when gone. */
export async function lockBuildForDecision(buildId: number, transaction: Transaction): Promise<Build> {
  const build = await Build.findByPk(buildId, { transaction, lock: transaction.LOCK.UPDATE });
  if (!build) throw new NotFoundError('No such build.');
  return build;
}

/** Throws 409 not_waiting unless the build is submitted, or published and edited since its review. */
export function assertBuildWaiting(build: Build) {
  const editedPublished = build.status === 'published' && build.editedSinceReview;
  if (build.status !== 'submitted' && !editedPublished) throw notWaiting('build');
}

/**
 * A build decision inside a transaction (the caller has authorized it): the new status and note, the parts'
 * figures, the audit entry and the owner's mail. `extraLines` go into the mail (what happened to the runs).
 */
export async function applyBuildDecision(
  me: Actor,
  build: Build,
  input: BuildDecisionInput,
  transaction: Transaction,
  extraLines: string[] = [],
): Promise<{ id: number; status: (typeof BUILD_OUTCOME)[keyof typeof BUILD_OUTCOME] }> {
  assertBuildWaiting(build);
  const editedPublished = build.status === 'published' && build.editedSinceReview;
  const status = BUILD_OUTCOME[input.decision];
  const firstPublish = status === 'published' && build.publishedAt === null;
  await build.update(
    {
      status,
      reviewNote: input.note ?? null,
      reviewNotePublic: input.decision === 'publish' && input.notePublic === true && Boolean(input.note),
      editedSinceReview: false,
      publishedAt: status === 'published' ? (build.publishedAt ?? new Date()) : build.publishedAt,
    },
    { transaction },
  );
  // Its runs count only while it is published: publishing, returning and declining all move its parts' figures.
  await recomputeBuildParts(build.id, transaction);
  if (status === 'published' && !editedPublished) await announcePublished(build, firstPublish, transaction);
  // What was reviewed, so a resubmission shows what changed since.
  await snapshotReview(me, build, input.decision, transaction);
  await recordAudit(
    me,
    { action: `build.${input.decision}`, targetType: 'build', targetId: build.id, targetLabel: `“${build.title}”`, note: input.note },
    transaction,
  );
  const owner = await recipient(build.ownerId, transaction);
  if (owner) {
    const lines = {
      publish: [`Your build "${build.title}" is published. Its accepted calibration runs count in the parts registry.`],
      return: [`Your build "${build.title}" was returned with notes. You can edit it and submit it again.`],
      decline: [`Your build "${build.title}" was declined.`],
    }[input.decision];
    const subject = { publish: 'published', return: 'returned with notes', decline: 'declined' }[input.decision];
    await notify([owner.id], { kind: 'review', text: lines[0]!, path: `/builds/${build.id}` }, { transaction });
    await enqueueMail(
      owner,
      noticeMail({
        subject: `Build ${subject}: ${build.title}`,
        greeting: owner.login,
        lines: [...lines, ...extraLines],
        note: input.note ?? null,
        path: `/builds/${build.id}`,
        linkText: 'Open the build',
      }),
      { essential: true, kind: 'review', transaction },
    );
  }
  return { id: build.id, status };
}

/** Accept or reject a pending run; the part's pooled statistics change in the same transaction. */
export async function decideRun(actor: Actor | null, runId: number, input: AcceptRejectInput) {
  return decide(actor, async (me, transaction) => {
    const run = await CalibrationRun.findByPk(runId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!run) throw new NotFoundError('No such calibration run.');
    authorize(me, 'review.decide', { authorIds: [run.ownerId] });
    if (run.status !== 'pending') throw notWaiting('calibration run');
    // Read the build under a shared lock: a decision on the build waits for this one, and this one sees its outcome.
    const build = await Build.findByPk(run.buildId, { transaction, lock: transaction.LOCK.SHARE, attributes: ['id', 'status', 'title'] });
    if (!build || !RUN_DECIDABLE_BUILD_STATUSES.includes(build.status)) {
      throw new ConflictError(
        `This run's build is ${build?.status ?? 'gone'}: runs are decided once their build is submitted, and count only while it is published.`,
        'build_not_submitted',
      );
    }
    // Take the part row first: changing the run's status re-checks its part foreign key (a shared
    // lock), and two decisions on one part would otherwise deadlock upgrading it for the stats.
    await Part.findByPk(run.partId, { transaction, lock: transaction.LOCK.UPDATE, attributes: ['id'] });
    const status = input.decision === 'accept' ? 'accepted' : 'rejected';
    await run.update({ status, reviewNote: input.note ?? null, reviewedById: me.id, reviewedAt: new Date() }, { transaction });
    await recomputePartStats(run.partId, transaction);
    const name = await nameRun(run, transaction);
    if (status === 'accepted' && build.status === 'published') await announceCountedRuns([run.id], build.title, transaction);
    await recordAudit(
      me,
      { action: `run.${input.decision}`, targetType: 'run', targetId: run.id, targetLabel: name, note: input.note },
      transaction,
    );
    const owner = await recipient(run.ownerId, transaction);
    if (owner) {
      await notify(
        [owner.id],
        { kind: 'review', text: `Your calibration run ${name} was ${status}.`, path: `/builds/${run.buildId}` },
        { transaction },
      );
      await enqueueMail(
        owner,
        noticeMail({
          subject: `Calibration run ${status}: ${name}`,
          greeting: owner.login,
          lines: [
            status === 'accepted'
              ? `Your calibration run ${name} was accepted and now counts in the parts registry.`
              : `Your calibration run ${name} was rejected; it does not count in the parts registry.`,
          ],
          note: input.note ?? null,
          path: `/builds/${run.buildId}`,
          linkText: 'Open the build',
        }),
        { essential: false, kind: 'review', transaction },
      );
    }
    return { id: run.id, status };
  });
}

/** Accept a proposed part into the registry, or reject it. */
export async function decidePart(actor: Actor | null, partId: number, input: AcceptRejectInput) {
  return decide(actor, async (me, transaction) => {
    const part = await Part.findByPk(partId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!part) throw new NotFoundError('No such part.');
    authorize(me, 'review.decide', { authorIds: [part.proposedById] });
    if (part.status !== 'proposed') throw notWaiting('part');
    const status = input.decision === 'accept' ? 'accepted' : 'rejected';
    await part.update({ status }, { transaction });
    transaction.afterCommit(invalidateRegistryCounts);
    await recordAudit(
      me,
      { action: `part.${input.decision}`, targetType: 'part', targetId: part.id, targetLabel: part.name, note: input.note },
      transaction,
    );
    const proposer = await recipient(part.proposedById, transaction);
    if (proposer) {
      await enqueueMail(
        proposer,
        noticeMail({
          subject: `Part ${status}: ${part.name}`,
          greeting: proposer.login,
          lines: [
            status === 'accepted'
              ? `The part you proposed, "${part.name}", is now listed in the parts registry.`
              : `The part you proposed, "${part.name}", was not added to the parts registry.`,
          ],
          note: input.note ?? null,
          path: `/parts/${part.id}`,
          linkText: 'Open the part',
        }),
        { essential: false, kind: 'review', transaction },
      );
    }
    return { id: part.id, status };
  });
}

/** Resolve or dismiss an open report; the reporter hears back. */
export async function decideReport(actor: Actor | null, reportId: number, input: ReportDecisionInput) {
  return decide(actor, async (me, transaction) => {
    const report = await Report.findByPk(reportId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!report) throw new NotFoundError('No such report.');
    const thing = await reported(report, transaction);
    authorize(me, 'review.decide', { authorIds: [report.reporterId, thing.ownerId] });
    if (report.status !== 'open') throw notWaiting('report');
    const status = input.decision === 'resolve' ? 'resolved' : 'dismissed';
    await report.update({ status, resolutionNote: input.note, resolvedById: me.id, resolvedAt: new Date() }, { transaction });
    await recordAudit(
      me,
      {
        action: `report.${input.decision}`,
        targetType: 'report',
        targetId: report.id,
        targetLabel: `${report.reason} · ${thing.label}`,
        note: input.note,
      },
      transaction,
    );
    const reporter = await recipient(report.reporterId, transaction);
    if (reporter) {
      await enqueueMail(
        reporter,
        noticeMail({
          subject: `Your report was ${status}`,
          greeting: reporter.login,
          lines: [`Thank you for your report about a ${report.targetType}. A moderator ${status} it.`],
          note: input.note,
          path: '/',
          linkText: 'Open Scanwright',
        }),
        { essential: false, kind: 'review', transaction },
      );
    }
    return { id: report.id, status };
  });
}
