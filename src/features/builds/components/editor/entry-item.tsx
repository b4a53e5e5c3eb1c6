import { useState } from 'react';
import type { LogEntryDto, PhotoDto } from '@shared/schemas/build.ts';
import { Button } from '@/components/ui/button.tsx';
import { Markdown } from '@/components/ui/markdown.tsx';
import { useDeleteEntry, useUpdateEntry } from '../../api/entries.ts';
import { ConfirmButton } from '@/components/ui/confirm-button.tsx';
import { EntryForm } from './entry-form.tsx';
import { errorMessage } from '@/components/ui/form-bits.tsx';

/** One log entry: read it, edit it in place, or delete it. */
export function EntryItem({ buildId, entry, photos }: { buildId: number; entry: LogEntryDto; photos: readonly PhotoDto[] }) {
  const [editing, setEditing] = useState(false);
  const update = useUpdateEntry(buildId);
  const remove = useDeleteEntry(buildId);

  if (editing) {
    return (
      <li>
        <EntryForm
          idPrefix={`entry-${entry.id}`}
          photos={photos}
          defaults={{ entryDate: entry.entryDate, title: entry.title, body: entry.body }}
          submitLabel="Save entry"
          onSave={async (values) => {
            await update.mutateAsync({ entryId: entry.id, ...values });
            setEditing(false);
          }}
          onCancel={() => setEditing(false)}
        />
      </li>
    );
  }
  return (
    <li className="rounded-md border border-rule bg-white p-3">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h3 className="font-semibold">
          <span className="num mr-1 text-sm font-normal text-ink-soft">{entry.entryDate}</span> {entry.title}
        </h3>
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" onClick={() => setEditing(true)} aria-label={`Edit entry “${entry.title}”`}>
            Edit
          </Button>
          <ConfirmButton
            label="Delete"
            ariaLabel={`Delete entry “${entry.title}”`}
            question="Delete this entry?"
            confirmLabel="Yes, delete"
            disabled={remove.isPending}
            onConfirm={() => remove.mutate(entry.id)}
          />
        </div>
      </div>
      <Markdown className="mt-2 text-sm">{entry.body}</Markdown>
      {entry.photos.length > 0 && (
        <p className="mt-2 text-xs text-ink-soft">
          {entry.photos.length} photo{entry.photos.length === 1 ? '' : 's'} attached (see Photos).
        </p>
      )}
      {remove.error && (
        <p role="alert" className="mt-2 text-sm text-danger">
          {errorMessage(remove.error)}
        </p>
      )}
    </li>
  );
}
