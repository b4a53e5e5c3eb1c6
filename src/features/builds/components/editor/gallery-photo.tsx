import type { LogEntryDto, PhotoDto } from '@shared/schemas/build.ts';
import { Button } from '@/components/ui/button.tsx';
import { MoveButtons } from '@/components/photos/move-buttons.tsx';
import { useDeletePhoto, useSetCoverPhoto, useUpdatePhoto } from '../../api/photos.ts';
import { ConfirmButton } from '@/components/ui/confirm-button.tsx';
import { inputClass } from '@/components/ui/form-bits.tsx';
import { PhotoAltEditor } from '@/components/photos/photo-alt-editor.tsx';
import { errorMessage } from '@/components/ui/form-bits.tsx';

/** One stored photo with its upkeep: cover, order, alt text, log entry, delete. */
export function GalleryPhoto({
  buildId,
  photo,
  index,
  count,
  isCover,
  entries,
  onMove,
}: {
  buildId: number;
  photo: PhotoDto;
  index: number;
  count: number;
  isCover: boolean;
  entries: LogEntryDto[];
  onMove: (dir: -1 | 1) => void;
}) {
  const update = useUpdatePhoto(buildId);
  const cover = useSetCoverPhoto(buildId);
  const remove = useDeletePhoto(buildId);
  const error = update.error ?? cover.error ?? remove.error;
  const n = index + 1;
  return (
    <li className="grid grid-cols-[5.5rem_1fr] overflow-hidden rounded-md border border-rule bg-white sm:flex sm:flex-col">
      <div className="relative self-start sm:self-auto">
        <img
          src={photo.thumbUrl}
          alt={photo.alt}
          className="aspect-square w-full bg-paper-deep object-cover sm:aspect-[4/3]"
          loading="lazy"
        />
        <span className="num absolute left-2 top-2 rounded bg-ink/80 px-1.5 text-xs text-paper">{n}</span>
        {isCover && (
          <span className="absolute bottom-1 left-1 rounded bg-copper px-1.5 py-0.5 text-xs font-medium text-white sm:bottom-auto sm:left-auto sm:right-2 sm:top-2">
            Cover
          </span>
        )}
      </div>
      <div className="flex min-w-0 flex-1 flex-col gap-2 p-2 sm:p-3">
        <PhotoAltEditor
          key={photo.alt}
          photoId={photo.id}
          alt={photo.alt}
          pending={update.isPending}
          onSave={(alt) => update.mutate({ photoId: photo.id, alt })}
        />
        {entries.length > 0 && (
          <div>
            <label htmlFor={`photo-${photo.id}-entry`} className="mb-1 block text-xs font-medium">
              Log entry
            </label>
            <select
              id={`photo-${photo.id}-entry`}
              className={`${inputClass} text-sm`}
              value={photo.entryId ?? ''}
              disabled={update.isPending}
              onChange={(e) => update.mutate({ photoId: photo.id, entryId: e.target.value ? Number(e.target.value) : null })}
            >
              <option value="">None (build gallery)</option>
              {entries.map((e) => (
                <option key={e.id} value={e.id}>
                  {e.entryDate} · {e.title}
                </option>
              ))}
            </select>
          </div>
        )}
        <div className="mt-auto flex flex-wrap gap-2 pt-1">
          <MoveButtons photoId={photo.id} n={n} count={count} onMove={onMove} />
          {!isCover && (
            <Button
              variant="secondary"
              disabled={cover.isPending}
              onClick={() => cover.mutate(photo.id)}
              aria-label={`Make cover: photo ${n}`}
            >
              Make cover
            </Button>
          )}
          <ConfirmButton
            label="Delete"
            ariaLabel={`Delete photo ${n}`}
            question="Delete this photo?"
            confirmLabel="Yes, delete"
            disabled={remove.isPending}
            onConfirm={() => remove.mutate(photo.id)}
          />
        </div>
        {error && (
          <p role="alert" className="text-sm text-danger">
            {errorMessage(error)}
          </p>
        )}
      </div>
    </li>
  );
}
