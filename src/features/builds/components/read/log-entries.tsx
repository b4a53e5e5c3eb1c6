import type { LogEntryDto } from '@shared/schemas/build.ts';
import { Markdown } from '@/components/ui/markdown.tsx';
import { formatDate } from '@shared/format/dates.ts';
import { PhotoGrid } from '@/components/photos/photo-grid.tsx';

/** The build's log entries in date order, each with its own photos. */
export function LogEntries({ entries }: { entries: LogEntryDto[] }) {
  if (entries.length === 0) return <p className="text-ink-soft">No log entries yet.</p>;
  const sorted = [...entries].sort((a, b) => a.entryDate.localeCompare(b.entryDate) || a.id - b.id);
  return (
    <ol className="space-y-4 border-l-2 border-rule pl-4 md:pl-6">
      {sorted.map((e) => (
        <li key={e.id} className="relative">
          <span
            aria-hidden="true"
            className="absolute -left-[1.4rem] top-1.5 h-3 w-3 rounded-full border-2 border-copper bg-paper md:-left-[1.9rem]"
          />
          <article aria-labelledby={`entry-${e.id}`} className="rounded-lg border border-rule bg-white p-4">
            <p className="num text-xs text-ink-soft">
              <time dateTime={e.entryDate}>{formatDate(e.entryDate)}</time>
            </p>
            <h3 id={`entry-${e.id}`} className="mt-0.5 font-semibold">
              {e.title}
            </h3>
            <Markdown className="mt-2">{e.body}</Markdown>
            {e.photos.length > 0 && (
              <div className="mt-3">
                <PhotoGrid photos={e.photos} label={`Photos of the log entry “${e.title}”`} />
              </div>
            )}
          </article>
        </li>
      ))}
    </ol>
  );
}
