import { useState } from 'react';
import { Link } from 'react-router-dom';
import { LISTING_CONDITIONS, listingConditionLabels, type ListingCondition, type ListingKind } from '@shared/schemas/listing.ts';
import { PART_CATEGORIES, partCategoryLabels, type PartCategory } from '@shared/schemas/part.ts';
import { Button } from '@/components/ui/button.tsx';
import type { ListingFilters as Filters, ListingSearch } from './use-listing-search.ts';

const field = 'w-full rounded-md border border-rule bg-white px-2.5 py-1.5 text-base sm:text-sm';
const label = 'mb-1 block text-xs font-medium text-ink-soft';

/** Exchange filters: the selects and "free only" apply at once, words and region on "Search"; all in the URL. */
export function ListingFilters({ search }: { search: ListingSearch }) {
  const [draft, setDraft] = useState<Filters>(search.filters);
  const [seen, setSeen] = useState(search.key);
  if (seen !== search.key) {
    setSeen(search.key);
    setDraft(search.filters);
  }
  const f = draft;
  const apply = (next: Partial<Filters> = {}) => {
    const all = { ...draft, ...next };
    setDraft(all);
    search.setFilters({ ...all, q: all.q.trim(), region: all.region.trim() });
  };
  return (
    <form
      role="search"
      aria-label="Search the exchange"
      className="mb-5 grid gap-3 rounded-lg border border-rule bg-white p-3 sm:grid-cols-2 lg:grid-cols-6 lg:items-end"
      onSubmit={(e) => {
        e.preventDefault();
        apply();
      }}
    >
      <div className="lg:col-span-2">
        <label htmlFor="listing-q" className={label}>
          Words in part name or notes
        </label>
        <input
          id="listing-q"
          type="search"
          maxLength={100}
          value={f.q}
          placeholder="e.g. tube, cartridge"
          className={field}
          onChange={(e) => setDraft({ ...f, q: e.target.value })}
        />
      </div>
      <div>
        <label htmlFor="listing-kind" className={label}>
          Offering or seeking
        </label>
        <select
          id="listing-kind"
          className={field}
          value={f.kind ?? ''}
          onChange={(e) => apply({ kind: (e.target.value || undefined) as ListingKind | undefined })}
        >
          <option value="">Both</option>
          <option value="offering">Offering</option>
          <option value="seeking">Seeking</option>
        </select>
      </div>
      <div>
        <label htmlFor="listing-category" className={label}>
          Category
        </label>
        <select
          id="listing-category"
          className={field}
          value={f.category ?? ''}
          onChange={(e) => apply({ category: (e.target.value || undefined) as PartCategory | undefined })}
        >
          <option value="">All categories</option>
          {PART_CATEGORIES.map((c) => (
            <option key={c} value={c}>
              {partCategoryLabels[c]}
            </option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="listing-condition" className={label}>
          Condition
        </label>
        <select
          id="listing-condition"
          className={field}
          value={f.condition ?? ''}
          onChange={(e) => apply({ condition: (e.target.value || undefined) as ListingCondition | undefined })}
        >
          <option value="">Any condition</option>
          {LISTING_CONDITIONS.map((c) => (
            <option key={c} value={c}>
              {listingConditionLabels[c]}
            </option>
          ))}
        </select>
      </div>
      <div>
        <label htmlFor="listing-region" className={label}>
          Region
        </label>
        <input
          id="listing-region"
          maxLength={80}
          value={f.region}
          placeholder="e.g. Leeds"
          className={field}
          onChange={(e) => setDraft({ ...f, region: e.target.value })}
        />
      </div>
      <div className="flex flex-wrap items-center gap-x-4 gap-y-2 sm:col-span-2 lg:col-span-6">
        <label className="inline-flex items-center gap-2 text-sm">
          <input
            type="checkbox"
            className="h-4 w-4 accent-copper"
            checked={f.freeOnly}
            onChange={(e) => apply({ freeOnly: e.target.checked })}
          />
          Free only
        </label>
        <Button type="submit" variant="secondary">
          Search
        </Button>
        {search.filtered && (
          <Link to={search.clearHref} className="text-sm text-copper-dark underline">
            Clear filters
          </Link>
        )}
      </div>
    </form>
  );
}
