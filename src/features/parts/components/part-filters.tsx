import { useState } from 'react';
import { Link } from 'react-router-dom';
import { useQuery } from '@tanstack/react-query';
import { PART_CATEGORIES, partCategoryLabels, type PartCategory } from '@shared/schemas/part.ts';
import { Button } from '@/components/ui/button.tsx';
import { partQueries } from '@/lib/part-queries.ts';
import { fieldClass, labelClass } from './filter-styles.ts';
import { GainRangeField } from './gain-range-field.tsx';
import type { PartFilters as Filters, PartSearch } from './use-part-search.ts';

interface Draft {
  q: string;
  category: PartCategory | undefined;
  gainMin: string;
  gainMax: string;
  minRuns: string;
  maxVolts: string;
}

const text = (v: number | undefined) => (v === undefined ? '' : String(v));
const toNumber = (s: string) => (s.trim() === '' || !Number.isFinite(Number(s)) || Number(s) < 0 ? undefined : Number(s));

function toFilters(d: Draft): Partial<Filters> {
  let gainMin = toNumber(d.gainMin);
  let gainMax = toNumber(d.gainMax);
  if (gainMin !== undefined && gainMax !== undefined && gainMin > gainMax) [gainMin, gainMax] = [gainMax, gainMin];
  const minRuns = toNumber(d.minRuns);
  return {
    q: d.q.trim().slice(0, 100),
    category: d.category,
    gainMin,
    gainMax,
    minRuns: minRuns === undefined ? undefined : Math.floor(minRuns),
    maxVolts: toNumber(d.maxVolts),
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
    maxVolts: text(f.maxVolts),
  });
  const [draft, setDraft] = useState<Draft>(fromUrl);
  const [seen, setSeen] = useState(search.key);
  if (seen !== search.key) {
    setSeen(search.key);
    setDraft(fromUrl());
  }
  const apply = (next: Partial<Draft> = {}) => {
    const all = { ...draft, ...next };
    setDraft(all);
    search.setFilters(toFilters(all));
  };

  return (
    <form
      role="search"
      aria-label="Search the parts registry"
      className="mb-5 grid gap-x-6 gap-y-4 rounded-lg border border-rule bg-white p-3 sm:grid-cols-2 sm:p-4 lg:grid-cols-4"
      onSubmit={(e) => {
        e.preventDefault();
        apply();
      }}
    >
      <div className="sm:col-span-2">
        <label htmlFor="part-q" className={labelClass}>
          Words in name or salvage source
        </label>
        <input
          id="part-q"
          type="search"
          maxLength={100}
          value={draft.q}
          placeholder="e.g. cartridge, buzzer, stack"
          className={fieldClass}
          onChange={(e) => setDraft({ ...draft, q: e.target.value })}
        />
      </div>
      <div className="sm:col-span-2">
        <label htmlFor="part-category" className={labelClass}>
          Category
        </label>
        <select
          id="part-category"
          className={fieldClass}
          value={draft.category ?? ''}
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
      <GainRangeField
        histogram={histogram.data}
        minText={draft.gainMin}
        maxText={draft.gainMax}
        onChange={(gainMin, gainMax) => setDraft({ ...draft, gainMin, gainMax })}
        onCommit={() => apply()}
      />
      <div className="grid content-start gap-4 sm:col-span-2 sm:grid-cols-2">
        <div>
          <label htmlFor="part-min-runs" className={labelClass}>
            At least this many accepted runs
          </label>
          <input
            id="part-min-runs"
            type="number"
            inputMode="numeric"
            min={0}
            step={1}
            value={draft.minRuns}
            placeholder="any"
            className={`${fieldClass} num`}
            onChange={(e) => setDraft({ ...draft, minRuns: e.target.value })}
          />
        </div>
        <div>
          <label htmlFor="part-max-volts" className={labelClass}>
            Safe voltage at most (V)
          </label>
          <input
            id="part-max-volts"
            type="number"
            inputMode="decimal"
            min={0}
            step="any"
            value={draft.maxVolts}
            placeholder="any"
            className={`${fieldClass} num`}
            onChange={(e) => setDraft({ ...draft, maxVolts: e.target.value })}
          />
        </div>
        <p className="text-xs text-ink-soft sm:col-span-2">
          A part matches a gain range when its median over accepted runs lies inside it; parts without accepted runs drop out. The bars show
          how many listed parts have their median in each band; drag the copper handles or type the numbers.
        </p>
        <div className="flex items-center gap-3 sm:col-span-2">
          <Button type="submit">Apply filters</Button>
          {search.filtered && (
            <Link to={search.clearHref} className="text-sm text-copper-dark underline">
              Clear filters
            </Link>
          )}
        </div>
      </div>
    </form>
  );
}
