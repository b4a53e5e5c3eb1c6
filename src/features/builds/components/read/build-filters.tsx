import { INSTRUMENT_KINDS, instrumentKindLabels } from '@shared/schemas/build-vocabulary.ts';
import { Button } from '@/components/ui/button.tsx';
import { ClearFilters, FilterSelect, FilterText, SearchForm } from '@/components/search/filter-controls.tsx';
import type { useBuildSearch } from './use-build-search.ts';

/** Text search (applied on submit) and the instrument-kind filter (applied at once); both go to the URL. */
export function BuildFilters({ search }: { search: ReturnType<typeof useBuildSearch> }) {
  return (
    <SearchForm
      label="Search builds"
      className="mb-5 grid gap-3 rounded-lg border border-rule bg-white p-3 sm:grid-cols-[1fr_14rem_auto] sm:items-end"
      onSubmit={(form) => search.setFilters({ q: String(new FormData(form).get('q') ?? '') })}
    >
      <FilterText
        id="build-q"
        label="Words in title, summary or write-up"
        key={search.q}
        name="q"
        type="search"
        defaultValue={search.q}
        maxLength={100}
        placeholder="e.g. bimorph, graphite, flexure"
      />
      <FilterSelect
        id="build-kind"
        label="Instrument kind"
        all="All kinds"
        values={INSTRUMENT_KINDS}
        labels={instrumentKindLabels}
        value={search.kind}
        onChange={(kind) => search.setFilters({ kind })}
      />
      <div className="flex items-center gap-3">
        <Button type="submit" variant="secondary">
          Search
        </Button>
        <ClearFilters search={search}>Clear</ClearFilters>
      </div>
    </SearchForm>
  );
}
