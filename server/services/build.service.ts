import { Op, type WhereOptions } from 'sequelize';
import type { PhotoStore } from '../storage/photo-store.ts';
import { withWriteTransaction } from '../db/write-transaction.ts';
import type { Actor } from '@shared/policies.ts';
import type { BuildDto, BuildListDto, CreateBuildInput, ListBuildsQuery, UpdateBuildInput } from '@shared/schemas/build.ts';
import { Build } from '../models/build.model.ts';
import { Photo } from '../models/photo.model.ts';
import { authorize } from '../policies/authorize.ts';
import { ConflictError, ValidationError } from '../errors.ts';
import { loadBuildForEdit, loadBuildForView, markEdited } from './build-access.ts';
import { presentBuildDetail, summarizeBuilds } from './build-read.service.ts';
import { pruneAfterRemoval } from './photo-files.ts';
import { containsPattern } from '../db/like-pattern.ts';
import { cachedPublicRead } from './public-read-cache.ts';
import { recomputeBuildParts } from './part-stats.service.ts';

/** Start a build as a draft owned by the actor. */
export async function createBuild(actor: Actor | null, input: CreateBuildInput): Promise<BuildDto> {
  authorize(actor, 'content.create');
  const build = await Build.create({ ownerId: actor.id, ...input, body: input.body ?? '', stage: input.stage ?? 'planning' });
  return presentBuildDetail(actor, build);
}

/**
 * Published builds, newest first, filtered by instrument kind and text. The same for every viewer, so
 * a page is cached briefly (public-read-cache.ts, dropped on any write); cards never need the write-up.
 */
export async function listPublishedBuilds(query: ListBuildsQuery): Promise<BuildListDto> {
  return cachedPublicRead(Build.sequelize!, `builds-index:${JSON.stringify(query)}`, () => loadPublishedBuilds(query));
}

async function loadPublishedBuilds(query: ListBuildsQuery): Promise<BuildListDto> {
  const where: WhereOptions<Build> = { status: 'published' };
  if (query.kind) Object.assign(where, { instrumentKind: query.kind });
  if (query.q) {
    const like = containsPattern(query.q);
    Object.assign(where, { [Op.or]: [{ title: { [Op.like]: like } }, { summary: { [Op.like]: like } }, { body: { [Op.like]: like } }] });
  }
  const { rows, count } = await Build.findAndCountAll({
    where,
    attributes: { exclude: ['body'] },
    order: [
      ['publishedAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: query.pageSize,
    offset: (query.page - 1) * query.pageSize,
  });
  // The same for every viewer: only public review notes.
  return { items: await summarizeBuilds(null, rows), total: count, page: query.page, pageSize: query.pageSize };
}

/** Every build of the actor, any state, most recently changed first. */
export async function listMyBuilds(actor: Actor | null): Promise<BuildListDto> {
  authorize(actor, 'content.create');
  const rows = await Build.findAll({
    where: { ownerId: actor.id },
    order: [
      ['updatedAt', 'DESC'],
      ['id', 'DESC'],
    ],
    limit: 500,
  });
  return { items: await summarizeBuilds(actor, rows), total: rows.length, page: 1, pageSize: rows.length };
}

/** One build as its page shows it (404 for builds the actor may not see). */
export async function getBuild(actor: Actor | null, buildId: number): Promise<BuildDto> {
  return presentBuildDetail(actor, await loadBuildForView(actor, buildId));
}

/** Owner edits; a published build stays live and is marked edited since review. */
export async function updateBuild(actor: Actor | null, buildId: number, input: UpdateBuildInput): Promise<BuildDto> {
  const build = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const b = await loadBuildForEdit(actor, buildId, transaction);
    if (input.coverPhotoId != null) {
      const photo = await Photo.findOne({ where: { id: input.coverPhotoId, buildId }, transaction });
      if (!photo)
        throw new ValidationError("The cover must be one of this build's photos.", [
          { path: 'coverPhotoId', message: 'Not a photo of this build.' },
        ]);
    }
    await b.update(input, { transaction });
    await markEdited(b, transaction);
    return b;
  });
  return presentBuildDetail(actor, build);
}

/** Drafts can be deleted by their owner; anything that was ever submitted stays (409). Photo files no one else uses go too. */
export async function deleteBuild(actor: Actor | null, buildId: number, store: PhotoStore): Promise<void> {
  const photos = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const b = await loadBuildForEdit(actor, buildId, transaction, { anyState: true });
    if (b.status !== 'draft') throw new ConflictError('Only drafts can be deleted.', 'invalid_state');
    const rows = await Photo.findAll({ where: { buildId }, attributes: ['contentHash', 'displayFile', 'thumbFile'], transaction });
    await b.destroy({ transaction });
    return rows;
  });
  await pruneAfterRemoval(store, photos);
}

/** Hand a draft or returned build to the review desk. */
export async function submitBuild(actor: Actor | null, buildId: number): Promise<BuildDto> {
  const build = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const b = await loadBuildForEdit(actor, buildId, transaction, { anyState: true });
    if (b.status !== 'draft' && b.status !== 'returned') {
      throw new ConflictError(`A ${b.status} build cannot be submitted; only drafts and returned builds can.`, 'invalid_state');
    }
    await b.update({ status: 'submitted', submittedAt: new Date() }, { transaction });
    return b;
  });
  return presentBuildDetail(actor, build);
}

/** The maker takes a submitted build back to draft (before a moderator has decided on it). */
export async function withdrawBuild(actor: Actor | null, buildId: number): Promise<BuildDto> {
  const build = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const b = await loadBuildForEdit(actor, buildId, transaction, { anyState: true });
    if (b.status !== 'submitted')
      throw new ConflictError(`Only a build pending review can be withdrawn; this one is ${b.status}.`, 'invalid_state');
    await b.update({ status: 'draft', submittedAt: null }, { transaction });
    await recomputeBuildParts(b.id, transaction);
    return b;
  });
  return presentBuildDetail(actor, build);
}
