import { Op } from 'sequelize';
import { can, type Actor } from '@shared/policies.ts';
import type { BuildDto, BuildGainDto, BuildSummaryDto, LogEntryDto } from '@shared/schemas/build.ts';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import { expectedGainForPart } from '@shared/workbench/part-expected-gain.ts';
import { Build } from '../models/build.model.ts';
import { User } from '../models/user.model.ts';
import { Photo } from '../models/photo.model.ts';
import { LogEntry } from '../models/log-entry.model.ts';
import { Actuator } from '../models/actuator.model.ts';
import { Part } from '../models/part.model.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { presentPhoto } from '../presenters/photo.presenter.ts';
import { presentPartSummary } from '../presenters/part.presenter.ts';
import { presentRun } from '../presenters/run.presenter.ts';

const byId = <T extends { id: number }>(rows: T[]) => new Map(rows.map((r) => [r.id, r]));

/** The run a card shows for an actuator: its newest accepted run, else its newest run. */
function headlineRun(runs: CalibrationRun[]): CalibrationRun | undefined {
  return runs.find((r) => r.status === 'accepted') ?? runs[0];
}

/** Summaries for a page of builds in a fixed number of queries (no N+1). */
export async function summarizeBuilds(builds: Build[]): Promise<BuildSummaryDto[]> {
  if (builds.length === 0) return [];
  const ids = builds.map((b) => b.id);
  const [owners, photos, actuators, runs] = await Promise.all([
    User.findAll({ where: { id: [...new Set(builds.map((b) => b.ownerId))] }, attributes: ['id', 'login', 'name'] }),
    Photo.findAll({
      where: { buildId: ids },
      order: [
        ['position', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    Actuator.findAll({
      where: { buildId: ids },
      include: [{ model: Part, as: 'part', attributes: ['id', 'name'] }],
      order: [['id', 'ASC']],
    }),
    CalibrationRun.findAll({
      where: { buildId: ids, status: { [Op.ne]: 'rejected' } },
      attributes: ['id', 'actuatorId', 'status', 'gainNmPerV', 'createdAt'],
      order: [
        ['createdAt', 'DESC'],
        ['id', 'DESC'],
      ],
    }),
  ]);
  const ownerMap = byId(owners);
  return builds.map((b) => {
    const own = photos.filter((p) => p.buildId === b.id);
    const cover = own.find((p) => p.id === b.coverPhotoId) ?? own[0] ?? null;
    const gains: BuildGainDto[] = [];
    for (const a of actuators.filter((x) => x.buildId === b.id)) {
      const run = headlineRun(runs.filter((r) => r.actuatorId === a.id));
      if (run)
        gains.push({ actuatorId: a.id, axis: a.axis, partName: a.part?.name ?? '', gainNmPerV: run.gainNmPerV, runStatus: run.status });
    }
    const owner = ownerMap.get(b.ownerId);
    return {
      id: b.id,
      title: b.title,
      instrumentKind: b.instrumentKind,
      summary: b.summary,
      stage: b.stage,
      status: b.status,
      owner: { id: b.ownerId, login: owner?.login ?? 'unknown', name: owner?.name ?? null },
      cover: cover ? presentPhoto(cover) : null,
      gains,
      editedSinceReview: b.editedSinceReview,
      reviewNote: b.reviewNote,
      createdAt: b.createdAt.toISOString(),
      updatedAt: b.updatedAt.toISOString(),
      publishedAt: b.publishedAt?.toISOString() ?? null,
    };
  });
}

/** Actuators of a build with their parts, runs and expected gain. Rejected runs show only to those who may see unpublished work. */
export async function loadActuators(buildId: number, includeRejected: boolean): Promise<ActuatorDto[]> {
  const actuators = await Actuator.findAll({ where: { buildId }, include: [{ model: Part, as: 'part' }], order: [['id', 'ASC']] });
  const runs = await CalibrationRun.findAll({
    where: { buildId, ...(includeRejected ? {} : { status: { [Op.ne]: 'rejected' } }) },
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return actuators.map((a) => {
    const part = a.part!;
    const expected = expectedGainForPart(part, a.drive, a.axis);
    return {
      id: a.id,
      buildId: a.buildId,
      label: a.label,
      axis: a.axis,
      drive: a.drive,
      amplifier: a.amplifier,
      maxVolts: a.maxVolts,
      notes: a.notes,
      part: presentPartSummary(part),
      expectedGain: expected
        ? { gainNmPerV: expected.gainNmPerV, lowNmPerV: expected.lowNmPerV, highNmPerV: expected.highNmPerV, basis: expected.basis }
        : null,
      runs: runs.filter((r) => r.actuatorId === a.id).map((r) => presentRun(r)),
    };
  });
}

/** The whole build page: write-up, photos, entries with their photos, actuators with runs, and what the viewer may do. */
export async function presentBuildDetail(actor: Actor | null, build: Build): Promise<BuildDto> {
  const [summary] = await summarizeBuilds([build]);
  const mayEdit = can(actor, 'build.edit', { ownerId: build.ownerId });
  const [photos, entries, actuators] = await Promise.all([
    Photo.findAll({
      where: { buildId: build.id },
      order: [
        ['position', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    LogEntry.findAll({
      where: { buildId: build.id },
      order: [
        ['entryDate', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    loadActuators(build.id, can(actor, 'build.view-unpublished', { ownerId: build.ownerId })),
  ]);
  const entryDtos: LogEntryDto[] = entries.map((e) => ({
    id: e.id,
    entryDate: e.entryDate,
    title: e.title,
    body: e.body,
    photos: photos.filter((p) => p.entryId === e.id).map(presentPhoto),
  }));
  const editable = build.status === 'draft' || build.status === 'returned' || build.status === 'published';
  return {
    ...summary!,
    body: build.body,
    photos: photos.map(presentPhoto),
    entries: entryDtos,
    actuators,
    abilities: {
      edit: mayEdit && editable,
      submit: mayEdit && (build.status === 'draft' || build.status === 'returned'),
      delete: mayEdit && build.status === 'draft',
    },
  };
}
