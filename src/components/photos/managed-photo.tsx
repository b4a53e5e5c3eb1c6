import { useState } from 'react';
import type { AttachedPhotoDto } from '@shared/schemas/attached-photo.ts';
import { MoveButtons } from '@/components/photos/move-buttons.tsx';
import { ConfirmButton } from '@/components/ui/confirm-button.tsx';
import { PhotoAltEditor } from './photo-alt-editor.tsx';
import { requestErrorMessage } from './photo-errors.ts';

/** One stored photo in the manager: small thumbnail, its alt text (editable), Earlier/Later, and Delete behind a second click. */
export function ManagedPhoto({
  photo,
  index,
  count,
  onMove,
  onSaveAlt,
  onDelete,
}: {
  photo: AttachedPhotoDto;
  index: number;
  count: number;
  onMove: (dir: -1 | 1) => void;
  onSaveAlt: (alt: string) => Promise<unknown>;
  onDelete: () => Promise<unknown>;
}) {
  const [busy, setBusy] = useState<'saving' | 'deleting' | null>(null);
  const [error, setError] = useState<string>();
  const n = index + 1;
  const run = (what: 'saving' | 'deleting', action: () => Promise<unknown>) => {
    setBusy(what);
    setError(undefined);
    action().then(
      () => setBusy(null),
      (err: unknown) => {
        setError(requestErrorMessage(err));
        setBusy(null);
      },
    );
  };
  return (
    <li className="grid grid-cols-[4rem_1fr] gap-3 rounded-md border border-rule bg-white p-2 sm:grid-cols-[5rem_1fr]">
      <div className="relative self-start">
        <img src={photo.thumbUrl} alt={photo.alt} loading="lazy" className="aspect-square w-full rounded bg-paper-deep object-cover" />
        <span className="num absolute left-1 top-1 rounded bg-ink/80 px-1 text-xs text-paper">{n}</span>
      </div>
      <div className="flex min-w-0 flex-col gap-2">
        <PhotoAltEditor
          key={photo.alt}
          photoId={photo.id}
          alt={photo.alt}
          pending={busy === 'saving'}
          onSave={(alt) => run('saving', () => onSaveAlt(alt))}
        />
        <div className="flex flex-wrap items-center gap-2" aria-live="polite">
          {count > 1 && <MoveButtons photoId={photo.id} n={n} count={count} onMove={onMove} />}
          {busy === 'deleting' ? (
            <p className="text-sm text-ink-soft">Deleting…</p>
          ) : (
            <ConfirmButton
              label="Delete"
              ariaLabel={`Delete photo ${n}: ${photo.alt}`}
              question="Delete this photo?"
              confirmLabel="Yes, delete"
              onConfirm={() => run('deleting', onDelete)}
            />
          )}
        </div>
        {error && (
          <p role="alert" className="text-sm text-danger">
            {error}
          </p>
        )}
      </div>
    </li>
  );
}
