import { useState } from 'react';
import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { createBuildInput, type PhotoDto } from '@shared/schemas/build.ts';
import { BUILD_STAGES, buildStageLabels, INSTRUMENT_KINDS, instrumentKindLabels } from '@shared/schemas/build-vocabulary.ts';
import { Button } from '@/components/ui/button.tsx';
import { describe, Field, FormError, inputClass } from '@/components/ui/form-bits.tsx';
import { MarkdownField } from './markdown-field.tsx';
import { applyServerErrors } from '@/components/ui/form-bits.tsx';

export type BuildDetailsValues = z.output<typeof createBuildInput>;
const FIELDS = ['title', 'instrumentKind', 'summary', 'body', 'stage'] as const;

/** Title, instrument kind, stage, summary and write-up: the new-build form and the editor's Details section. */
export function BuildDetailsForm({
  defaults,
  submitLabel,
  savedMessage,
  onSave,
  photos,
}: {
  /** The build's photos, for the write-up toolbar (none on a new build). */
  photos?: readonly PhotoDto[];
  defaults?: Partial<BuildDetailsValues>;
  submitLabel: string;
  savedMessage?: string;
  onSave: (values: BuildDetailsValues) => Promise<unknown>;
}) {
  const form = useForm<z.input<typeof createBuildInput>, unknown, BuildDetailsValues>({
    resolver: zodResolver(createBuildInput),
    defaultValues: { title: '', summary: '', body: '', instrumentKind: undefined, stage: 'planning', ...defaults },
  });
  const { register, handleSubmit, setError, reset, control, formState } = form;
  const { errors, isSubmitting, isDirty } = formState;
  const body = useWatch({ control, name: 'body' }) ?? '';
  // "Saved" shows until the next edit. Kept here rather than read from isSubmitSuccessful, which the reset below clears.
  const [saved, setSaved] = useState(false);

  const submit = handleSubmit(async (values) => {
    try {
      await onSave(values);
      reset(values);
      setSaved(true);
    } catch (err) {
      setSaved(false);
      applyServerErrors(err, setError, FIELDS);
    }
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <Field label="Title" id="build-title" error={errors.title?.message}>
        <input
          id="build-title"
          className={inputClass}
          autoComplete="off"
          {...describe('build-title', errors.title?.message)}
          {...register('title')}
        />
      </Field>
      <div className="grid gap-4 sm:grid-cols-2">
        <Field label="Instrument kind" id="build-kind" error={errors.instrumentKind && 'Pick the kind of instrument.'}>
          <select
            id="build-kind"
            className={inputClass}
            {...describe('build-kind', errors.instrumentKind?.message)}
            {...register('instrumentKind')}
          >
            <option value="">Choose…</option>
            {INSTRUMENT_KINDS.map((k) => (
              <option key={k} value={k}>
                {instrumentKindLabels[k]}
              </option>
            ))}
          </select>
        </Field>
        <Field label="Stage" id="build-stage" error={errors.stage?.message}>
          <select id="build-stage" className={inputClass} {...register('stage')}>
            {BUILD_STAGES.map((s) => (
              <option key={s} value={s}>
                {buildStageLabels[s]}
              </option>
            ))}
          </select>
        </Field>
      </div>
      <Field label="Summary" id="build-summary" error={errors.summary?.message} hint="One or two sentences for the builds list.">
        <textarea
          id="build-summary"
          rows={2}
          className={inputClass}
          {...describe('build-summary', errors.summary?.message, true)}
          {...register('summary')}
        />
      </Field>
      <MarkdownField
        id="build-body"
        label="Write-up"
        value={body}
        error={errors.body?.message}
        rows={12}
        textarea={register('body')}
        photos={photos}
      />
      <FormError message={errors.root?.server?.message} />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : submitLabel}
        </Button>
        {savedMessage && saved && !isDirty && (
          <p role="status" className="text-sm text-teal-dark">
            {savedMessage}
          </p>
        )}
      </div>
    </form>
  );
}
