import { PART_SORTS, type PartSort } from '@shared/schemas/part.ts';
import { partsExportHref } from '@/lib/part-queries.ts';
import { fieldClass, labelClass } from '@/components/search/filter-styles.ts';
import type { PartSearch } from './use-part-search.ts';

const sortLabels: Record<PartSort, string> = {
  name: 'Name, A–Z',
  gain: 'Median gain, lowest first',
  '-gain': 'Median gain, highest first',
  '-runs': 'Most accepted runs first',
  runs: 'Fewest accepted runs first',
  newest: 'Newest listed first',
};

const link =
  'inline-flex items-center gap-1 rounded-md border border-teal bg-white px-2.5 py-1 text-sm font-medium text-teal-dark hover:bg-teal/10';

const toggle = 'text-copper-dark underline hover:text-ink';

/** "3 parts with no stated rating are hidden — show them", or the way back once they are shown. */
function UnratedNote({ search, hidden }: { search: PartSearch; hidden: number }) {
  const f = search.filters;
  if (f.minVolts === undefined && f.maxVolts === undefined) return null;
  if (f.unrated === 'include')
    return (
      <>
        {'. Parts with no stated rating are included — '}
        <button type="button" className={toggle} onClick={() => search.setFilters({ unrated: undefined })}>
          hide them
        </button>
      </>
    );
  if (hidden === 0) return null;
  return (
    <>
      {`. ${hidden} ${hidden === 1 ? 'part with no stated rating is' : 'parts with no stated rating are'} hidden — `}
      <button type="button" className={toggle} onClick={() => search.setFilters({ unrated: 'include' })}>
        show {hidden === 1 ? 'it' : 'them'}
      </button>
    </>
  );
}

/** How many parts match, the sort (also set by the table headers), and downloads of the whole search. */
export function ResultsBar({
  search,
  total,
  unratedHidden,
}: {
  search: PartSearch;
  total: number | undefined;
  /** Matches a voltage filter hides because they state no rating. */
  unratedHidden: number | undefined;
}) {
  return (
    <div className="mb-3 flex flex-wrap items-end justify-between gap-3">
      <p className="text-sm text-ink-soft" aria-live="polite">
        {total === undefined ? (
          'Searching…'
        ) : (
          <>
            <span className="num font-semibold text-ink">{total}</span> {total === 1 ? 'part matches' : 'parts match'}
            {search.filtered ? ' these filters' : ''}
            <UnratedNote search={search} hidden={unratedHidden ?? 0} />
          </>
        )}
      </p>
      <div className="flex flex-wrap items-end gap-3">
        <div>
          <label htmlFor="part-sort" className={labelClass}>
            Sort
          </label>
          <select id="part-sort" className={fieldClass} value={search.sort} onChange={(e) => search.setSort(e.target.value as PartSort)}>
            {PART_SORTS.map((s) => (
              <option key={s} value={s}>
                {sortLabels[s]}
              </option>
            ))}
          </select>
        </div>
        <a className={link} href={partsExportHref(search.query, 'csv')} download>
          Download CSV
        </a>
        <a className={link} href={partsExportHref(search.query, 'json')} download>
          Download JSON
        </a>
      </div>
    </div>
  );
}
