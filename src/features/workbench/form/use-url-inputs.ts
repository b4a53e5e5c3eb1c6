import { useEffect, useRef, useState } from 'react';
import { useWatch, type Control, type FieldValues, type UseFormReset } from 'react-hook-form';
import { useLocation, useNavigate } from 'react-router-dom';
import type { z } from 'zod';
import { decodeInputs, encodeInputs, type UrlInputOptions } from './url-inputs.ts';

/** How long typing pauses before the URL follows (ms). */
const WRITE_DELAY_MS = 400;

/** A page's first form values: its defaults, overridden field by field by what the URL's search holds. */
export function useUrlInitialValues<T>(schema: z.ZodType, defaults: T, options?: UrlInputOptions): T {
  const { search } = useLocation();
  const [initial] = useState(() => decodeInputs(schema, new URLSearchParams(search), defaults, options));
  return initial;
}

/**
 * Keeps the URL's search in step with the form (replacing the history entry, after a pause in typing),
 * and loads the form again when someone navigates to another search of the same page (a link, back).
 */
export function useUrlWriteBack<T extends FieldValues>(
  control: Control<T, unknown, unknown>,
  reset: UseFormReset<T>,
  schema: z.ZodType,
  defaults: T,
  options?: UrlInputOptions,
): void {
  const values = useWatch({ control });
  const { search, pathname } = useLocation();
  const navigate = useNavigate();
  const written = useRef(search);
  const latest = useRef({ schema, defaults, options });
  latest.current = { schema, defaults, options };

  useEffect(() => {
    if (search === written.current) return;
    written.current = search;
    const l = latest.current;
    reset(decodeInputs(l.schema, new URLSearchParams(search), l.defaults, l.options));
  }, [search, reset]);

  useEffect(() => {
    const timer = setTimeout(() => {
      const l = latest.current;
      const next = encodeInputs(l.schema, values, l.defaults, l.options);
      if (next === written.current || (next === '' && written.current === '')) return;
      written.current = next;
      void navigate({ pathname, search: next }, { replace: true, preventScrollReset: true });
    }, WRITE_DELAY_MS);
    return () => clearTimeout(timer);
  }, [values, pathname, navigate]);
}
