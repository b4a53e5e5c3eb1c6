import type { UseFormReturn } from 'react-hook-form';
import { z } from 'zod';
import { fitInput } from '@shared/schemas/workbench.ts';
import type { CalculatorResult } from '@shared/workbench/calculators/calculator.ts';
import { fitCalculator } from '@shared/workbench/calculators/fit-calculator.ts';
import { toNm, toVolts } from '@shared/units.ts';
import { friendlyError, refusalMessage } from '../form/error-map.ts';
import type { CalibrationChartPoint } from '@/components/charts/calibration-chart.tsx';
import type { CheckedRows } from '@/lib/csv/points-csv.ts';

const gridRow = z.object({ volts: z.string(), displacement: z.string(), sweep: z.enum(['', 'up', 'down']) });

/** The fit form: where the points come from, the grid rows, the CSV text, and the shared fit settings. */
export const fitForm = z.object({
  source: z.enum(['grid', 'csv']),
  rows: z.array(gridRow),
  csvText: z.string(),
  ...fitInput.pick({ voltageUnit: true, displacementUnit: true, model: true }).shape,
});

/** Field values of the fit form. */
export type FitFormValues = z.input<typeof fitForm>;

/** The fit page's react-hook-form handle. */
export type FitFormApi = UseFormReturn<FitFormValues, unknown, z.output<typeof fitForm>>;

/** One grid row as typed. */
export type GridRow = z.infer<typeof gridRow>;

const row = (volts: number, displacement: number, sweep: GridRow['sweep']): GridRow => ({
  volts: String(volts),
  displacement: String(displacement),
  sweep,
});

/** Illustrative up and down sweeps of a bender (made-up numbers, about 100 nm/V) to show the page working. */
export const exampleRows: GridRow[] = [
  ...[
    [0, 0],
    [2, 170],
    [4, 368],
    [6, 578],
    [8, 789],
    [10, 1004],
  ].map(([v, x]) => row(v, x, 'up')),
  ...[
    [10, 1004],
    [8, 838],
    [6, 636],
    [4, 421],
    [2, 214],
    [0, 12],
  ].map(([v, x]) => row(v, x, 'down')),
];

/** Empty rows for a fresh grid. */
export const blankRows = (n: number): GridRow[] => Array.from({ length: n }, () => ({ volts: '', displacement: '', sweep: '' }));

/** What the shared gain-fit calculator returns (the API's answer too). */
export type FitCalculation = CalculatorResult<typeof fitCalculator>;

/** A fit ready to show: the shared result and the points in V and nm for the plot. */
export interface FitPreview {
  fit: FitCalculation;
  /** The parsed input the fit was computed from (the run "record as a run" stores). */
  input: z.output<typeof fitInput>;
  plotPoints: CalibrationChartPoint[];
}

/** Runs the shared schema and fit on the good rows; a sentence instead when it cannot. */
export function previewFit(
  checked: CheckedRows,
  settings: Pick<FitFormValues, 'voltageUnit' | 'displacementUnit' | 'model'>,
): { ok: true; preview: FitPreview } | { ok: false; message: string } {
  const parsed = fitInput.safeParse({ ...settings, points: checked.points }, { error: friendlyError });
  if (!parsed.success) {
    const tooFew = parsed.error.issues.some((i) => i.path[0] === 'points' && i.code === 'too_small');
    return {
      ok: false,
      message: tooFew
        ? `A fit needs at least 3 good points; there ${checked.points.length === 1 ? 'is' : 'are'} ${checked.points.length}.`
        : parsed.error.issues[0].message,
    };
  }
  try {
    const fit = fitCalculator.compute(parsed.data);
    const { voltageUnit, displacementUnit } = parsed.data;
    const plotPoints = parsed.data.points.map((p) => ({
      volts: toVolts(p.volts, voltageUnit),
      displacementNm: toNm(p.displacement, displacementUnit),
      sweep: p.sweep,
    }));
    return { ok: true, preview: { fit, input: parsed.data, plotPoints } };
  } catch (err) {
    return { ok: false, message: refusalMessage(err) };
  }
}
