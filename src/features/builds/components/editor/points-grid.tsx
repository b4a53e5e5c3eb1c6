import { useState } from 'react';
import { useFormContext, useWatch, type FieldArrayWithId, type UseFieldArrayReturn } from 'react-hook-form';
import type { PointsRunInput } from '@shared/schemas/run.ts';
import { displacementUnitLabels, voltageUnitLabels, type DisplacementUnit, type VoltageUnit } from '@shared/units.ts';
import { Button } from '@/components/ui/button.tsx';
import { blankPoint, type RunFormValues } from './run-form-schema.ts';

const SHOWN = 100;
const cell = 'w-full min-w-0 rounded border border-rule bg-white px-1.5 py-1 text-base sm:text-sm aria-[invalid=true]:border-danger';

/** The points as a grid: volts, displacement, sweep; rows can be added and removed. Long imports show the first 100 until asked. */
export function PointsGrid({
  fields,
  array,
}: {
  fields: FieldArrayWithId<RunFormValues, 'points'>[];
  array: UseFieldArrayReturn<RunFormValues, 'points'>;
}) {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<RunFormValues, unknown, PointsRunInput>();
  const [vUnit, dUnit] = useWatch({ control, name: ['voltageUnit', 'displacementUnit'] });
  const [showAll, setShowAll] = useState(false);
  const shown = showAll ? fields : fields.slice(0, SHOWN);
  const vLabel = voltageUnitLabels[vUnit as VoltageUnit];
  const dLabel = displacementUnitLabels[dUnit as DisplacementUnit];
  const rowError = (i: number) => errors.points?.[i]?.volts?.message ?? errors.points?.[i]?.displacement?.message;

  return (
    <div className="max-w-xl">
      <div
        aria-hidden="true"
        className="mb-1 grid grid-cols-[1.75rem_1fr_1fr_4.75rem_2rem] items-end gap-1 text-xs font-medium leading-tight text-ink-soft"
      >
        <span>#</span>
        <span>
          Drive <span className="whitespace-nowrap">({vLabel})</span>
        </span>
        <span>
          <span className="sm:hidden">Displ.</span>
          <span className="hidden sm:inline">Displacement</span> <span className="whitespace-nowrap">({dLabel})</span>
        </span>
        <span>Sweep</span>
      </div>
      <ol aria-label={`Calibration points, drive in ${vLabel}, displacement in ${dLabel}`} className="space-y-1">
        {shown.map((f, i) => (
          <li key={f.id} className="grid grid-cols-[1.75rem_1fr_1fr_4.75rem_2rem] items-center gap-1">
            <span className="num text-xs text-ink-soft">{i + 1}</span>
            <span>
              <input
                aria-label={`Drive, point ${i + 1}`}
                inputMode="decimal"
                className={`${cell} num`}
                aria-invalid={errors.points?.[i]?.volts ? true : undefined}
                {...register(`points.${i}.volts`)}
              />
            </span>
            <span>
              <input
                aria-label={`Displacement, point ${i + 1}`}
                inputMode="decimal"
                className={`${cell} num`}
                aria-invalid={errors.points?.[i]?.displacement ? true : undefined}
                {...register(`points.${i}.displacement`)}
              />
            </span>
            <span>
              <select aria-label={`Sweep, point ${i + 1}`} className={`${cell} px-0.5`} {...register(`points.${i}.sweep`)}>
                <option value="">none</option>
                <option value="up">up</option>
                <option value="down">down</option>
              </select>
            </span>
            <span>
              <button
                type="button"
                className="h-8 w-8 rounded text-lg leading-none text-ink-soft hover:bg-danger/10 hover:text-danger"
                aria-label={`Remove point ${i + 1}`}
                onClick={() => array.remove(i)}
              >
                ×
              </button>
            </span>
            {rowError(i) && (
              <p className="col-span-4 col-start-2 text-xs text-danger">
                Point {i + 1}: {rowError(i)}
              </p>
            )}
          </li>
        ))}
      </ol>
      <div className="mt-2 flex flex-wrap gap-2">
        <Button variant="secondary" onClick={() => array.append(blankPoint(), { focusName: `points.${fields.length}.volts` })}>
          Add a row
        </Button>
        {fields.length > SHOWN && !showAll && (
          <Button variant="ghost" onClick={() => setShowAll(true)}>
            Show all {fields.length} rows
          </Button>
        )}
        {fields.length > 0 && (
          <Button variant="ghost" onClick={() => array.replace([blankPoint()])} aria-label={`Clear all ${fields.length} points`}>
            Clear points
          </Button>
        )}
      </div>
    </div>
  );
}
