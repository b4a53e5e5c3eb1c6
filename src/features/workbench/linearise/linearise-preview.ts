import { lineariseInput, type LineariseInput } from '@shared/schemas/linearise.ts';
import { lineariseCalculator } from '@shared/workbench/calculators/linearise-calculator.ts';
import { checkFitRows, rowsFromCsv, type CheckedRows } from '@/lib/csv/points-csv.ts';
import { parseOptionalNumber } from '@/lib/csv/number-text.ts';

/** The page's result, or why there is none in words. */
export type LinearisePreview =
  | { ok: true; input: LineariseInput; result: ReturnType<typeof lineariseCalculator.compute>; checked: CheckedRows }
  | { ok: false; message: string; checked: CheckedRows };

/** Reads the pasted points with the one points reader and runs the shared calculator on them. */
export function previewLinearise(
  text: string,
  settings: { voltageUnit: string; displacementUnit: string; degree: string; stepNm: string },
): LinearisePreview {
  const read = rowsFromCsv(text);
  const checked = checkFitRows(read.rows, read.note);
  const step = parseOptionalNumber(settings.stepNm);
  const parsed = lineariseInput.safeParse({
    points: checked.points,
    voltageUnit: settings.voltageUnit,
    displacementUnit: settings.displacementUnit,
    degree: settings.degree === 'auto' ? 'auto' : Number(settings.degree),
    ...(step !== undefined && step > 0 ? { stepNm: step } : {}),
  });
  if (!parsed.success)
    return {
      ok: false,
      checked,
      message: checked.points.length < 3 ? 'Paste at least 3 points (volts, displacement, sweep).' : parsed.error.issues[0]!.message,
    };
  try {
    return { ok: true, input: parsed.data, result: lineariseCalculator.compute(parsed.data), checked };
  } catch (err) {
    if (err instanceof RangeError) return { ok: false, checked, message: err.message };
    throw err;
  }
}

/** An invented loop (up and down sweeps of a bender read on an indicator, µm against V) the page opens with. */
export const exampleLoop = [
  'volts,displacement,sweep',
  ...Array.from({ length: 13 }, (_, i) => {
    const v = i * 10;
    return `${v},${(0.071 * v - 1.9e-4 * v * v + 0.9e-6 * v ** 3).toFixed(3)},up`;
  }),
  ...Array.from({ length: 13 }, (_, i) => {
    const v = 120 - i * 10;
    return `${v},${(0.071 * v - 1.9e-4 * v * v + 0.9e-6 * v ** 3 + 1.6e-4 * v * (120 - v)).toFixed(3)},down`;
  }),
].join('\n');
