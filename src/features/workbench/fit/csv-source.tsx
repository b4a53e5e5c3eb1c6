import { useId } from 'react';
import { CsvFileInput } from '@/components/ui/csv-file-input.tsx';
import type { FitFormApi } from './fit-form.ts';

const MAX_FILE_BYTES = 12 * 1024 * 1024;

/** Paste CSV text, or load a file into the same box (read in the browser; nothing is uploaded). */
export function CsvSource({ form }: { form: FitFormApi }) {
  const textId = useId();
  return (
    <div className="space-y-3">
      <div>
        <label htmlFor={textId} className="block text-sm font-medium">
          CSV text
        </label>
        <textarea
          id={textId}
          rows={8}
          spellCheck={false}
          aria-describedby={`${textId}-hint`}
          placeholder={'volts,displacement,sweep\n0,0,up\n2,170,up\n…'}
          className="num mt-1 w-full rounded-md border border-rule bg-white px-2 py-1.5 text-sm"
          {...form.register('csvText')}
        />
        <p id={`${textId}-hint`} className="mt-1 text-xs text-ink-soft">
          Columns volts, displacement and an optional sweep (up or down); header optional; comma, tab or semicolon separated.
        </p>
      </div>
      <CsvFileInput
        maxBytes={MAX_FILE_BYTES}
        tooLarge="split it, or thin the record."
        onText={(text) => form.setValue('csvText', text, { shouldDirty: true })}
      />
    </div>
  );
}
