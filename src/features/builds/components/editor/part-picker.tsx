import { useState } from 'react';
import { partChoiceOf, type PartChoiceDto } from '@shared/schemas/part.ts';
import { PART_CATEGORIES, partCategoryLabels, type PartCategory } from '@shared/schemas/part-vocabulary.ts';
import { usePartSearch } from '../../api/search-parts.ts';
import { inputClass } from '@/components/ui/form-bits.tsx';
import { sig } from './format.ts';
import { useDebouncedValue } from './use-debounced-value.ts';

const gainText = (p: PartChoiceDto) =>
  p.stats.gainMedianNmPerV === null
    ? 'no accepted runs yet'
    : `median ${sig(p.stats.gainMedianNmPerV)} nm/V from ${p.stats.acceptedRunCount} run${p.stats.acceptedRunCount === 1 ? '' : 's'}`;

/** Search listed parts and pick one (a radio group, so arrows and Space work). */
export function PartPicker({
  idPrefix,
  value,
  current,
  onChange,
  error,
}: {
  idPrefix: string;
  value: number | undefined;
  current?: PartChoiceDto;
  onChange: (part: PartChoiceDto) => void;
  error?: string;
}) {
  const [q, setQ] = useState('');
  const [category, setCategory] = useState<PartCategory | ''>('');
  const search = usePartSearch(useDebouncedValue(q), category || undefined);
  const found = (search.data?.items ?? []).map(partChoiceOf);
  const options = current && !found.some((p) => p.id === current.id) ? [current, ...found] : found;

  return (
    <fieldset className="min-w-0 rounded-md border border-rule p-3" aria-describedby={error ? `${idPrefix}-part-error` : undefined}>
      <legend className="px-1 text-sm font-medium">Part</legend>
      <div className="grid gap-2 sm:grid-cols-[1fr_12rem]">
        <div>
          <label htmlFor={`${idPrefix}-part-q`} className="mb-1 block text-xs font-medium">
            Search the parts registry
          </label>
          <input
            id={`${idPrefix}-part-q`}
            type="search"
            className={inputClass}
            value={q}
            placeholder="e.g. cartridge, buzzer, stack"
            onChange={(e) => setQ(e.target.value)}
          />
        </div>
        <div>
          <label htmlFor={`${idPrefix}-part-cat`} className="mb-1 block text-xs font-medium">
            Category
          </label>
          <select
            id={`${idPrefix}-part-cat`}
            className={inputClass}
            value={category}
            onChange={(e) => setCategory(e.target.value as PartCategory | '')}
          >
            <option value="">Any</option>
            {PART_CATEGORIES.map((c) => (
              <option key={c} value={c}>
                {partCategoryLabels[c]}
              </option>
            ))}
          </select>
        </div>
      </div>
      <ul className="mt-3 max-h-72 space-y-1 overflow-y-auto" aria-busy={search.isFetching}>
        {options.map((p) => (
          <li key={p.id}>
            <label
              className={`flex cursor-pointer gap-2 rounded-md border p-2 text-sm ${value === p.id ? 'border-copper bg-copper/5' : 'border-transparent hover:bg-paper-deep'}`}
            >
              <input
                type="radio"
                name={`${idPrefix}-part`}
                className="mt-1 accent-copper"
                checked={value === p.id}
                onChange={() => onChange(p)}
              />
              <span className="min-w-0">
                <span className="block font-medium">{p.name}</span>
                <span className="block text-xs text-ink-soft">
                  {partCategoryLabels[p.category]} · <span className="num">{gainText(p)}</span>
                </span>
              </span>
            </label>
          </li>
        ))}
      </ul>
      {search.isSuccess && options.length === 0 && (
        <p className="mt-2 text-sm text-ink-soft">
          No listed part matches. Parts not in the registry yet can be proposed from the parts registry.
        </p>
      )}
      {search.isError && (
        <p role="alert" className="mt-2 text-sm text-danger">
          The parts registry could not be searched: {search.error.message}
        </p>
      )}
      {error && (
        <p id={`${idPrefix}-part-error`} className="mt-2 text-sm text-danger">
          {error}
        </p>
      )}
    </fieldset>
  );
}
