import { Router, type RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { buildIdParams, photoParams, reorderPhotosInput, updatePhotoInput } from '@shared/schemas/build.ts';
import type { Config } from '../config.ts';
import { AppError, ValidationError } from '../errors.ts';
import { validate } from '../middleware/validate.ts';
import { requireUser } from '../middleware/auth.ts';
import { actorOf } from '../middleware/actor.ts';
import { MAX_FILE_BYTES, MAX_FILES_PER_UPLOAD } from '../services/photo-storage.ts';
import { assertCanAddPhotos, deletePhoto, reorderPhotos, setCoverPhoto, updatePhoto, uploadPhotos } from '../services/photo.service.ts';

const FIELD = 'photos';

const altText = z.string().trim().min(1, 'Describe the photo for people who cannot see it.').max(300);
/** The text fields of the multipart upload: `alt` once per file or once for all, and an optional log entry. */
const uploadPhotosFields = z.strictObject({
  alt: z.preprocess((v) => (typeof v === 'string' ? [v] : v), z.array(altText, { error: 'Alt text is required.' }).min(1).max(MAX_FILES_PER_UPLOAD)),
  entryId: z.preprocess((v) => (v === '' ? undefined : v), z.coerce.number().int().positive().optional()),
});

const multerRefusals: Record<string, (field?: string) => AppError> = {
  LIMIT_FILE_SIZE: () => new AppError(413, 'file_too_large', `Each photo may be at most ${MAX_FILE_BYTES / 1024 / 1024} MB.`),
  LIMIT_FILE_COUNT: () => new AppError(400, 'too_many_files', `Send at most ${MAX_FILES_PER_UPLOAD} photos at once.`),
  LIMIT_UNEXPECTED_FILE: (field) =>
    field === FIELD
      ? new AppError(400, 'too_many_files', `Send at most ${MAX_FILES_PER_UPLOAD} photos at once.`)
      : new ValidationError(`Files go in the "${FIELD}" field.`, [{ path: field ?? '', message: 'Unexpected file field.' }]),
};

/** Multipart parsing into memory (no temp files); multer's refusals become our error shape, and at least one file is required. */
function receivePhotos(): RequestHandler {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: MAX_FILE_BYTES, files: MAX_FILES_PER_UPLOAD, fields: 2 * MAX_FILES_PER_UPLOAD, fieldSize: 4096, parts: 3 * MAX_FILES_PER_UPLOAD },
  }).array(FIELD, MAX_FILES_PER_UPLOAD);
  return (req, res, next) => {
    parse(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) return next(multerRefusals[err.code]?.(err.field) ?? new ValidationError(err.message));
      if (err) return next(new AppError(400, 'malformed_multipart', 'The upload could not be read as multipart form data.'));
      if (!Array.isArray(req.files) || req.files.length === 0) {
        return next(new AppError(400, 'no_files', `Attach 1 to ${MAX_FILES_PER_UPLOAD} photos in the "${FIELD}" field.`));
      }
      next();
    });
  };
}

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
      const files = (req.files as Express.Multer.File[]).map((f) => f.buffer);
      const photos = await uploadPhotos(actorOf(req), res.locals.params.buildId, { ...res.locals.body, files }, config.uploadsDir);
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
