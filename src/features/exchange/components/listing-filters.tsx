import { LISTING_CONDITIONS, LISTING_KINDS, listingConditionLabels, type ListingKind } from '@shared/schemas/listing-vocabulary.ts';
import { PART_CATEGORIES, partCategoryLabels } from '@shared/schemas/part-vocabulary.ts';
import { Button } from '@/components/ui/button.tsx';
import { ClearFilters, FilterSelect, FilterText, SearchForm, useFilterDraft } from '@/components/search/filter-controls.tsx';
import type { ListingFilters as Filters, ListingSearch } from './use-listing-search.ts';

const kindLabels: Record<ListingKind, string> = { offering: 'Offering', seeking: 'Seeking' };

/** Exchange filters: the selects and "free only" apply at once, words and region on "Search"; all in the URL. */
export function ListingFilters({ search }: { search: ListingSearch }) {
  const [draft, setDraft] = useFilterDraft<Filters>(search.key, () => search.filters);
  const f = draft;
  const apply = (next: Partial<Filters> = {}) => {
    const all = { ...draft, ...next };
    setDraft(all);
    search.setFilters({ ...all, q: all.q.trim(), region: all.region.trim() });
  };
  return (
    <SearchForm
      label="Search the exchange"
      className="mb-5 grid gap-3 rounded-lg border border-rule bg-white p-3 sm:grid-cols-2 lg:grid-cols-6 lg:items-end"
      onSubmit={() => apply()}
    >
      <FilterText
        id="listing-q"
        label="Words in part name or notes"
        className="lg:col-span-2"
        type="search"
        maxLength={100}
        value={f.q}
        placeholder="e.g. tube, cartridge"
        onChange={(e) => setDraft({ ...f, q: e.target.value })}
      />
      <FilterSelect
        id="listing-kind"
        label="Offering or seeking"
        all="Both"
        values={LISTING_KINDS}
        labels={kindLabels}
        value={f.kind}
        onChange={(kind) => apply({ kind })}
      />
      <FilterSelect
        id="listing-category"
        label="Category"
        all="All categories"
        values={PART_CATEGORIES}
        labels={partCategoryLabels}
        value={f.category}
        onChange={(category) => apply({ category })}
      />
      <FilterSelect
        id="listing-condition"
        label="Condition"
        all="Any condition"
        values={LISTING_CONDITIONS}
        labels={listingConditionLabels}
        value={f.condition}
        onChange={(condition) => apply({ condition })}
      />
      <FilterText
        id="listing-region"
        label="Region"
        maxLength={80}
        value={f.region}
        placeholder="e.g. Leeds"
        onChange={(e) => setDraft({ ...f, region: e.target.value })}
      />
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
        <ClearFilters search={search} />
      </div>
    </SearchForm>
  );
}
