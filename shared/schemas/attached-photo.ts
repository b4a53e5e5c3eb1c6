import { z } from 'zod';

/**
 * A photo attached to a part (registry entry) or an exchange listing. Uploaded as multipart form
 * data to `POST /api/parts/:partId/photos` or `POST /api/listings/:listingId/photos` (files in the
 * `photos` field, 1–10 at a time, with `alt` once per file or once for all) and removed with
 * `DELETE …/photos/:photoId`. Stored exactly like build photos: a re-encoded WebP display image
 * and thumbnail, metadata dropped.
 */
export interface AttachedPhotoDto {
  id: number;
  url: string;
  thumbUrl: string;
  width: number;
  height: number;
  alt: string;
  position: number;
}

export const partPhotoParams = z.strictObject({ partId: z.coerce.number().int().positive(), photoId: z.coerce.number().int().positive() });
export const listingPhotoParams = z.strictObject({ listingId: z.coerce.number().int().positive(), photoId: z.coerce.number().int().positive() });
