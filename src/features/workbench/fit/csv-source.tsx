import { useId, useState } from 'react';
import type { FitFormApi } from './fit-form.ts';

const MAX_FILE_BYTES = 12 * 1024 * 1024;

/** Paste CSV text, or load a file into the same box (read in the browser; nothing is uploaded). */
export function CsvSource({ form }: { form: FitFormApi }) {
  const textId = useId();
  const fileId = useId();
  const [fileNote, setFileNote] = useState<string | null>(null);
  const handleFile = async (file: File | undefined) => {
    if (!file) return;
    if (file.size > MAX_FILE_BYTES) return setFileNote(`${file.name} is larger than 12 MB; split it, or thin the record.`);
    setFileNote(`Reading ${file.name}…`);
    const text = await file.text();
    form.setValue('csvText', text, { shouldDirty: true });
    setFileNote(`Loaded ${file.name} (${(file.size / 1024).toFixed(1)} KB).`);
  };
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
      <div>
        <label htmlFor={fileId} className="block text-sm font-medium">
          Or load a CSV file
        </label>
        <input
          id={fileId}
          type="file"
          accept=".csv,.txt,.tsv,text/csv,text/plain"
          className="mt-1 block w-full text-sm file:mr-3 file:rounded-md file:border file:border-teal file:bg-white file:px-3 file:py-1 file:text-teal-dark"
          onChange={(e) => void handleFile(e.target.files?.[0])}
        />
        {fileNote && (
          <p role="status" className="mt-1 text-xs text-ink-soft">
            {fileNote}
          </p>
        )}
      </div>
    </div>
  );
}
