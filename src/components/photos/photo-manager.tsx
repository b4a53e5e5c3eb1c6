import type { AttachedPhotoDto } from '@shared/schemas/attached-photo.ts';
import type { useAttachedPhotoMutations } from '@/lib/attached-photo-mutations.ts';
import { ManagedPhoto } from './managed-photo.tsx';
import { PhotoUploader } from './photo-uploader.tsx';
import { requestErrorMessage } from './photo-errors.ts';
import { usePhotoOrder } from './use-photo-order.ts';
import type { SendPhoto } from './use-photo-queue.ts';

const NOTHING_EXTRA = {};

/**
 * Keep the photos of one thing (a registry part, an exchange listing): the stored ones with their
 * alt text, order and Delete, then the uploader. `upload` and `edits` are the place's mutations;
 * they refresh the page's data.
 */
export function PhotoManager({
  photos,
  upload,
  edits,
  label,
  empty,
}: {
  photos: AttachedPhotoDto[];
  upload: SendPhoto<object>;
  edits: ReturnType<typeof useAttachedPhotoMutations>;
  /** Names the list of stored photos, e.g. "Photos you can change". */
  label: string;
  /** The line shown while there are none yet (nothing when the page says it elsewhere). */
  empty?: string;
}) {
  const { ordered, move } = usePhotoOrder(photos, edits.reorder.mutate);
  return (
    <div className="space-y-4">
      {ordered.length === 0 ? (
        empty && <p className="text-sm text-ink-soft">{empty}</p>
      ) : (
        <ul className="space-y-2" aria-label={label}>
          {ordered.map((p, i) => (
            <ManagedPhoto
              key={p.id}
              photo={p}
              index={i}
              count={ordered.length}
              onMove={(dir) => move(i, dir)}
              onSaveAlt={(alt) => edits.update.mutateAsync({ photoId: p.id, alt })}
              onDelete={() => edits.remove.mutateAsync(p.id)}
            />
          ))}
        </ul>
      )}
      {edits.reorder.error && (
        <p role="alert" className="text-sm text-danger">
          The new order was not saved: {requestErrorMessage(edits.reorder.error)}
        </p>
      )}
      <p className="text-sm text-ink-soft">
        Each photo needs a short description (alt text): say what it shows, for people who cannot see it.
      </p>
      <PhotoUploader send={upload} extra={NOTHING_EXTRA} />
    </div>
  );
}
