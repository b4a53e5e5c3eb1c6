import { Op } from 'sequelize';
import type { Actor } from '@shared/policies.ts';
import type { QueueBuildDto, QueueReportDto, QueueRunDto, ReviewQueueDto } from '@shared/schemas/review.ts';
import type { FitPoint } from '@shared/schemas/workbench.ts';
import { plausibilityFlags } from '@shared/review/plausibility.ts';
import { expectedGainForPart } from '@shared/workbench/part-expected-gain.ts';
import { toNm, toVolts } from '@shared/units.ts';
import { Build } from '../models/build.model.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { Actuator } from '../models/actuator.model.ts';
import { Part } from '../models/part.model.ts';
import { Photo } from '../models/photo.model.ts';
import { LogEntry } from '../models/log-entry.model.ts';
import { Report } from '../models/report.model.ts';
import { User } from '../models/user.model.ts';
import { authorize } from '../policies/authorize.ts';
import { presentRun } from '../presenters/run.presenter.ts';
import { presentPartSummary } from '../presenters/part.presenter.ts';
import { describeTarget } from './report.service.ts';

const LIMIT = 100;
const countBy = (rows: { buildId: number }[], id: number) => rows.filter((r) => r.buildId === id).length;

async function authors(ids: (number | null)[]) {
  const users = await User.findAll({
    where: { id: [...new Set(ids.filter((i): i is number => i !== null))] },
    attributes: ['id', 'login'],
  });
  const map = new Map(users.map((u) => [u.id, { id: u.id, login: u.login }]));
  return (id: number | null) => (id === null ? null : (map.get(id) ?? { id, login: 'unknown' }));
}

async function queueBuilds(builds: Build[]): Promise<QueueBuildDto[]> {
  const ids = builds.map((b) => b.id);
  const [author, photos, entries, actuators, pending] = await Promise.all([
    authors(builds.map((b) => b.ownerId)),
    Photo.findAll({ where: { buildId: ids }, attributes: ['buildId'] }),
    LogEntry.findAll({ where: { buildId: ids }, attributes: ['buildId'] }),
    Actuator.findAll({ where: { buildId: ids }, attributes: ['buildId'] }),
    CalibrationRun.findAll({ where: { buildId: ids, status: 'pending' }, attributes: ['buildId'] }),
  ]);
  return builds.map((b) => ({
    id: b.id,
    title: b.title,
    instrumentKind: b.instrumentKind,
    summary: b.summary,
    author: author(b.ownerId)!,
    submittedAt: b.submittedAt?.toISOString() ?? null,
    updatedAt: b.updatedAt.toISOString(),
    photoCount: countBy(photos, b.id),
    entryCount: countBy(entries, b.id),
    actuatorCount: countBy(actuators, b.id),
    pendingRunCount: countBy(pending, b.id),
  }));
}

async function queueRuns(runs: CalibrationRun[]): Promise<QueueRunDto[]> {
  const partIds = [...new Set(runs.map((r) => r.partId))];
  const [author, parts, accepted, actuators, builds] = await Promise.all([
    authors(runs.map((r) => r.ownerId)),
    Part.findAll({ where: { id: partIds } }),
    CalibrationRun.findAll({ where: { partId: partIds, status: 'accepted' }, attributes: ['partId', 'gainNmPerV'] }),
    Actuator.findAll({ where: { id: [...new Set(runs.map((r) => r.actuatorId))] } }),
    Build.findAll({ where: { id: [...new Set(runs.map((r) => r.buildId))] }, attributes: ['id', 'title'] }),
  ]);
  const partMap = new Map(parts.map((p) => [p.id, p]));
  const actuatorMap = new Map(actuators.map((a) => [a.id, a]));
  const buildMap = new Map(builds.map((b) => [b.id, b]));
  return runs.map((r) => {
    const part = partMap.get(r.partId)!;
    const actuator = actuatorMap.get(r.actuatorId);
    const gains = accepted.filter((a) => a.partId === r.partId).map((a) => Math.abs(a.gainNmPerV));
    const expected = actuator ? expectedGainForPart(part, actuator.drive, actuator.axis) : null;
    const dto = presentRun(r);
    const points = (JSON.parse(r.pointsJson) as FitPoint[]).map((p) => ({
      volts: toVolts(p.volts, r.voltageUnit),
      displacementNm: toNm(p.displacement, r.displacementUnit),
      ...(p.sweep ? { sweep: p.sweep } : {}),
    }));
    return {
      id: r.id,
      buildId: r.buildId,
      buildTitle: buildMap.get(r.buildId)?.title ?? '',
      actuatorLabel: actuator?.label ?? null,
      axis: actuator?.axis ?? '',
      author: author(r.ownerId)!,
      part: { id: part.id, name: part.name, category: part.category, stats: presentPartSummary(part).stats, acceptedGainsNmPerV: gains },
      method: r.method,
      fit: dto.fit,
      points,
      expectedGainNmPerV: expected?.gainNmPerV ?? null,
      flags: plausibilityFlags(
        { n: r.pointCount, gainNmPerV: r.gainNmPerV, r2: r.r2, hysteresisPctFs: r.hysteresisPctFs },
        gains,
        expected?.gainNmPerV ?? null,
      ),
      createdAt: r.createdAt.toISOString(),
    };
  });
}

async function queueReports(reports: Report[]): Promise<QueueReportDto[]> {
  const author = await authors(reports.map((r) => r.reporterId));
  return Promise.all(
    reports.map(async (r) => ({
      id: r.id,
      targetType: r.targetType,
      targetId: r.targetId,
      targetLabel: await describeTarget(r.targetType, r.targetId),
      reason: r.reason,
      note: r.note,
      reporter: author(r.reporterId)!,
      createdAt: r.createdAt.toISOString(),
    })),
  );
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
      where: { status: 'pending', buildId: { [Op.notIn]: Build.sequelize!.literal("(SELECT id FROM builds WHERE status = 'draft')") } },
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
  const partAuthor = await authors(parts.rows.map((p) => p.proposedById));
  return {
    counts: { builds: builds.count, runs: runs.count, parts: parts.count, reports: reports.count, edited: edited.count },
    builds: await queueBuilds(builds.rows),
    edited: await queueBuilds(edited.rows),
    runs: await queueRuns(runs.rows),
    parts: parts.rows.map((p) => ({
      id: p.id,
      name: p.name,
      category: p.category,
      salvageSource: p.salvageSource,
      material: p.material,
      notes: p.notes,
      author: partAuthor(p.proposedById),
      createdAt: p.createdAt.toISOString(),
    })),
    reports: await queueReports(reports.rows),
  };
}
