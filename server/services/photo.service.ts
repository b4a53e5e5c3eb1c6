import type { Transaction } from 'sequelize';
import type { PhotoStore } from '../storage/photo-store.ts';
import { withWriteTransaction } from '../db/write-transaction.ts';
import type { Actor } from '@shared/policies.ts';
import type { PhotoDto, UpdatePhotoInput } from '@shared/schemas/build.ts';
import { Build } from '../models/build.model.ts';
import { LogEntry } from '../models/log-entry.model.ts';
import { Photo } from '../models/photo.model.ts';
import { NotFoundError, ValidationError } from '../errors.ts';
import { presentPhoto } from '../presenters/photo.presenter.ts';
import { loadBuildForEdit, markEdited } from './build-access.ts';
import { altsFor, processAll, pruneAfterRemoval, storeThenRecord, storedColumns } from './photo-files.ts';

export interface UploadPhotosInput {
  files: Buffer[];
  /** One alt text per file, in order, or a single one for all. */
  alt: string[];
  entryId?: number;
}

const order: Array<[string, 'ASC']> = [
  ['position', 'ASC'],
  ['id', 'ASC'],
];

async function loadPhoto(buildId: number, photoId: number, transaction: Transaction): Promise<Photo> {
  const photo = await Photo.findOne({ where: { id: photoId, buildId }, transaction });
  if (!photo) throw new NotFoundError('No such photo in this build.');
  return photo;
}

async function assertEntryOfBuild(buildId: number, entryId: number, transaction: Transaction): Promise<void> {
  const entry = await LogEntry.findOne({ where: { id: entryId, buildId }, attributes: ['id'], transaction });
  if (!entry)
    throw new ValidationError('entryId: not a log entry of this build.', [
      { path: 'entryId', message: 'Not a log entry of this build.', code: 'invalid_entry' },
    ]);
}

/** The build's photos in display order, for the build page and the builds service. */
export async function listPhotosForBuild(buildId: number, transaction?: Transaction): Promise<PhotoDto[]> {
  const photos = await Photo.findAll({ where: { buildId }, order, transaction });
  return photos.map(presentPhoto);
}

/** Checked before the multipart body is read, so visitors and strangers cannot make us buffer 200 MB. */
export async function assertCanAddPhotos(actor: Actor | null, buildId: number): Promise<void> {
  await loadBuildForEdit(actor, buildId);
}

/**
 * Add photos to one's own build. Every file is checked and converted before anything is written;
 * files land first, then all rows in one transaction; on any failure the files this request
 * created are removed again unless another row already uses the same content.
 */
export async function uploadPhotos(actor: Actor | null, buildId: number, input: UploadPhotosInput, store: PhotoStore): Promise<PhotoDto[]> {
  const alts = altsFor(input.alt, input.files.length);
  const processed = await processAll(input.files);
  return storeThenRecord(store, processed, async () => {
    const rows = await withWriteTransaction(Build.sequelize!, async (transaction) => {
      const build = await loadBuildForEdit(actor, buildId, transaction);
      if (input.entryId !== undefined) await assertEntryOfBuild(buildId, input.entryId, transaction);
      const last = await Photo.max<number | null, Photo>('position', { where: { buildId }, transaction });
      const first = (last ?? -1) + 1;
      const photos: Photo[] = [];
      for (const [i, p] of processed.entries()) {
        photos.push(
          await Photo.create(
            { ...storedColumns(p), buildId, entryId: input.entryId ?? null, ownerId: build.ownerId, alt: alts[i]!, position: first + i },
            { transaction },
          ),
        );
      }
      await markEdited(build, transaction);
      return photos;
    });
    return rows.map(presentPhoto);
  });
}

/** Change a photo's alt text, log entry or position. */
export async function updatePhoto(actor: Actor | null, buildId: number, photoId: number, input: UpdatePhotoInput): Promise<PhotoDto> {
  const photo = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const build = await loadBuildForEdit(actor, buildId, transaction);
    const p = await loadPhoto(buildId, photoId, transaction);
    if (input.entryId != null) await assertEntryOfBuild(buildId, input.entryId, transaction);
    await p.update(input, { transaction });
    await markEdited(build, transaction);
    return p;
  });
  return presentPhoto(photo);
}

/** Remove a photo; its files go too once no other photo shows the same content, and it stops being the cover. */
export async function deletePhoto(actor: Actor | null, buildId: number, photoId: number, store: PhotoStore): Promise<void> {
  const photo = await withWriteTransaction(Build.sequelize!, async (transaction) => {
    const build = await loadBuildForEdit(actor, buildId, transaction);
    const p = await loadPhoto(buildId, photoId, transaction);
    await p.destroy({ transaction });
    if (build.coverPhotoId === p.id) await build.update({ coverPhotoId: null }, { transaction });
    await markEdited(build, transaction);
    return p;
  });
  await pruneAfterRemoval(store, [photo]);
}

/** Put the build's photos in the given order; the list must name each of its photos exactly once. */
export async function reorderPhotos(actor: Actor | null, buildId: number, photoIds: number[]): Promise<PhotoDto[]> {
  return withWriteTransaction(Build.sequelize!, async (transaction) => {
    const build = await loadBuildForEdit(actor, buildId, transaction);
    const photos = await Photo.findAll({ where: { buildId }, transaction });
    const byId = new Map(photos.map((p) => [p.id, p]));
    if (new Set(photoIds).size !== photoIds.length || photoIds.length !== photos.length || !photoIds.every((id) => byId.has(id))) {
      const message = `Send each of this build's ${photos.length} photo ids exactly once.`;
      throw new ValidationError(`photoIds: ${message}`, [{ path: 'photoIds', message, code: 'photo_ids_mismatch' }]);
    }
    for (const [position, id] of photoIds.entries()) {
      const photo = byId.get(id)!;
      if (photo.position !== position) await photo.update({ position }, { transaction });
    }
    await markEdited(build, transaction);
    return listPhotosForBuild(buildId, transaction);
  });
}

/** Make one of the build's photos its cover (the card and page header). */
export async function setCoverPhoto(actor: Actor | null, buildId: number, photoId: number): Promise<PhotoDto> {
  return withWriteTransaction(Build.sequelize!, async (transaction) => {
    const build = await loadBuildForEdit(actor, buildId, transaction);
    const photo = await loadPhoto(buildId, photoId, transaction);
    await build.update({ coverPhotoId: photo.id }, { transaction });
    await markEdited(build, transaction);
    return presentPhoto(photo);
  });
}
