// The pieces the search pages (registry, exchange, builds) build their filter forms from: the form, a
// labelled text box, a labelled "all or one" select, the clear link, and drafts that follow the URL.
import { useState, type FormEvent, type ReactNode } from 'react';
import { Link } from 'react-router-dom';
import { fieldClass, labelClass } from './filter-styles.ts';

/** A search form: `role="search"` with its name; submitting calls `onSubmit` without reloading the page. */
export function SearchForm({
  label,
  className,
  onSubmit,
  children,
}: {
  label: string;
  className: string;
  onSubmit: (form: HTMLFormElement) => void;
  children: ReactNode;
}) {
  return (
    <form
      role="search"
      aria-label={label}
      className={className}
      onSubmit={(e: FormEvent<HTMLFormElement>) => {
        e.preventDefault();
        onSubmit(e.currentTarget);
      }}
    >
      {children}
    </form>
  );
}

/** A labelled search box (words to look for). Pass value and onChange, or name and defaultValue. */
export function FilterText({
  id,
  label,
  className,
  ...input
}: { id: string; label: string; className?: string } & Omit<React.ComponentProps<'input'>, 'id' | 'className'>) {
  return (
    <div className={className}>
      <label htmlFor={id} className={labelClass}>
        {label}
      </label>
      <input id={id} className={input.type === 'number' ? `${fieldClass} num` : fieldClass} {...input} />
    </div>
  );
}

/** A labelled select of "all" or one of `values`; choosing applies at once (undefined for "all"). */
export function FilterSelect<V extends string>({
  id,
  label,
  all,
  values,
  labels,
  value,
  onChange,
  className,
}: {
  id: string;
  label: string;
  /** The words of the empty choice, e.g. "All categories". */
  all: string;
  values: readonly V[];
  labels: Record<V, string>;
  value: V | undefined;
  onChange: (value: V | undefined) => void;
  className?: string;
}) {
  return (
    <div className={className}>
      <label htmlFor={id} className={labelClass}>
        {label}
      </label>
      <select id={id} className={fieldClass} value={value ?? ''} onChange={(e) => onChange((e.target.value || undefined) as V | undefined)}>
        <option value="">{all}</option>
        {values.map((v) => (
          <option key={v} value={v}>
            {labels[v]}
          </option>
        ))}
      </select>
    </div>
  );
}

/** "Clear filters", shown only while a filter is set. */
export function ClearFilters({
  search,
  children = 'Clear filters',
}: {
  search: { filtered: boolean; clearHref: string };
  children?: ReactNode;
}) {
  if (!search.filtered) return null;
  return (
    <Link to={search.clearHref} className="text-sm text-copper-dark underline">
      {children}
    </Link>
  );
}

/**
 * What someone is typing into the filters before applying it: starts from the URL and starts again from it
 * whenever the URL's search (`key`) changes, e.g. on a link or the back button.
 */
export function useFilterDraft<D>(key: string, fromUrl: () => D) {
  const [draft, setDraft] = useState<D>(fromUrl);
  const [seen, setSeen] = useState(key);
  if (seen !== key) {
    setSeen(key);
    setDraft(fromUrl());
  }
  return [draft, setDraft] as const;
}
