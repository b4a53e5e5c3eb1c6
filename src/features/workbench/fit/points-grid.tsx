import { useFieldArray } from 'react-hook-form';
import { Button } from '@/components/ui/button.tsx';
import type { RowProblem } from '@/lib/csv/split-csv.ts';
import { blankRows, exampleRows, type FitFormApi } from './fit-form.ts';

const cell =
  'num w-full min-w-[4.5rem] rounded-md border border-rule bg-white px-2 py-1 aria-[invalid=true]:border-danger aria-[invalid=true]:bg-danger/5';

/** Editable table of points: volts, displacement and sweep per row; rows can be added and removed. */
export function PointsGrid({
  form,
  voltsUnit,
  lengthUnit,
  problems,
}: {
  form: FitFormApi;
  voltsUnit: string;
  lengthUnit: string;
  problems: readonly RowProblem[];
}) {
  const { fields, append, remove, replace } = useFieldArray({ control: form.control, name: 'rows' });
  const bad = new Set(problems.map((p) => p.line));
  return (
    <div>
      <p className="mb-2 text-xs text-ink-soft">
        The grid opens with an illustrative run (made-up numbers); clear it and type your readings.
      </p>
      <div className="overflow-x-auto">
        <table className="w-full min-w-[20rem] text-left text-sm">
          <caption className="sr-only">Calibration points</caption>
          <thead className="text-xs text-ink-soft">
            <tr>
              <th scope="col" className="w-10 pb-1 font-medium">
                #
              </th>
              <th scope="col" className="pb-1 font-medium">
                Volts ({voltsUnit})
              </th>
              <th scope="col" className="pb-1 font-medium">
                Displacement ({lengthUnit})
              </th>
              <th scope="col" className="pb-1 font-medium">
                Sweep
              </th>
              <th scope="col" className="pb-1">
                <span className="sr-only">Remove</span>
              </th>
            </tr>
          </thead>
          <tbody>
            {fields.map((f, i) => (
              <tr key={f.id}>
                <td className="num pr-2 text-ink-soft">{i + 1}</td>
                <td className="py-0.5 pr-2">
                  <input
                    aria-label={`Row ${i + 1} volts`}
                    inputMode="decimal"
                    aria-invalid={bad.has(i + 1) || undefined}
                    className={cell}
                    {...form.register(`rows.${i}.volts`)}
                  />
                </td>
                <td className="py-0.5 pr-2">
                  <input
                    aria-label={`Row ${i + 1} displacement`}
                    inputMode="decimal"
                    aria-invalid={bad.has(i + 1) || undefined}
                    className={cell}
                    {...form.register(`rows.${i}.displacement`)}
                  />
                </td>
                <td className="py-0.5 pr-2">
                  <select
                    aria-label={`Row ${i + 1} sweep`}
                    className="rounded-md border border-rule bg-white px-1 py-1"
                    {...form.register(`rows.${i}.sweep`)}
                  >
                    <option value="">none</option>
                    <option value="up">up</option>
                    <option value="down">down</option>
                  </select>
                </td>
                <td className="py-0.5">
                  <Button variant="ghost" className="px-2" aria-label={`Remove row ${i + 1}`} onClick={() => remove(i)}>
                    ×
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
      <div className="mt-2 flex flex-wrap gap-2">
        <Button variant="secondary" onClick={() => append(blankRows(1))}>
          Add a row
        </Button>
        <Button variant="ghost" onClick={() => replace(blankRows(4))}>
          Clear the grid
        </Button>
        <Button variant="ghost" onClick={() => replace(exampleRows)}>
          Load the example
        </Button>
      </div>
    </div>
  );
}
