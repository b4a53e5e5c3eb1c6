import type { PhotoDto } from '@shared/schemas/build.ts';
import type { AttachedPhotoDto } from '@shared/schemas/attached-photo.ts';
import type { Photo } from '../models/photo.model.ts';
import type { AttachedPhoto } from '../models/attached-photo.ts';

/** Where app.ts serves the uploads dir. */
const UPLOADS_URL = '/uploads';

/** What a page may know about a stored photo: its two URLs and layout fields, never the owner, hash or disk names as such. */
export function presentAttachedPhoto(p: AttachedPhoto | Photo): AttachedPhotoDto {
  return {
    id: p.id,
    url: `${UPLOADS_URL}/${p.displayFile}`,
    thumbUrl: `${UPLOADS_URL}/${p.thumbFile}`,
    width: p.width,
    height: p.height,
    alt: p.alt,
    position: p.position,
  };
}

/** A build photo: the same, plus the log entry it belongs to. */
export function presentPhoto(p: Photo): PhotoDto {
  return { ...presentAttachedPhoto(p), entryId: p.entryId ?? null };
}
