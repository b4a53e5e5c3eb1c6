import { Link } from 'react-router-dom';
import { INSTRUMENT_KINDS, instrumentKindLabels, type InstrumentKind } from '@shared/schemas/build.ts';
import { Button } from '@/components/ui/button.tsx';
import type { useBuildSearch } from './use-build-search.ts';

const field = 'w-full rounded-md border border-rule bg-white px-3 py-1.5 text-sm';

/** Text search (applied on submit) and the instrument-kind filter (applied at once); both go to the URL. */
export function BuildFilters({ search }: { search: ReturnType<typeof useBuildSearch> }) {
  return (
    <form
      role="search"
      aria-label="Search builds"
      className="mb-5 grid gap-3 rounded-lg border border-rule bg-white p-3 sm:grid-cols-[1fr_14rem_auto] sm:items-end"
      onSubmit={(e) => {
        e.preventDefault();
        search.setFilters({ q: String(new FormData(e.currentTarget).get('q') ?? '') });
      }}
    >
      <div>
        <label htmlFor="build-q" className="mb-1 block text-xs font-medium text-ink-soft">
          Words in title, summary or write-up
        </label>
        <input
          id="build-q"
          key={search.q}
          name="q"
          type="search"
          defaultValue={search.q}
          maxLength={100}
          placeholder="e.g. bimorph, graphite, flexure"
          className={field}
        />
      </div>
      <div>
        <label htmlFor="build-kind" className="mb-1 block text-xs font-medium text-ink-soft">
          Instrument kind
        </label>
        <select
          id="build-kind"
          className={field}
          value={search.kind ?? ''}
          onChange={(e) => search.setFilters({ kind: (e.target.value || undefined) as InstrumentKind | undefined })}
        >
          <option value="">All kinds</option>
          {INSTRUMENT_KINDS.map((k) => (
            <option key={k} value={k}>
              {instrumentKindLabels[k]}
            </option>
          ))}
        </select>
      </div>
      <div className="flex items-center gap-3">
        <Button type="submit" variant="secondary">
          Search
        </Button>
        {search.filtered && (
          <Link to={search.clearHref} className="text-sm text-copper underline">
            Clear
          </Link>
        )}
      </div>
    </form>
  );
}
