// Photos attached to registry parts and exchange listings: who may change them, upload, alt text, order and removal.
// Part photos are kept by the part's proposer and by moderators; listing photos by the listing's owner.
import type { Transaction, WhereOptions } from 'sequelize';
import type { PhotoStore } from '../storage/photo-store.ts';
import { withWriteTransaction } from '../db/write-transaction.ts';
import { can, type Actor } from '@shared/policies.ts';
import type { AttachedPhotoDto, UpdateAttachedPhotoInput } from '@shared/schemas/attached-photo.ts';
import { Part } from '../models/part.model.ts';
import { PartPhoto } from '../models/part-photo.model.ts';
import { ListingPhoto } from '../models/listing-photo.model.ts';
import type { AttachedPhoto } from '../models/attached-photo.ts';
import { authorize } from '../policies/authorize.ts';
import { ConflictError, NotFoundError, ValidationError } from '../errors.ts';
import { presentAttachedPhoto } from '../presenters/photo.presenter.ts';
import { altsFor, processAll, pruneAfterRemoval, storeThenRecord, storedColumns } from './photo-files.ts';
import { loadListingForView } from './listing-access.ts';

/** Most photos one part or one listing carries (common practice for listings, no source). */
export const MAX_ATTACHED_PHOTOS = 12;

export type PhotoSubject = 'part' | 'listing';

/** The table and key of each subject's photos (the two models have the same columns; see models/attached-photo.ts). */
const SHELF = {
  part: { model: PartPhoto as unknown as typeof ListingPhoto, key: 'partId' },
  listing: { model: ListingPhoto, key: 'listingId' },
} as const;

const order: Array<[string, 'ASC']> = [
  ['position', 'ASC'],
  ['id', 'ASC'],
];
const whereOwner = (subject: PhotoSubject, ids: number | number[]) => ({ [SHELF[subject].key]: ids }) as WhereOptions;
const ownerOf = (subject: PhotoSubject, photo: AttachedPhoto) => (photo as unknown as Record<string, number>)[SHELF[subject].key]!;

/** May this actor change the photos of this part? The proposer and moderators; never a merged part. */
export function canEditPartPhotos(actor: Actor | null, part: Pick<Part, 'proposedById' | 'mergedIntoId'>): boolean {
  return part.mergedIntoId === null && can(actor, 'part.photos', { ownerId: part.proposedById });
}

/** Load the subject and check the actor may change its photos (also before the multipart body is read). */
export async function assertCanEditPhotos(
  actor: Actor | null,
  subject: PhotoSubject,
  id: number,
  transaction?: Transaction,
): Promise<void> {
  if (subject === 'listing') {
    const listing = await loadListingForView(actor, id, transaction);
    authorize(actor, 'listing.edit', { ownerId: listing.ownerId });
    return;
  }
  const part = await Part.findByPk(id, transaction ? { transaction, lock: transaction.LOCK.UPDATE } : {});
  if (!part || (part.status !== 'accepted' && !can(actor, 'part.view-unlisted', { ownerId: part.proposedById })))
    throw new NotFoundError('No such part.');
  authorize(actor, 'part.photos', { ownerId: part.proposedById });
  if (part.mergedIntoId !== null)
    throw new ConflictError(`This part was merged into part ${part.mergedIntoId}; add photos there.`, 'already_merged');
}

/** The photos of several parts or listings, in display order, by owner id. */
export async function photosBySubject(
  subject: PhotoSubject,
  ids: number[],
  transaction?: Transaction,
): Promise<Map<number, AttachedPhotoDto[]>> {
  const map = new Map<number, AttachedPhotoDto[]>(ids.map((id) => [id, []]));
  if (ids.length === 0) return map;
  const rows = await SHELF[subject].model.findAll({ where: whereOwner(subject, ids), order, transaction });
  for (const row of rows) map.get(ownerOf(subject, row))?.push(presentAttachedPhoto(row));
  return map;
}

/**
 * Add photos to a part or listing. Every file is checked and converted before anything is
 * written; files land first, then the rows in one transaction (which re-checks permission and the
 * per-subject limit under a row lock); on failure the files this request created are removed.
 */
export async function attachPhotos(
  actor: Actor | null,
  subject: PhotoSubject,
  id: number,
  input: { files: Buffer[]; alt: string[] },
  store: PhotoStore,
): Promise<AttachedPhotoDto[]> {
  const alts = altsFor(input.alt, input.files.length);
  const processed = await processAll(input.files);
  const { model } = SHELF[subject];
  return storeThenRecord(store, processed, () =>
    withWriteTransaction(model.sequelize!, async (transaction) => {
      await assertCanEditPhotos(actor, subject, id, transaction);
      const existing = await model.count({ where: whereOwner(subject, id), transaction });
      if (existing + processed.length > MAX_ATTACHED_PHOTOS) {
        throw new ConflictError(`A ${subject} has at most ${MAX_ATTACHED_PHOTOS} photos (${existing} now).`, 'too_many_photos');
      }
      const last = (await model.max('position', { where: whereOwner(subject, id), transaction })) as number | null;
      const rows = await model.bulkCreate(
        processed.map(
          (p, i) => ({ ...storedColumns(p), [SHELF[subject].key]: id, alt: alts[i]!, position: (last ?? -1) + 1 + i }) as never,
        ),
        { transaction },
      );
      return rows.map(presentAttachedPhoto);
    }),
  );
}

async function loadAttachedPhoto(subject: PhotoSubject, id: number, photoId: number, transaction: Transaction): Promise<AttachedPhoto> {
  const row = await SHELF[subject].model.findOne({ where: { id: photoId, ...whereOwner(subject, id) } as WhereOptions, transaction });
  if (!row) throw new NotFoundError(`No such photo of this ${subject}.`);
  return row;
}

/** Change one photo's alt text. */
export async function updateAttachedPhoto(
  actor: Actor | null,
  subject: PhotoSubject,
  id: number,
  photoId: number,
  input: UpdateAttachedPhotoInput,
): Promise<AttachedPhotoDto> {
  return withWriteTransaction(SHELF[subject].model.sequelize!, async (transaction) => {
    await assertCanEditPhotos(actor, subject, id, transaction);
    const row = await loadAttachedPhoto(subject, id, photoId, transaction);
    await row.update({ alt: input.alt }, { transaction });
    return presentAttachedPhoto(row);
  });
}

/** Put the photos of a part or listing in the given order; the list must name each of them exactly once. */
export async function reorderAttachedPhotos(
  actor: Actor | null,
  subject: PhotoSubject,
  id: number,
  photoIds: number[],
): Promise<AttachedPhotoDto[]> {
  const { model } = SHELF[subject];
  return withWriteTransaction(model.sequelize!, async (transaction) => {
    await assertCanEditPhotos(actor, subject, id, transaction);
    const rows = await model.findAll({ where: whereOwner(subject, id), transaction });
    const byId = new Map(rows.map((r) => [r.id, r]));
    if (new Set(photoIds).size !== photoIds.length || photoIds.length !== rows.length || !photoIds.every((pid) => byId.has(pid))) {
      const message = `Send each of this ${subject}'s ${rows.length} photo ids exactly once.`;
      throw new ValidationError(`photoIds: ${message}`, [{ path: 'photoIds', message, code: 'photo_ids_mismatch' }]);
    }
    for (const [position, pid] of photoIds.entries()) {
      const row = byId.get(pid)!;
      if (row.position !== position) await row.update({ position }, { transaction });
    }
    return (await photosBySubject(subject, [id], transaction)).get(id) ?? [];
  });
}

/** Remove one photo of a part or listing; its files go too once no other photo shows the same content. */
export async function removeAttachedPhoto(
  actor: Actor | null,
  subject: PhotoSubject,
  id: number,
  photoId: number,
  store: PhotoStore,
): Promise<void> {
  const { model } = SHELF[subject];
  const photo = await withWriteTransaction(model.sequelize!, async (transaction) => {
    await assertCanEditPhotos(actor, subject, id, transaction);
    const row = await loadAttachedPhoto(subject, id, photoId, transaction);
    await row.destroy({ transaction });
    return row;
  });
  await pruneAfterRemoval(store, [photo]);
}
