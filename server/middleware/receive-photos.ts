// Multipart photo uploads (build, part and listing photos alike): files in the `photos` field,
// read into memory (no temp files), with multer's refusals turned into our error shape.
import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { z } from 'zod';
import { altText } from '@shared/schemas/alt-text.ts';
import { AppError, ValidationError } from '../errors.ts';
import { MAX_FILE_BYTES, MAX_FILES_PER_UPLOAD } from '../services/photo-storage.ts';

const FIELD = 'photos';

/** The `alt` field: once per file (in order) or once for all. */
export const altTexts = z.preprocess(
  (v) => (typeof v === 'string' ? [v] : v),
  z.array(altText, { error: 'Alt text is required.' }).min(1).max(MAX_FILES_PER_UPLOAD),
);
/** The text fields of a part or listing photo upload. */
export const attachPhotosFields = z.strictObject({ alt: altTexts });

const multerRefusals: Record<string, (field?: string) => AppError> = {
  LIMIT_FILE_SIZE: () => new AppError(413, 'file_too_large', `Each photo may be at most ${MAX_FILE_BYTES / 1024 / 1024} MB.`),
  LIMIT_FILE_COUNT: () => new AppError(400, 'too_many_files', `Send at most ${MAX_FILES_PER_UPLOAD} photos at once.`),
  LIMIT_UNEXPECTED_FILE: (field) =>
    field === FIELD
      ? new AppError(400, 'too_many_files', `Send at most ${MAX_FILES_PER_UPLOAD} photos at once.`)
      : new ValidationError(`Files go in the "${FIELD}" field.`, [{ path: field ?? '', message: 'Unexpected file field.' }]),
};

/** Parse the multipart body; at least one file is required. Mount after the permission check, so strangers cannot make us buffer. */
export function receivePhotos(): RequestHandler {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: {
      fileSize: MAX_FILE_BYTES,
      files: MAX_FILES_PER_UPLOAD,
      fields: 2 * MAX_FILES_PER_UPLOAD,
      fieldSize: 4096,
      parts: 3 * MAX_FILES_PER_UPLOAD,
    },
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

/** The uploaded files' bytes, in order. */
export const uploadedBuffers = (req: Request): Buffer[] => (req.files as Express.Multer.File[]).map((f) => f.buffer);
