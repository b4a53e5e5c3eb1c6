import { useEffect, useRef } from 'react';
import { useWatch, type UseFieldArrayReturn, type UseFormReturn } from 'react-hook-form';
import type { CreateRunInput } from '@shared/schemas/run.ts';
import { convertDisplacement, fromVolts, toVolts, type DisplacementUnit, type VoltageUnit } from '@shared/units.ts';
import { convertTyped } from '@/hooks/use-unit-conversion.ts';
import type { RunFormValues } from './run-form-schema.ts';

/** Changing the run's voltage or displacement unit converts the typed points, so each keeps its physical value. */
export function usePointsUnitConversion(
  form: UseFormReturn<RunFormValues, unknown, CreateRunInput>,
  points: UseFieldArrayReturn<RunFormValues, 'points'>,
) {
  const [voltageUnit, displacementUnit] = useWatch({ control: form.control, name: ['voltageUnit', 'displacementUnit'] });
  const previous = useRef({ voltageUnit, displacementUnit });
  useEffect(() => {
    const before = previous.current;
    previous.current = { voltageUnit, displacementUnit };
    const lengthChanged = before.displacementUnit !== displacementUnit;
    const voltsChanged = before.voltageUnit !== voltageUnit;
    if (!lengthChanged && !voltsChanged) return;
    points.replace(
      form.getValues('points').map((p) => ({
        ...p,
        displacement: lengthChanged
          ? convertTyped(p.displacement, (v) =>
              convertDisplacement(v, before.displacementUnit as DisplacementUnit, displacementUnit as DisplacementUnit),
            )
          : p.displacement,
        volts: voltsChanged
          ? convertTyped(p.volts, (v) => fromVolts(toVolts(v, before.voltageUnit as VoltageUnit), voltageUnit as VoltageUnit))
          : p.volts,
      })),
    );
  }, [voltageUnit, displacementUnit, form, points]);
}
