import { Router } from 'express';
import { z } from 'zod';
import { buildIdParams, photoParams, reorderPhotosInput, updatePhotoInput } from '@shared/schemas/build.ts';
import type { Config } from '../config.ts';
import { validate } from '../middleware/validate.ts';
import { requireUser } from '../middleware/auth.ts';
import { actorOf } from '../middleware/actor.ts';
import { altTexts, receivePhotos, uploadedBuffers } from '../middleware/receive-photos.ts';
import { assertCanAddPhotos, deletePhoto, reorderPhotos, setCoverPhoto, updatePhoto, uploadPhotos } from '../services/photo.service.ts';

/** The text fields of a build photo upload: alt texts and an optional log entry. */
const uploadPhotosFields = z.strictObject({
  alt: altTexts,
  entryId: z.preprocess((v) => (v === '' ? undefined : v), z.coerce.number().int().positive().optional()),
});

/** Photo uploads and upkeep for builds; only the build's owner may change them. */
export function photoRoutes(config: Config): Router {
  const r = Router();
  const build = validate(buildIdParams, 'params');
  const photo = validate(photoParams, 'params');

  r.post(
    '/api/builds/:buildId/photos',
    requireUser,
    build,
    async (req, res, next) => {
      await assertCanAddPhotos(actorOf(req), res.locals.params.buildId);
      next();
    },
    receivePhotos(),
    validate(uploadPhotosFields),
    async (req, res) => {
      const photos = await uploadPhotos(
        actorOf(req),
        res.locals.params.buildId,
        { ...res.locals.body, files: uploadedBuffers(req) },
        config.uploadsDir,
      );
      res.status(201).json({ photos });
    },
  );
  r.put('/api/builds/:buildId/photos/order', requireUser, build, validate(reorderPhotosInput), async (req, res) => {
    res.json({ photos: await reorderPhotos(actorOf(req), res.locals.params.buildId, res.locals.body.photoIds) });
  });
  r.patch('/api/builds/:buildId/photos/:photoId', requireUser, photo, validate(updatePhotoInput), async (req, res) => {
    res.json(await updatePhoto(actorOf(req), res.locals.params.buildId, res.locals.params.photoId, res.locals.body));
  });
  r.delete('/api/builds/:buildId/photos/:photoId', requireUser, photo, async (req, res) => {
    await deletePhoto(actorOf(req), res.locals.params.buildId, res.locals.params.photoId, config.uploadsDir);
    res.status(204).end();
  });
  r.post('/api/builds/:buildId/photos/:photoId/cover', requireUser, photo, async (req, res) => {
    res.json({ cover: await setCoverPhoto(actorOf(req), res.locals.params.buildId, res.locals.params.photoId) });
  });
  return r;
}
