import { useState, type FormEvent } from 'react';
import type { ListingDto } from '@shared/schemas/listing.ts';
import { Button } from '@/components/ui/button.tsx';
import { useHideListing } from '../api/listing-mutations.ts';
import { FormError, inputClass } from '@/components/ui/form-bits.tsx';

/** Moderators hide a listing (or show it again) with a note that goes to the audit trail and to the owner. */
export function HideListingForm({ listing }: { listing: ListingDto }) {
  const hide = useHideListing(listing.id);
  const [note, setNote] = useState('');
  const [empty, setEmpty] = useState(false);
  const submit = (e: FormEvent) => {
    e.preventDefault();
    if (!note.trim()) return setEmpty(true);
    hide.mutate(
      { hidden: !listing.hidden, note: note.trim() },
      {
        onSuccess: () => {
          setNote('');
          setEmpty(false);
        },
      },
    );
  };
  const missing = empty && !note.trim();
  return (
    <form
      onSubmit={submit}
      noValidate
      className="space-y-3 rounded-lg border border-danger/40 bg-white p-4"
      aria-labelledby="moderate-title"
    >
      <h2 id="moderate-title" className="text-lg font-semibold">
        Moderation
      </h2>
      <div>
        <label htmlFor="hide-note" className="mb-1 block text-sm font-medium">
          {listing.hidden ? 'Why show it again' : 'Why hide it'}
        </label>
        <textarea
          id="hide-note"
          rows={3}
          maxLength={4000}
          className={inputClass}
          value={note}
          aria-invalid={missing || undefined}
          aria-describedby={missing ? 'hide-note-error' : 'hide-note-hint'}
          onChange={(e) => setNote(e.target.value)}
        />
        {missing ? (
          <p id="hide-note-error" className="mt-1 text-sm text-danger">
            Say why; the note goes on the audit trail.
          </p>
        ) : (
          <p id="hide-note-hint" className="mt-1 text-xs text-ink-soft">
            The owner sees this note; it also goes on the audit trail.
          </p>
        )}
      </div>
      <FormError message={hide.isError ? hide.error.message : undefined} />
      <Button type="submit" variant={listing.hidden ? 'secondary' : 'danger'} disabled={hide.isPending}>
        {listing.hidden ? 'Show again with note' : 'Hide with note'}
      </Button>
    </form>
  );
}
