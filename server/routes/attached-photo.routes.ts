import { Router } from 'express';
import type { PhotoStore } from '../storage/photo-store.ts';
import { z } from 'zod';
import { listingIdParams } from '@shared/schemas/listing.ts';
import {
  listingPhotoParams,
  partPhotoParams,
  reorderAttachedPhotosInput,
  updateAttachedPhotoInput,
} from '@shared/schemas/attached-photo.ts';
import { partIdParams } from '@shared/schemas/part.ts';
import { requireUser } from '../middleware/auth.ts';
import { attachPhotosFields, receivePhotos, uploadedBuffers } from '../middleware/receive-photos.ts';
import {
  assertCanEditPhotos,
  attachPhotos,
  removeAttachedPhoto,
  reorderAttachedPhotos,
  updateAttachedPhoto,
  type PhotoSubject,
} from '../services/attached-photos.service.ts';
import { guard, route } from './route.ts';

// Each subject's params, renamed to one shape so the handlers below serve parts and listings alike.
const SUBJECTS: Record<
  PhotoSubject,
  { base: string; idParams: z.ZodType<{ subjectId: number }>; photoParams: z.ZodType<{ subjectId: number; photoId: number }> }
> = {
  part: {
    base: '/api/parts/:partId/photos',
    idParams: partIdParams.transform((p) => ({ subjectId: p.partId })),
    photoParams: partPhotoParams.transform((p) => ({ subjectId: p.partId, photoId: p.photoId })),
  },
  listing: {
    base: '/api/listings/:listingId/photos',
    idParams: listingIdParams.transform((p) => ({ subjectId: p.listingId })),
    photoParams: listingPhotoParams.transform((p) => ({ subjectId: p.listingId, photoId: p.photoId })),
  },
};

/** `POST …/photos` (multipart), `PUT …/photos/order`, `PATCH` and `DELETE …/photos/:photoId` for parts or listings. */
export function photoRoutesFor(subject: PhotoSubject, store: PhotoStore): Router {
  const r = Router();
  const { base, idParams, photoParams } = SUBJECTS[subject];
  r.post(
    base,
    requireUser,
    guard({ params: idParams }, ({ actor, params }) => assertCanEditPhotos(actor, subject, params.subjectId)),
    receivePhotos(),
    route({ params: idParams, body: attachPhotosFields }, async ({ actor, params, body, req, res }) => {
      const photos = await attachPhotos(actor, subject, params.subjectId, { alt: body.alt, files: uploadedBuffers(req) }, store);
      res.status(201).json({ photos });
    }),
  );
  r.put(
    `${base}/order`,
    requireUser,
    route({ params: idParams, body: reorderAttachedPhotosInput }, async ({ actor, params, body, res }) => {
      res.json({ photos: await reorderAttachedPhotos(actor, subject, params.subjectId, body.photoIds) });
    }),
  );
  r.patch(
    `${base}/:photoId`,
    requireUser,
    route({ params: photoParams, body: updateAttachedPhotoInput }, async ({ actor, params, body, res }) => {
      res.json(await updateAttachedPhoto(actor, subject, params.subjectId, params.photoId, body));
    }),
  );
  r.delete(
    `${base}/:photoId`,
    requireUser,
    route({ params: photoParams }, async ({ actor, params, res }) => {
      await removeAttachedPhoto(actor, subject, params.subjectId, params.photoId, store);
      res.status(204).end();
    }),
  );
  return r;
}
