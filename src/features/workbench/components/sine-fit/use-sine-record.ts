// The sine-fit page's state: the CSV text, the column mapping and units, the known frequency, and
// what they give — the parsed SineFitInput (what POST /api/workbench/sine-fit and a sine-record run
// take) and the shared calculator's result for it (the page's live result; the API answers the same).
import { useDeferredValue, useMemo, useState } from 'react';
import { useUrlSettings } from '@/features/workbench/form/use-url-settings.ts';
import { displacementUnits, voltageUnits } from '@shared/units.ts';
import { sineFitInput, type SineFitInput } from '@shared/schemas/sine-fit.ts';
import type { DisplacementUnit, VoltageUnit } from '@shared/units.ts';
import { sineFitCalculator } from '@shared/workbench/calculators/sine-fit-calculator.ts';
import { SineFitError } from '@shared/workbench/sine-fit-error.ts';
import { parseOptionalNumber } from '@/lib/csv/number-text.ts';
import type { RowProblem } from '@/lib/csv/split-csv.ts';
import { exampleSineRecord } from './sine-example.ts';
import { timeUnits, guessMapping, readSineTable, samplesFromTable, type ColumnMapping, type SineTable, type TimeUnit } from './sine-csv.ts';

/** The calculator's result on the page. */
export type SineFitResult = ReturnType<typeof sineFitCalculator.compute>;

/** The result, or why there is none in words. */
export type SineFitOutcome = { ok: true; result: SineFitResult } | { ok: false; message: string };

function fitOutcome(input: SineFitInput | null, why: string): SineFitOutcome {
  if (!input) return { ok: false, message: why };
  try {
    return { ok: true, result: sineFitCalculator.compute(input) };
  } catch (err) {
    if (err instanceof SineFitError) return { ok: false, message: err.message };
    throw err;
  }
}

/** Units and the known frequency live in the link (the record itself does not: it can be megabytes). */
const SETTINGS = {
  timeUnit: { param: 'tu', fallback: 's', allowed: Object.keys(timeUnits) },
  voltageUnit: { param: 'vu', fallback: 'V', allowed: voltageUnits },
  displacementUnit: { param: 'du', fallback: 'um', allowed: displacementUnits },
  frequencyText: { param: 'f', fallback: '' },
};

/**
 * Everything the sine-fit page holds and derives. `input` is the parsed record in the shape of
 * `sineFitInput` ({ samples, voltageUnit, displacementUnit, frequencyHz? }), null while it is incomplete:
 * hand it to a "record as a run" panel as it is.
 */
export function useSineRecord() {
  const [text, setText] = useState(exampleSineRecord);
  const [mappingChoice, setMapping] = useState<ColumnMapping | null>(null);
  const [settings, set] = useUrlSettings(SETTINGS);
  const timeUnit = settings.timeUnit as TimeUnit;
  const voltageUnit = settings.voltageUnit as VoltageUnit;
  const displacementUnit = settings.displacementUnit as DisplacementUnit;
  const { frequencyText } = settings;
  const deferredText = useDeferredValue(text);

  const table: SineTable = useMemo(() => readSineTable(deferredText), [deferredText]);
  const guessed = useMemo(() => guessMapping(table), [table]);
  const mapping = mappingChoice !== null && Math.max(...Object.values(mappingChoice)) < table.names.length ? mappingChoice : guessed;
  const parsed = useMemo(() => samplesFromTable(table, mapping, timeUnit), [table, mapping, timeUnit]);
  const frequency = parseOptionalNumber(frequencyText);
  const frequencyError =
    frequency !== undefined && !(frequency > 0) ? 'Enter a positive frequency in Hz, or leave it empty to have it fitted.' : undefined;

  const checked = useMemo(() => {
    if (table.lines.length === 0) return { input: null, why: 'Paste a record or load a CSV file.' };
    if (frequencyError) return { input: null, why: frequencyError };
    const body = { samples: parsed.samples, voltageUnit, displacementUnit, ...(frequency !== undefined ? { frequencyHz: frequency } : {}) };
    const result = sineFitInput.safeParse(body);
    if (result.success) return { input: result.data, why: '' };
    const issue = result.error.issues[0];
    const why =
      issue?.path[0] === 'samples' && issue.code === 'too_small'
        ? `The mapped columns give ${parsed.samples.length} usable samples; at least ${String(issue.minimum)} are needed.`
        : issue?.path[0] === 'samples' && issue.code === 'too_big'
          ? `The record has ${parsed.samples.length} samples; at most ${String(issue.maximum)} are fitted. Thin the record.`
          : (issue?.message ?? 'The record could not be read.');
    return { input: null, why };
  }, [table.lines.length, frequencyError, parsed.samples, voltageUnit, displacementUnit, frequency]);

  const outcome = useMemo(() => fitOutcome(checked.input, checked.why), [checked]);
  return {
    text,
    setText,
    table,
    mapping,
    setMapping,
    timeUnit,
    setTimeUnit: (v: TimeUnit) => set('timeUnit', v),
    voltageUnit,
    setVoltageUnit: (v: VoltageUnit) => set('voltageUnit', v),
    displacementUnit,
    setDisplacementUnit: (v: DisplacementUnit) => set('displacementUnit', v),
    frequencyText,
    setFrequencyText: (v: string) => set('frequencyText', v),
    frequencyError,
    samples: parsed.samples,
    problems: parsed.problems as readonly RowProblem[],
    /** The parsed record ({ samples, voltageUnit, displacementUnit, frequencyHz? }) or null. */
    input: checked.input,
    outcome,
  };
}

/** What useSineRecord returns, for the page's parts. */
export type SineRecordState = ReturnType<typeof useSineRecord>;
