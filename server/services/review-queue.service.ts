import { Op, col, fn, type Model, type ModelStatic, type Transaction } from 'sequelize';
import type { Actor } from '@shared/policies.ts';
import type { QueueBuildDto, QueueRunDto, ReviewAuthorDto, ReviewQueueDto } from '@shared/schemas/review.ts';
import type { ReportTargetType } from '@shared/schemas/review-vocabulary.ts';
import { Build } from '../models/build.model.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { RUN_READ_COLUMNS } from '../presenters/run.presenter.ts';
import { Actuator } from '../models/actuator.model.ts';
import { Part } from '../models/part.model.ts';
import { Photo } from '../models/photo.model.ts';
import { LogEntry } from '../models/log-entry.model.ts';
import { BuildComment } from '../models/build-comment.model.ts';
import { Report } from '../models/report.model.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { presentQueueBuild, presentQueuePart, presentQueueReport, presentQueueRun } from '../presenters/review-queue.presenter.ts';
import { RUN_DECIDABLE_BUILD_STATUSES } from '@shared/review/run-counting.ts';
import { countingRuns } from './part-stats.service.ts';

const LIMIT = 100;

type AuthorOf = (id: number | null) => ReviewAuthorDto | null;

/** Logins of every author on the desk in one query. */
export async function authors(ids: (number | null)[], transaction?: Transaction): Promise<AuthorOf> {
  const wanted = [...new Set(ids.filter((i): i is number => i !== null))];
  const users = wanted.length ? await User.findAll({ where: { id: wanted }, attributes: ['id', 'login'], transaction }) : [];
  const map = new Map(users.map((u) => [u.id, { id: u.id, login: u.login }]));
  return (id) => (id === null ? null : (map.get(id) ?? { id, login: 'unknown' }));
}

/** Rows per build of one table, counted by the database: `SELECT build_id, COUNT(*) … GROUP BY build_id`. */
async function countPerBuild(model: ModelStatic<Model>, ids: number[], where: Record<string, unknown> = {}): Promise<Map<number, number>> {
  const rows = (await model.findAll({
    where: { buildId: ids, ...where },
    attributes: ['buildId', [fn('COUNT', col('id')), 'n']],
    group: ['buildId'],
    raw: true,
  })) as unknown as Array<{ buildId: number; n: number | string }>;
  return new Map(rows.map((r) => [r.buildId, Number(r.n)]));
}

/** Build cards for the desk (submitted and edited together): four grouped counts whatever the number of builds. */
async function queueBuilds(builds: Build[], author: AuthorOf): Promise<Map<number, QueueBuildDto>> {
  const ids = [...new Set(builds.map((b) => b.id))];
  if (ids.length === 0) return new Map();
  const [photos, entries, actuators, pending] = await Promise.all([
    countPerBuild(Photo as unknown as ModelStatic<Model>, ids),
    countPerBuild(LogEntry as unknown as ModelStatic<Model>, ids),
    countPerBuild(Actuator as unknown as ModelStatic<Model>, ids),
    countPerBuild(CalibrationRun as unknown as ModelStatic<Model>, ids, { status: 'pending' }),
  ]);
  return new Map(
    builds.map((b) => [
      b.id,
      presentQueueBuild(b, author(b.ownerId)!, {
        photoCount: photos.get(b.id) ?? 0,
        entryCount: entries.get(b.id) ?? 0,
        actuatorCount: actuators.get(b.id) ?? 0,
        pendingRunCount: pending.get(b.id) ?? 0,
      }),
    ]),
  );
}

/**
 * Pending runs with their parts, actuators, builds and the parts' accepted gains: four queries whatever the number of runs.
 * Inside a decision's transaction the queries run one after another on its connection.
 */
export async function queueRuns(runs: CalibrationRun[], author: AuthorOf, transaction?: Transaction): Promise<QueueRunDto[]> {
  if (runs.length === 0) return [];
  const partIds = [...new Set(runs.map((r) => r.partId))];
  const queries = [
    () => Part.findAll({ where: { id: partIds }, transaction }),
    () => CalibrationRun.findAll({ where: countingRuns({ partId: partIds }), attributes: ['partId', 'gainNmPerV'], transaction }),
    () =>
      Actuator.findAll({
        where: { id: [...new Set(runs.map((r) => r.actuatorId))] },
        attributes: ['id', 'label', 'axis', 'drive'],
        transaction,
      }),
    () => Build.findAll({ where: { id: [...new Set(runs.map((r) => r.buildId))] }, attributes: ['id', 'title'], transaction }),
  ] as const;
  const [parts, accepted, actuators, builds] = transaction
    ? [await queries[0](), await queries[1](), await queries[2](), await queries[3]()]
    : await Promise.all([queries[0](), queries[1](), queries[2](), queries[3]()]);
  const partMap = new Map(parts.map((p) => [p.id, p]));
  const actuatorMap = new Map(actuators.map((a) => [a.id, a]));
  const buildMap = new Map(builds.map((b) => [b.id, b]));
  const gainsByPart = new Map<number, number[]>();
  for (const a of accepted) gainsByPart.set(a.partId, [...(gainsByPart.get(a.partId) ?? []), Math.abs(a.gainNmPerV)]);
  return runs.map((r) =>
    presentQueueRun(r, {
      author: author(r.ownerId)!,
      part: partMap.get(r.partId)!,
      actuator: actuatorMap.get(r.actuatorId),
      buildTitle: buildMap.get(r.buildId)?.title ?? '',
      acceptedGains: gainsByPart.get(r.partId) ?? [],
    }),
  );
}

const DECIDABLE_SQL = RUN_DECIDABLE_BUILD_STATUSES.map((s) => `'${s}'`).join(', ');

/** Labels (and for comments, where they are shown) for what reports point at: one `IN (…)` query per target type. */
async function targetLabels(reports: Report[]): Promise<(r: Report) => { label: string; path: string | null }> {
  const idsOf = (type: ReportTargetType) => [...new Set(reports.filter((r) => r.targetType === type).map((r) => r.targetId))];
  const [builds, parts, runs, comments] = await Promise.all([
    idsOf('build').length ? Build.findAll({ where: { id: idsOf('build') }, attributes: ['id', 'title'] }) : [],
    idsOf('part').length ? Part.findAll({ where: { id: idsOf('part') }, attributes: ['id', 'name'] }) : [],
    idsOf('run').length ? CalibrationRun.findAll({ where: { id: idsOf('run') }, attributes: ['id', 'gainNmPerV'] }) : [],
    idsOf('comment').length
      ? BuildComment.findAll({ where: { id: idsOf('comment') }, attributes: ['id', 'buildId', 'authorId', 'body'] })
      : [],
  ]);
  const title = new Map(builds.map((b) => [b.id, b.title]));
  const name = new Map(parts.map((p) => [p.id, p.name]));
  const gain = new Map(runs.map((r) => [r.id, r.gainNmPerV]));
  const comment = new Map(comments.map((c) => [c.id, c]));
  const noPath = (label: string) => ({ label, path: null });
  return ({ targetType: type, targetId: id }) => {
    if (type === 'build') return noPath(title.get(id) ?? `build ${id} (gone)`);
    if (type === 'part') return noPath(name.get(id) ?? `part ${id} (gone)`);
    if (type === 'run') {
      const g = gain.get(id);
      return noPath(g !== undefined ? `calibration run ${id} (${Number(g.toPrecision(4))} nm/V)` : `run ${id} (gone)`);
    }
    if (type === 'comment') {
      const c = comment.get(id);
      if (!c) return noPath(`comment ${id} (gone)`);
      const excerpt = c.body.length > 120 ? `${c.body.slice(0, 120)}…` : c.body;
      return { label: `comment: “${excerpt}”`, path: `/builds/${c.buildId}#comment-${c.id}` };
    }
    return noPath(`listing ${id}`);
  };
}

/** Everything waiting for a moderator, oldest first, with what is needed to decide without clicking through. */
export async function getReviewQueue(actor: Actor | null): Promise<ReviewQueueDto> {
  authorize(actor, 'review.access');
  const [builds, edited, runs, parts, reports] = await Promise.all([
    Build.findAndCountAll({
      where: { status: 'submitted' },
      order: [
        ['submittedAt', 'ASC'],
        ['id', 'ASC'],
      ],
      limit: LIMIT,
    }),
    Build.findAndCountAll({
      where: { status: 'published', editedSinceReview: true },
      order: [
        ['updatedAt', 'ASC'],
        ['id', 'ASC'],
      ],
      limit: LIMIT,
    }),
    CalibrationRun.findAndCountAll({
      attributes: [...RUN_READ_COLUMNS],
      where: {
        status: 'pending',
        buildId: { [Op.in]: Build.sequelize!.literal(`(SELECT id FROM builds WHERE status IN (${DECIDABLE_SQL}))`) },
      },
      order: [
        ['createdAt', 'ASC'],
        ['id', 'ASC'],
      ],
      limit: LIMIT,
    }),
    Part.findAndCountAll({
      where: { status: 'proposed', mergedIntoId: null },
      order: [
        ['createdAt', 'ASC'],
        ['id', 'ASC'],
      ],
      limit: LIMIT,
    }),
    Report.findAndCountAll({
      where: { status: 'open' },
      order: [
        ['createdAt', 'ASC'],
        ['id', 'ASC'],
      ],
      limit: LIMIT,
    }),
  ]);
  const author = await authors([
    ...builds.rows.map((b) => b.ownerId),
    ...edited.rows.map((b) => b.ownerId),
    ...runs.rows.map((r) => r.ownerId),
    ...parts.rows.map((p) => p.proposedById),
    ...reports.rows.map((r) => r.reporterId),
  ]);
  const [buildCards, runCards, labelOf] = await Promise.all([
    queueBuilds([...builds.rows, ...edited.rows], author),
    queueRuns(runs.rows, author),
    targetLabels(reports.rows),
  ]);
  return {
    counts: { builds: builds.count, runs: runs.count, parts: parts.count, reports: reports.count, edited: edited.count },
    builds: builds.rows.map((b) => buildCards.get(b.id)!),
    edited: edited.rows.map((b) => buildCards.get(b.id)!),
    runs: runCards,
    parts: parts.rows.map((p) => presentQueuePart(p, author(p.proposedById))),
    reports: reports.rows.map((r) => presentQueueReport(r, author(r.reporterId)!, labelOf(r))),
  };
}
