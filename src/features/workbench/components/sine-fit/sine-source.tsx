import { useId } from 'react';
import { CsvFileInput } from '@/components/ui/csv-file-input.tsx';
import { inputClass } from '@/components/ui/form-bits.tsx';
import type { SineRecordState } from './use-sine-record.ts';
import { exampleSineRecord as example } from './sine-example.ts';

/** Roughly what 200 000 samples of three long decimals take as CSV text. */
const MAX_FILE_BYTES = 32 * 1024 * 1024;

/** Paste the record, or load a CSV file into the same box (read in the browser; nothing is uploaded). */
export function SineSource({ state }: { state: SineRecordState }) {
  const textId = useId();
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
      <CsvFileInput
        maxBytes={MAX_FILE_BYTES}
        tooLarge="thin the record first."
        onText={(text) => {
          state.setText(text);
          state.setMapping(null);
        }}
      />
    </div>
  );
}
