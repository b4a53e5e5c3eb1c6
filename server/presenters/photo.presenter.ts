import type { PhotoDto } from '@shared/schemas/build.ts';
import type { Photo } from '../models/photo.model.ts';

/** Where app.ts serves the uploads dir. */
const UPLOADS_URL = '/uploads';

/** What a page may know about a photo: its two URLs and layout fields, never the owner, hash or disk names as such. */
export function presentPhoto(p: Photo): PhotoDto {
  return {
    id: p.id,
    url: `${UPLOADS_URL}/${p.displayFile}`,
    thumbUrl: `${UPLOADS_URL}/${p.thumbFile}`,
    width: p.width,
    height: p.height,
    alt: p.alt,
    entryId: p.entryId ?? null,
    position: p.position,
  };
}
