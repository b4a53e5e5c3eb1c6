import { useDeferredValue, useMemo } from 'react';
import { useWatch } from 'react-hook-form';
import { checkFitRows, rowsFromCsv, type CheckedRows, type RawFitRow } from '@/lib/csv/points-csv.ts';
import { previewFit, type FitFormApi } from './fit-form.ts';

/** The rows of the chosen source, checked, and the fit of the good ones — recomputed as the user types. */
export function useFitPreview(form: FitFormApi) {
  const [source, rows, csvText, voltageUnit, displacementUnit, model] = useWatch({
    control: form.control,
    name: ['source', 'rows', 'csvText', 'voltageUnit', 'displacementUnit', 'model'],
  });
  const deferredCsv = useDeferredValue(csvText);
  const input = useMemo((): { rows: RawFitRow[]; checked: CheckedRows } => {
    if (source === 'csv') {
      const read = rowsFromCsv(deferredCsv ?? '');
      return { rows: read.rows, checked: checkFitRows(read.rows, read.note) };
    }
    const typed = (rows ?? []).map((r, i) => ({
      line: i + 1,
      volts: r?.volts ?? '',
      displacement: r?.displacement ?? '',
      sweep: r?.sweep ?? '',
    }));
    return { rows: typed, checked: checkFitRows(typed) };
  }, [source, rows, deferredCsv]);
  const result = useMemo(
    () => previewFit(input.checked, { voltageUnit: voltageUnit ?? 'V', displacementUnit, model: model ?? 'intercept' }),
    [input.checked, voltageUnit, displacementUnit, model],
  );
  return { source, ...input, result };
}
