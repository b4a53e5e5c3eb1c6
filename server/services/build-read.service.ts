import { Op } from 'sequelize';
import { can, type Actor } from '@shared/policies.ts';
import type { BuildDto, BuildOwnerDto, BuildSummaryDto, PhotoDto } from '@shared/schemas/build.ts';
import type { ActuatorDto } from '@shared/schemas/actuator.ts';
import { Build } from '../models/build.model.ts';
import { User } from '../models/user.model.ts';
import { Photo } from '../models/photo.model.ts';
import { LogEntry } from '../models/log-entry.model.ts';
import { Actuator } from '../models/actuator.model.ts';
import { Part } from '../models/part.model.ts';
import { CalibrationRun } from '../models/calibration-run.model.ts';
import { presentPhoto } from '../presenters/photo.presenter.ts';
import { RUN_READ_COLUMNS } from '../presenters/run.presenter.ts';
import {
  coverOf,
  presentActuator,
  presentBuildPage,
  presentBuildSummary,
  presentEntries,
  presentGains,
  type BuildCardExtras,
  type BuildPageContent,
} from '../presenters/build.presenter.ts';
import { cachedPublicRead } from './public-read-cache.ts';

const PHOTO_COLUMNS = ['id', 'buildId', 'entryId', 'displayFile', 'thumbFile', 'width', 'height', 'alt', 'position'] as const;
const photoOrder: Array<[string, 'ASC']> = [
  ['position', 'ASC'],
  ['id', 'ASC'],
];
const newestFirst: Array<[string, 'DESC']> = [
  ['createdAt', 'DESC'],
  ['id', 'DESC'],
];

async function ownersById(ids: number[]): Promise<(id: number) => BuildOwnerDto> {
  const users = await User.findAll({ where: { id: [...new Set(ids)] }, attributes: ['id', 'login', 'name'] });
  const map = new Map(users.map((u) => [u.id, u]));
  return (id) => ({ id, login: map.get(id)?.login ?? 'unknown', name: map.get(id)?.name ?? null });
}

/** Owners, covers and headline gains of several builds: four queries whatever the number of builds. */
async function loadCardExtras(builds: Build[]): Promise<Map<number, BuildCardExtras>> {
  const ids = builds.map((b) => b.id);
  const [owner, photos, actuators, runs] = await Promise.all([
    ownersById(builds.map((b) => b.ownerId)),
    Photo.findAll({ where: { buildId: ids }, attributes: [...PHOTO_COLUMNS], order: photoOrder }),
    Actuator.findAll({
      where: { buildId: ids },
      attributes: ['id', 'buildId', 'axis'],
      include: [{ model: Part, as: 'part', attributes: ['id', 'name'] }],
      order: [['id', 'ASC']],
    }),
    CalibrationRun.findAll({
      where: { buildId: ids, status: { [Op.ne]: 'rejected' } },
      attributes: ['id', 'actuatorId', 'buildId', 'status', 'gainNmPerV', 'createdAt'],
      order: newestFirst,
    }),
  ]);
  return new Map(
    builds.map((b) => [
      b.id,
      {
        owner: owner(b.ownerId),
        cover: coverOf(b, photos.filter((p) => p.buildId === b.id).map(presentPhoto)),
        gains: presentGains(
          actuators.filter((a) => a.buildId === b.id),
          runs.filter((r) => r.buildId === b.id),
        ),
      },
    ]),
  );
}

/** Summaries for a page of builds in a fixed number of queries (no N+1), cached briefly (see public-read-cache). */
export async function summarizeBuilds(actor: Actor | null, builds: Build[]): Promise<BuildSummaryDto[]> {
  if (builds.length === 0) return [];
  const key = `build-cards:${builds.map((b) => `${b.id}.${b.ownerId}.${b.coverPhotoId ?? ''}`).join(',')}`;
  const extras = await cachedPublicRead(Build.sequelize!, key, () => loadCardExtras(builds));
  return builds.map((b) => presentBuildSummary(b, extras.get(b.id)!, can(actor, 'build.view-review-note', { ownerId: b.ownerId })));
}

/** Actuators of a build with their parts, runs and expected gain. Rejected runs show only to those who may see unpublished work. */
export async function loadActuators(buildId: number, includeRejected: boolean): Promise<ActuatorDto[]> {
  const [actuators, runs] = await Promise.all([
    Actuator.findAll({ where: { buildId }, include: [{ model: Part, as: 'part' }], order: [['id', 'ASC']] }),
    CalibrationRun.findAll({
      attributes: [...RUN_READ_COLUMNS],
      where: { buildId, ...(includeRejected ? {} : { status: { [Op.ne]: 'rejected' } }) },
      order: newestFirst,
    }),
  ]);
  return actuators.map((a) => presentActuator(a, a.part!, runs));
}

/** Everything on a build page that does not depend on the viewer: five queries, however many actuators, runs or entries. */
async function loadBuildPage(build: Build, includeRejected: boolean): Promise<BuildPageContent> {
  const [owner, photoRows, entries, actuatorRows, runs] = await Promise.all([
    ownersById([build.ownerId]),
    Photo.findAll({ where: { buildId: build.id }, attributes: [...PHOTO_COLUMNS], order: photoOrder }),
    LogEntry.findAll({
      where: { buildId: build.id },
      attributes: ['id', 'entryDate', 'title', 'body'],
      order: [
        ['entryDate', 'ASC'],
        ['id', 'ASC'],
      ],
    }),
    Actuator.findAll({ where: { buildId: build.id }, include: [{ model: Part, as: 'part' }], order: [['id', 'ASC']] }),
    CalibrationRun.findAll({
      attributes: [...RUN_READ_COLUMNS],
      where: { buildId: build.id, ...(includeRejected ? {} : { status: { [Op.ne]: 'rejected' } }) },
      order: newestFirst,
    }),
  ]);
  const photos: PhotoDto[] = photoRows.map(presentPhoto);
  return {
    extras: { owner: owner(build.ownerId), cover: coverOf(build, photos), gains: presentGains(actuatorRows, runs) },
    photos,
    entries: presentEntries(entries, photos),
    actuators: actuatorRows.map((a) => presentActuator(a, a.part!, runs)),
  };
}

/** The whole build page: write-up, photos, entries with their photos, actuators with runs, and what the viewer may do. */
export async function presentBuildDetail(actor: Actor | null, build: Build): Promise<BuildDto> {
  const includeRejected = can(actor, 'build.view-unpublished', { ownerId: build.ownerId });
  const key = `build-page:${build.id}:${build.coverPhotoId ?? ''}:${includeRejected}`;
  const content = await cachedPublicRead(Build.sequelize!, key, () => loadBuildPage(build, includeRejected));
  return presentBuildPage(
    build,
    content,
    can(actor, 'build.edit', { ownerId: build.ownerId }),
    can(actor, 'build.view-review-note', { ownerId: build.ownerId }),
  );
}
