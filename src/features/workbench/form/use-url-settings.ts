import { useEffect, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { URL_INPUTS_STATE } from './inputs-write-state.ts';

/** One setting kept in the link: its search param, its default, and (for choices) the values it may take. */
export interface UrlSetting {
  param: string;
  fallback: string;
  allowed?: readonly string[];
}

const read = (value: string | null, s: UrlSetting) => (value === null || (s.allowed && !s.allowed.includes(value)) ? s.fallback : value);

/**
 * Plain text settings of a page that holds its record in state (not a react-hook-form form): each read once
 * from the link (a bad or missing value gives its default) and written back when it differs from the default,
 * marked as the page's own write so the workbench outlet keeps the page, and its pasted record, mounted.
 */
export function useUrlSettings<K extends string>(spec: Record<K, UrlSetting>): [Record<K, string>, (key: K, value: string) => void] {
  const [params, setParams] = useSearchParams();
  const keys = Object.keys(spec) as K[];
  const [values, setValues] = useState(
    () => Object.fromEntries(keys.map((k) => [k, read(params.get(spec[k].param), spec[k])])) as Record<K, string>,
  );
  useEffect(() => {
    const next = new URLSearchParams();
    for (const k of keys) {
      const v = values[k].trim();
      if (v !== spec[k].fallback) next.set(spec[k].param, v);
    }
    if (next.toString() !== params.toString()) setParams(next, { replace: true, preventScrollReset: true, state: URL_INPUTS_STATE });
    // `spec` is fixed per page.
  }, [values, params, setParams]);
  return [values, (key, value) => setValues((v) => ({ ...v, [key]: value }))];
}
