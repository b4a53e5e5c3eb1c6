import { useEffect, useRef, useState } from 'react';
import { useWatch, type Control, type FieldValues } from 'react-hook-form';
import { useLocation, useNavigate } from 'react-router-dom';
import type { z } from 'zod';
import { decodeInputs, encodeInputs, type UrlInputOptions } from './url-inputs.ts';
import { URL_INPUTS_STATE } from './inputs-write-state.ts';

/** How long typing pauses before the URL follows (ms). */
const WRITE_DELAY_MS = 400;

/** A page's first form values: its defaults, overridden field by field by what the URL's search holds. */
export function useUrlInitialValues<T>(schema: z.ZodType, defaults: T, options?: UrlInputOptions): T {
  const { search } = useLocation();
  const [initial] = useState(() => decodeInputs(schema, new URLSearchParams(search), defaults, options));
  return initial;
}

/**
 * Keeps the URL's search in step with the form, replacing the history entry after a pause in typing.
 * Navigation to another search of the page (a link, a "start from" picker, back) remounts the page
 * (see WorkbenchOutlet), which then reads its inputs afresh.
 */
export function useUrlWriteBack<T extends FieldValues>(
  control: Control<T, unknown, unknown>,
  schema: z.ZodType,
  defaults: T,
  options?: UrlInputOptions,
): void {
  const values = useWatch({ control });
  const { search, pathname } = useLocation();
  const navigate = useNavigate();
  const latest = useRef({ schema, defaults, options, search });
  latest.current = { schema, defaults, options, search };

  useEffect(() => {
    const timer = setTimeout(() => {
      const l = latest.current;
      const next = encodeInputs(l.schema, values, l.defaults, l.options);
      if (next === l.search || (next === '' && l.search === '?')) return;
      void navigate({ pathname, search: next }, { replace: true, preventScrollReset: true, state: URL_INPUTS_STATE });
    }, WRITE_DELAY_MS);
    return () => clearTimeout(timer);
  }, [values, pathname, navigate]);
}
