import { Router } from 'express';
import { z } from 'zod';
import { listingIdParams } from '@shared/schemas/listing.ts';
import {
  listingPhotoParams,
  partPhotoParams,
  reorderAttachedPhotosInput,
  updateAttachedPhotoInput,
} from '@shared/schemas/attached-photo.ts';
import { partIdParams } from '@shared/schemas/part.ts';
import { validate } from '../middleware/validate.ts';
import { requireUser } from '../middleware/auth.ts';
import { actorOf } from '../middleware/actor.ts';
import { attachPhotosFields, receivePhotos, uploadedBuffers } from '../middleware/receive-photos.ts';
import {
  assertCanEditPhotos,
  attachPhotos,
  removeAttachedPhoto,
  reorderAttachedPhotos,
  updateAttachedPhoto,
  type PhotoSubject,
} from '../services/attached-photos.service.ts';

const ROUTES = {
  part: {
    base: '/api/parts/:partId/photos',
    idParams: partIdParams,
    photoParams: partPhotoParams,
    id: (p: Record<string, number>) => p.partId!,
  },
  listing: {
    base: '/api/listings/:listingId/photos',
    idParams: listingIdParams,
    photoParams: listingPhotoParams,
    id: (p: Record<string, number>) => p.listingId!,
  },
} satisfies Record<PhotoSubject, { base: string; idParams: z.ZodType; photoParams: z.ZodType; id: (p: Record<string, number>) => number }>;

/** `POST …/photos` (multipart), `PUT …/photos/order`, `PATCH` and `DELETE …/photos/:photoId` for parts or listings. */
export function photoRoutesFor(subject: PhotoSubject, uploadsDir: string): Router {
  const r = Router();
  const route = ROUTES[subject];
  r.post(
    route.base,
    requireUser,
    validate(route.idParams, 'params'),
    async (req, res, next) => {
      await assertCanEditPhotos(actorOf(req), subject, route.id(res.locals.params));
      next();
    },
    receivePhotos(),
    validate(attachPhotosFields),
    async (req, res) => {
      const photos = await attachPhotos(
        actorOf(req),
        subject,
        route.id(res.locals.params),
        { alt: res.locals.body.alt, files: uploadedBuffers(req) },
        uploadsDir,
      );
      res.status(201).json({ photos });
    },
  );
  r.put(`${route.base}/order`, requireUser, validate(route.idParams, 'params'), validate(reorderAttachedPhotosInput), async (req, res) => {
    res.json({ photos: await reorderAttachedPhotos(actorOf(req), subject, route.id(res.locals.params), res.locals.body.photoIds) });
  });
  r.patch(
    `${route.base}/:photoId`,
    requireUser,
    validate(route.photoParams, 'params'),
    validate(updateAttachedPhotoInput),
    async (req, res) => {
      res.json(await updateAttachedPhoto(actorOf(req), subject, route.id(res.locals.params), res.locals.params.photoId, res.locals.body));
    },
  );
  r.delete(`${route.base}/:photoId`, requireUser, validate(route.photoParams, 'params'), async (req, res) => {
    await removeAttachedPhoto(actorOf(req), subject, route.id(res.locals.params), res.locals.params.photoId, uploadsDir);
    res.status(204).end();
  });
  return r;
}
