import { useState } from 'react';
import type { AttachedPhotoDto } from '@shared/schemas/attached-photo.ts';
import { ConfirmButton } from '@/components/ui/confirm-button.tsx';
import { requestErrorMessage } from './photo-errors.ts';

/** One stored photo in the manager: small thumbnail, its alt text, and Delete behind a second click. */
export function ManagedPhoto({ photo, number, onDelete }: { photo: AttachedPhotoDto; number: number; onDelete: (photoId: number) => Promise<unknown> }) {
  const [deleting, setDeleting] = useState(false);
  const [error, setError] = useState<string>();
  const handleDelete = () => {
    setDeleting(true);
    setError(undefined);
    onDelete(photo.id).catch((err: unknown) => {
      setError(requestErrorMessage(err));
      setDeleting(false);
    });
  };
  return (
    <li className="grid grid-cols-[4rem_1fr] gap-3 rounded-md border border-rule bg-white p-2 sm:grid-cols-[5rem_1fr]">
      <img src={photo.thumbUrl} alt={photo.alt} loading="lazy" className="aspect-square w-full rounded bg-paper-deep object-cover" />
      <div className="flex min-w-0 flex-col gap-2">
        <p className="text-sm"><span className="num mr-1 text-ink-soft">{number}.</span>{photo.alt}</p>
        <div className="mt-auto" aria-live="polite">
          {deleting ? <p className="text-sm text-ink-soft">Deleting…</p> : (
            <ConfirmButton label="Delete" ariaLabel={`Delete photo ${number}: ${photo.alt}`} question="Delete this photo?" confirmLabel="Yes, delete" onConfirm={handleDelete} />
          )}
        </div>
        {error && <p role="alert" className="text-sm text-danger">{error}</p>}
      </div>
    </li>
  );
}
