// A single image in the `image` field of a multipart body, read into memory, for the workbench's image
// decoding; multer's refusals become our error shape.
import type { Request, RequestHandler } from 'express';
import multer from 'multer';
import { AppError, ValidationError } from '../errors.ts';

const FIELD = 'image';
/** A 1024 × 1024 image of 32-bit floats, uncompressed, with room for its headers. */
export const MAX_IMAGE_BYTES = 8 * 1024 * 1024;

export function receiveImage(): RequestHandler {
  const parse = multer({
    storage: multer.memoryStorage(),
    limits: { fileSize: MAX_IMAGE_BYTES, files: 1, fields: 4, fieldSize: 1024, parts: 5 },
  }).single(FIELD);
  return (req, res, next) => {
    parse(req, res, (err: unknown) => {
      if (err instanceof multer.MulterError) {
        if (err.code === 'LIMIT_FILE_SIZE')
          return next(new AppError(413, 'file_too_large', `The image may be at most ${MAX_IMAGE_BYTES / 1024 / 1024} MB.`));
        return next(new ValidationError(`Send one image in the "${FIELD}" field.`, [{ path: err.field ?? FIELD, message: err.message }]));
      }
      if (err) return next(new AppError(400, 'malformed_multipart', 'The upload could not be read as multipart form data.'));
      if (!req.file) return next(new AppError(400, 'no_files', `Attach a PNG or TIFF image in the "${FIELD}" field.`));
      next();
    });
  };
}

/** The uploaded image's bytes. */
export const uploadedImage = (req: Request): Buffer => req.file!.buffer;
