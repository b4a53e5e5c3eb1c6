import { useId, useState } from 'react';
import { inputClass } from '@/components/ui/form-bits.tsx';
import type { SineRecordState } from './use-sine-record.ts';
import { exampleSineRecord as example } from './sine-example.ts';

/** Roughly what 200 000 samples of three long decimals take as CSV text. */
const MAX_FILE_BYTES = 32 * 1024 * 1024;

/** Paste the record, or load a CSV file into the same box (read in the browser; nothing is uploaded). */
export function SineSource({ state }: { state: SineRecordState }) {
  const textId = useId();
  const fileId = useId();
  const [fileNote, setFileNote] = useState<string | null>(null);
  const handleFile = async (file: File | undefined) => {
    if (!file) return;
    if (file.size > MAX_FILE_BYTES) return setFileNote(`${file.name} is larger than 32 MB; thin the record first.`);
    setFileNote(`Reading ${file.name}…`);
    state.setText(await file.text());
    state.setMapping(null);
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
          rows={7}
          spellCheck={false}
          aria-describedby={`${textId}-hint`}
          placeholder={'time,drive,displacement\n0.000,0.00,0.000\n0.001,0.19,0.020\n…'}
          className={`num mt-1 text-sm ${inputClass}`}
          value={state.text}
          onChange={(e) => state.setText(e.target.value)}
        />
        <p id={`${textId}-hint`} className="mt-1 text-xs text-ink-soft">
          Time, drive voltage and displacement in columns, header optional; comma, tab or semicolon separated.{' '}
          <button type="button" className="text-teal-dark underline" onClick={() => (state.setText(example), state.setMapping(null))}>
            Load an example record
          </button>
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
