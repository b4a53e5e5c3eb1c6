import { Router } from 'express';
import { z } from 'zod';
import { buildIdParams, photoParams, reorderPhotosInput, updatePhotoInput } from '@shared/schemas/build.ts';
import type { PhotoStore } from '../storage/photo-store.ts';
import { requireUser } from '../middleware/auth.ts';
import { altTexts, receivePhotos, uploadedBuffers } from '../middleware/receive-photos.ts';
import { assertCanAddPhotos, deletePhoto, reorderPhotos, setCoverPhoto, updatePhoto, uploadPhotos } from '../services/photo.service.ts';
import { guard, route } from './route.ts';

/** The text fields of a build photo upload: alt texts and an optional log entry. */
const uploadPhotosFields = z.strictObject({
  alt: altTexts,
  entryId: z.preprocess((v) => (v === '' ? undefined : v), z.coerce.number().int().positive().optional()),
});

/** Photo uploads and upkeep for builds; only the build's owner may change them. */
export function photoRoutes(store: PhotoStore): Router {
  const r = Router();
  r.post(
    '/api/builds/:buildId/photos',
    requireUser,
    guard({ params: buildIdParams }, ({ actor, params }) => assertCanAddPhotos(actor, params.buildId)),
    receivePhotos(),
    route({ params: buildIdParams, body: uploadPhotosFields }, async ({ actor, params, body, req, res }) => {
      const photos = await uploadPhotos(actor, params.buildId, { ...body, files: uploadedBuffers(req) }, store);
      res.status(201).json({ photos });
    }),
  );
  r.put(
    '/api/builds/:buildId/photos/order',
    requireUser,
    route({ params: buildIdParams, body: reorderPhotosInput }, async ({ actor, params, body, res }) => {
      res.json({ photos: await reorderPhotos(actor, params.buildId, body.photoIds) });
    }),
  );
  r.patch(
    '/api/builds/:buildId/photos/:photoId',
    requireUser,
    route({ params: photoParams, body: updatePhotoInput }, async ({ actor, params, body, res }) => {
      res.json(await updatePhoto(actor, params.buildId, params.photoId, body));
    }),
  );
  r.delete(
    '/api/builds/:buildId/photos/:photoId',
    requireUser,
    route({ params: photoParams }, async ({ actor, params, res }) => {
      await deletePhoto(actor, params.buildId, params.photoId, store);
      res.status(204).end();
    }),
  );
  r.post(
    '/api/builds/:buildId/photos/:photoId/cover',
    requireUser,
    route({ params: photoParams }, async ({ actor, params, res }) => {
      res.json({ cover: await setCoverPhoto(actor, params.buildId, params.photoId) });
    }),
  );
  return r;
}
