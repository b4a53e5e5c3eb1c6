import { z } from 'zod';
import { altText } from './alt-text.ts';

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
export const listingPhotoParams = z.strictObject({
  listingId: z.coerce.number().int().positive(),
  photoId: z.coerce.number().int().positive(),
});

/** `PATCH …/photos/:photoId`: a better description for one photo. */
export const updateAttachedPhotoInput = z.strictObject({ alt: altText });
export type UpdateAttachedPhotoInput = z.infer<typeof updateAttachedPhotoInput>;

/** `PUT …/photos/order`: every photo id of the part or listing, once each, in the new order. */
export const reorderAttachedPhotosInput = z.strictObject({ photoIds: z.array(z.number().int().positive()).min(1).max(100) });
