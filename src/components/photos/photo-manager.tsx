import type { AttachedPhotoDto } from '@shared/schemas/attached-photo.ts';
import { ManagedPhoto } from './managed-photo.tsx';
import { PhotoUploader } from './photo-uploader.tsx';
import type { SendPhoto } from './use-photo-queue.ts';

const NOTHING_EXTRA = {};

/**
 * Add and remove the photos of one thing (a registry part, an exchange listing): the stored ones with
 * Delete, then the uploader. `upload` and `remove` are the place's mutations; they refresh the page's data.
 */
export function PhotoManager({ photos, upload, remove, label, empty }: {
  photos: AttachedPhotoDto[];
  upload: SendPhoto<object>;
  remove: (photoId: number) => Promise<unknown>;
  /** Names the list of stored photos, e.g. "Photos of this part". */
  label: string;
  /** The line shown while there are none yet (nothing when the page says it elsewhere). */
  empty?: string;
}) {
  return (
    <div className="space-y-4">
      {photos.length === 0 ? (
        empty && <p className="text-sm text-ink-soft">{empty}</p>
      ) : (
        <ul className="space-y-2" aria-label={label}>
          {photos.map((p, i) => <ManagedPhoto key={p.id} photo={p} number={i + 1} onDelete={remove} />)}
        </ul>
      )}
      <p className="text-sm text-ink-soft">Each photo needs a short description (alt text): say what it shows, for people who cannot see it.</p>
      <PhotoUploader send={upload} extra={NOTHING_EXTRA} />
    </div>
  );
}
