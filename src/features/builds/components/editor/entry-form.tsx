import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { createEntryInput, type CreateEntryInput, type PhotoDto } from '@shared/schemas/build.ts';
import { Button } from '@/components/ui/button.tsx';
import { describe, Field, FormError, inputClass } from '@/components/ui/form-bits.tsx';
import { MarkdownField } from './markdown-field.tsx';
import { applyServerErrors } from '@/components/ui/form-bits.tsx';

const today = () => new Date().toISOString().slice(0, 10);

/** Date, title and Markdown text of one log entry (new or edited). */
export function EntryForm({
  idPrefix,
  defaults,
  submitLabel,
  onSave,
  onCancel,
  photos,
}: {
  /** The build's photos, for the text's toolbar. */
  photos?: readonly PhotoDto[];
  idPrefix: string;
  defaults?: CreateEntryInput;
  submitLabel: string;
  onSave: (values: CreateEntryInput) => Promise<unknown>;
  onCancel: () => void;
}) {
  const {
    register,
    handleSubmit,
    setError,
    control,
    formState: { errors, isSubmitting },
  } = useForm<CreateEntryInput>({
    resolver: zodResolver(createEntryInput),
    defaultValues: defaults ?? { entryDate: today(), title: '', body: '' },
  });
  const body = useWatch({ control, name: 'body' }) ?? '';
  const id = (f: string) => `${idPrefix}-${f}`;

  const submit = handleSubmit(async (values) => {
    try {
      await onSave(values);
    } catch (err) {
      applyServerErrors(err, setError, ['entryDate', 'title', 'body']);
    }
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-3 rounded-md border border-rule bg-white p-3">
      <div className="grid gap-3 sm:grid-cols-[12rem_1fr]">
        <Field label="Date" id={id('date')} error={errors.entryDate && 'Give the date as a calendar date.'}>
          <input
            id={id('date')}
            type="date"
            className={inputClass}
            {...describe(id('date'), errors.entryDate?.message)}
            {...register('entryDate')}
          />
        </Field>
        <Field label="Entry title" id={id('title')} error={errors.title?.message}>
          <input
            id={id('title')}
            className={inputClass}
            autoComplete="off"
            {...describe(id('title'), errors.title?.message)}
            {...register('title')}
          />
        </Field>
      </div>
      <MarkdownField
        id={id('body')}
        label="Entry text"
        value={body}
        error={errors.body?.message}
        rows={6}
        textarea={register('body')}
        photos={photos}
      />
      <FormError message={errors.root?.server?.message} />
      <div className="flex gap-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : submitLabel}
        </Button>
        <Button variant="ghost" onClick={onCancel}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
