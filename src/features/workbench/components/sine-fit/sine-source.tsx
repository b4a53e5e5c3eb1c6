import { CsvTextSource } from '@/components/ui/csv-text-source.tsx';
import type { SineRecordState } from './use-sine-record.ts';
import { exampleSineRecord as example } from './sine-example.ts';

/** Roughly what 200 000 samples of three long decimals take as CSV text. */
const MAX_FILE_BYTES = 32 * 1024 * 1024;

/** The sine record as CSV (time, drive, displacement), pasted or loaded; a new text resets the column mapping. */
export function SineSource({ state }: { state: SineRecordState }) {
  const load = (text: string) => {
    state.setText(text);
    state.setMapping(null);
  };
  return (
    <CsvTextSource
      rows={7}
      placeholder={'time,drive,displacement\n0.000,0.00,0.000\n0.001,0.19,0.020\n…'}
      hint={
        <>
          Time, drive voltage and displacement in columns, header optional; comma, tab or semicolon separated.{' '}
          <button type="button" className="text-teal-dark underline" onClick={() => load(example)}>
            Load an example record
          </button>
        </>
      }
      maxBytes={MAX_FILE_BYTES}
      tooLarge="thin the record first."
      textarea={{ value: state.text, onChange: (e) => state.setText(e.target.value) }}
      onFileText={load}
    />
  );
}
