import { useQuery } from '@tanstack/react-query';
import { PART_CATEGORIES, partCategoryLabels, type PartCategory } from '@shared/schemas/part-vocabulary.ts';
import { Button } from '@/components/ui/button.tsx';
import { partQueries } from '@/lib/part-queries.ts';
import { ClearFilters, FilterSelect, FilterText, SearchForm, useFilterDraft } from '@/components/search/filter-controls.tsx';
import { GainRangeField } from './gain-range-field.tsx';
import type { PartFilters as Filters, PartSearch } from './use-part-search.ts';

interface Draft {
  q: string;
  category: PartCategory | undefined;
  gainMin: string;
  gainMax: string;
  minRuns: string;
  minVolts: string;
  maxVolts: string;
}

const text = (v: number | undefined) => (v === undefined ? '' : String(v));
const toNumber = (s: string) => (s.trim() === '' || !Number.isFinite(Number(s)) || Number(s) < 0 ? undefined : Number(s));

function toFilters(d: Draft): Partial<Filters> {
  let gainMin = toNumber(d.gainMin);
  let gainMax = toNumber(d.gainMax);
  if (gainMin !== undefined && gainMax !== undefined && gainMin > gainMax) [gainMin, gainMax] = [gainMax, gainMin];
  const minRuns = toNumber(d.minRuns);
  let minVolts = toNumber(d.minVolts);
  let maxVolts = toNumber(d.maxVolts);
  if (minVolts !== undefined && maxVolts !== undefined && minVolts > maxVolts) [minVolts, maxVolts] = [maxVolts, minVolts];
  return {
    q: d.q.trim().slice(0, 100),
    category: d.category,
    gainMin,
    gainMax,
    minRuns: minRuns === undefined ? undefined : Math.floor(minRuns),
    minVolts,
    maxVolts,
  };
}

/**
 * The registry's filters. Category applies at once, a slider when let go, the rest with "Apply filters"
 * (or Enter); everything goes to the URL, and the drafts follow the URL when someone navigates.
 */
export function PartFilters({ search }: { search: PartSearch }) {
  const f = search.filters;
  const histogram = useQuery(partQueries.histogram());
  const fromUrl = (): Draft => ({
    q: f.q,
    category: f.category,
    gainMin: text(f.gainMin),
    gainMax: text(f.gainMax),
    minRuns: text(f.minRuns),
    minVolts: text(f.minVolts),
    maxVolts: text(f.maxVolts),
  });
  const [draft, setDraft] = useFilterDraft<Draft>(search.key, fromUrl);
  const apply = (next: Partial<Draft> = {}) => {
    const all = { ...draft, ...next };
    setDraft(all);
    search.setFilters(toFilters(all));
  };

  return (
    <SearchForm
      label="Search the parts registry"
      className="mb-5 grid gap-x-6 gap-y-4 rounded-lg border border-rule bg-white p-3 sm:grid-cols-2 sm:p-4 lg:grid-cols-4"
      onSubmit={() => apply()}
    >
      <FilterText
        id="part-q"
        label="Words in name or salvage source"
        className="sm:col-span-2"
        type="search"
        maxLength={100}
        value={draft.q}
        placeholder="e.g. cartridge, buzzer, stack"
        onChange={(e) => setDraft({ ...draft, q: e.target.value })}
      />
      <FilterSelect
        id="part-category"
        label="Category"
        className="sm:col-span-2"
        all="All categories"
        values={PART_CATEGORIES}
        labels={partCategoryLabels}
        value={draft.category}
        onChange={(category) => apply({ category })}
      />
      <GainRangeField
        histogram={histogram.data}
        minText={draft.gainMin}
        maxText={draft.gainMax}
        onChange={(gainMin, gainMax) => setDraft({ ...draft, gainMin, gainMax })}
        onCommit={() => apply()}
      />
      <div className="grid content-start gap-4 sm:col-span-2 sm:grid-cols-3">
        <FilterText
          id="part-min-runs"
          label="At least this many accepted runs"
          type="number"
          inputMode="numeric"
          min={0}
          step={1}
          value={draft.minRuns}
          placeholder="any"
          onChange={(e) => setDraft({ ...draft, minRuns: e.target.value })}
        />
        <FilterText
          id="part-min-volts"
          label="Rated for at least (V)"
          type="number"
          inputMode="decimal"
          min={0}
          step="any"
          value={draft.minVolts}
          placeholder="any"
          onChange={(e) => setDraft({ ...draft, minVolts: e.target.value })}
        />
        <FilterText
          id="part-max-volts"
          label="Rated for at most (V)"
          type="number"
          inputMode="decimal"
          min={0}
          step="any"
          value={draft.maxVolts}
          placeholder="any"
          onChange={(e) => setDraft({ ...draft, maxVolts: e.target.value })}
        />
        <p className="text-xs text-ink-soft sm:col-span-3">
          A part matches a gain range when its median over accepted runs lies inside it; parts without accepted runs drop out. The bars show
          how many listed parts have their median in each band; drag the copper handles or type the numbers.
        </p>
        <div className="flex items-center gap-3 sm:col-span-3">
          <Button type="submit">Apply filters</Button>
          <ClearFilters search={search} />
        </div>
      </div>
    </SearchForm>
  );
}
