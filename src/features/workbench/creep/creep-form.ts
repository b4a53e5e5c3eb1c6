import { z } from 'zod';
import { creepInput } from '@shared/schemas/workbench.ts';
import { creepCalculator } from '@shared/workbench/calculators/creep-calculator.ts';
import { displacementUnits, toNm } from '@shared/units.ts';
import { friendlyError, refusalMessage } from '../form/error-map.ts';
import { readNumericColumns, type RowProblem } from '@/lib/csv/split-csv.ts';

/** The creep form: the record as CSV text, its displacement unit, and a time to project to. */
export const creepForm = z.object({
  text: z.string(),
  unit: z.enum(displacementUnits),
  projectToS: z.number().positive().optional(),
});

/** Field values of the creep form. */
export type CreepFormValues = z.input<typeof creepForm>;

/** An illustrative step-and-hold record (made-up numbers, γ about 0.015). */
export const exampleRecord = 'time_s,displacement\n0.1,1000\n0.3,1007\n1,1015\n3,1022\n10,1031\n30,1037\n100,1046\n300,1052\n';

/** Reads the record, fits the creep law with the shared code, and projects it; a sentence when it cannot. */
export function previewCreep(text: string, unit: CreepFormValues['unit'], projectToS: number | undefined) {
  const { rows, problems } = readNumericColumns(text, ['time', 'displacement']);
  const samples = rows.map((r) => ({ timeS: r.values[0], displacementNm: toNm(r.values[1], unit) }));
  const parsed = creepInput.safeParse({ samples, projectToS }, { error: friendlyError });
  const base = { used: samples.length, problems: problems as RowProblem[] };
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    const message =
      issue.path.length > 2
        ? `Line ${rows[Number(issue.path[1])]?.line}: time must be more than 0.`
        : 'A creep fit needs at least 3 good samples.';
    return { ...base, ok: false as const, message };
  }
  try {
    const fit = creepCalculator.compute(parsed.data);
    return { ...base, ok: true as const, fit, samples: parsed.data.samples, curve: fit.curve, projections: fit.projections };
  } catch (err) {
    return { ...base, ok: false as const, message: refusalMessage(err) };
  }
}
