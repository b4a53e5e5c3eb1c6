import { useState } from 'react';
import type { BuildDto } from '@shared/schemas/build.ts';
import { Button } from '@/components/ui/button.tsx';
import { useCreateEntry } from '../../api/entries.ts';
import { EditorSection } from './editor-section.tsx';
import { EntryForm } from './entry-form.tsx';
import { EntryItem } from './entry-item.tsx';

/** Dated log entries: what was done when, in Markdown. */
export function EntriesSection({ build }: { build: BuildDto }) {
  const [adding, setAdding] = useState(false);
  const create = useCreateEntry(build.id);
  return (
    <EditorSection id="entries" title="Log entries" lead="Dated notes on what you tried, what broke and what worked.">
      {build.entries.length === 0 && !adding && <p className="mb-3 text-sm text-ink-soft">No log entries yet.</p>}
      <ul className="space-y-3">
        {build.entries.map((e) => (
          <EntryItem key={e.id} buildId={build.id} entry={e} photos={build.photos} />
        ))}
      </ul>
      <div className="mt-3">
        {adding ? (
          <EntryForm
            idPrefix="new-entry"
            photos={build.photos}
            submitLabel="Add entry"
            onSave={async (values) => {
              await create.mutateAsync(values);
              setAdding(false);
            }}
            onCancel={() => setAdding(false)}
          />
        ) : (
          <Button variant="secondary" onClick={() => setAdding(true)}>
            Add a log entry
          </Button>
        )}
      </div>
    </EditorSection>
  );
}
