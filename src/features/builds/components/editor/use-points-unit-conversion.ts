import { useEffect, useRef } from 'react';
import { useWatch, type UseFieldArrayReturn, type UseFormReturn } from 'react-hook-form';
import type { PointsRunInput } from '@shared/schemas/run.ts';
import type { DisplacementUnit, VoltageUnit } from '@shared/units.ts';
import { convertTypedPoints } from '@/hooks/use-unit-conversion.ts';
import type { RunFormValues } from './run-form-schema.ts';

/** Changing the run's voltage or displacement unit converts the typed points, so each keeps its physical value. */
export function usePointsUnitConversion(
  form: UseFormReturn<RunFormValues, unknown, PointsRunInput>,
  points: UseFieldArrayReturn<RunFormValues, 'points'>,
) {
  const [voltageUnit, displacementUnit] = useWatch({ control: form.control, name: ['voltageUnit', 'displacementUnit'] });
  const previous = useRef({ voltageUnit, displacementUnit });
  useEffect(() => {
    const before = previous.current;
    previous.current = { voltageUnit, displacementUnit };
    if (before.voltageUnit === voltageUnit && before.displacementUnit === displacementUnit) return;
    const units = (u: typeof before) => ({
      voltageUnit: u.voltageUnit as VoltageUnit,
      displacementUnit: u.displacementUnit as DisplacementUnit,
    });
    points.replace(convertTypedPoints(form.getValues('points'), units(before), units({ voltageUnit, displacementUnit })));
  }, [voltageUnit, displacementUnit, form, points]);
}
