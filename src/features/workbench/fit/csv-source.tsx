import { CsvTextSource } from '@/components/ui/csv-text-source.tsx';
import type { FitFormApi } from './fit-form.ts';

const MAX_FILE_BYTES = 12 * 1024 * 1024;

/** The gain fit's points as CSV: volts, displacement and an optional sweep column. */
export function CsvSource({ form }: { form: FitFormApi }) {
  return (
    <CsvTextSource
      rows={8}
      placeholder={'volts,displacement,sweep\n0,0,up\n2,170,up\n…'}
      hint="Columns volts, displacement and an optional sweep (up or down); header optional; comma, tab or semicolon separated."
      maxBytes={MAX_FILE_BYTES}
      tooLarge="split it, or thin the record."
      textarea={form.register('csvText')}
      onFileText={(text) => form.setValue('csvText', text, { shouldDirty: true })}
    />
  );
}
