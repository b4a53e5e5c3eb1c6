import { useMemo } from 'react';
import { useForm, useWatch, type DefaultValues, type FieldValues, type UseFormReturn } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { friendlyError, refusalMessage } from './error-map.ts';
import type { UrlInputOptions } from './url-inputs.ts';
import { useUrlInitialValues, useUrlWriteBack } from './use-url-inputs.ts';

/** A live result: computed, or why not (the first problem with the inputs, or the calculation's refusal). */
export type Live<R> = { ok: true; result: R } | { ok: false; message: string };

/** A form schema whose input is the form's field values. */
export type FormSchema<In extends FieldValues = FieldValues> = z.ZodType<unknown, In>;

/** Parses field values with the page's schema and runs the shared calculation on them. */
export function computeLive<S extends FormSchema, R>(schema: S, values: unknown, compute: (input: z.output<S>) => R): Live<R> {
  const parsed = schema.safeParse(values, { error: friendlyError });
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return { ok: false, message: issue ? issue.message : 'Check the inputs.' };
  }
  try {
    return { ok: true, result: compute(parsed.data) };
  } catch (err) {
    return { ok: false, message: refusalMessage(err) };
  }
}

/**
 * react-hook-form validated by the page's zod schema (built on the shared one), plus the result
 * recomputed in the browser on every change: no server round trip for the preview.
 * The inputs live in the URL's search too (read on load, written back as people type), so a result can be
 * shared as a link; `url` names fields kept out of the link. `compute` must be a stable (module-level) function.
 */
export function useLiveForm<S extends FormSchema, R>(
  schema: S,
  defaultValues: DefaultValues<z.input<S>>,
  compute: (input: z.output<S>) => R,
  url?: UrlInputOptions,
): { form: UseFormReturn<z.input<S>, unknown, z.output<S>>; live: Live<R> } {
  const initial = useUrlInitialValues(schema, defaultValues, url);
  const form = useForm<z.input<S>, unknown, z.output<S>>({
    resolver: zodResolver(schema, { error: friendlyError }),
    mode: 'onChange',
    defaultValues: initial,
  });
  useUrlWriteBack(form.control, schema, defaultValues as z.input<S>, url);
  const values = useWatch({ control: form.control });
  const live = useMemo(() => computeLive(schema, values, compute), [schema, values, compute]);
  return { form, live };
}
