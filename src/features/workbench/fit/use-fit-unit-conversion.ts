import { useEffect, useRef, useState } from 'react';
import { useWatch } from 'react-hook-form';
import { convertDisplacement, fromVolts, toVolts, type DisplacementUnit, type VoltageUnit } from '@shared/units.ts';
import { convertTyped as convertText } from '@/hooks/use-unit-conversion.ts';
import type { FitFormApi } from './fit-form.ts';

/**
 * Changing a unit picker converts the typed grid's numbers, so a reading keeps its physical value.
 * Pasted CSV text is not rewritten: the page asks instead (`pending`), and `undo` puts the old unit back.
 */
export function useFitUnitConversion(form: FitFormApi) {
  const [source, voltageUnit, displacementUnit] = useWatch({ control: form.control, name: ['source', 'voltageUnit', 'displacementUnit'] });
  const previous = useRef({ voltageUnit, displacementUnit });
  const [pending, setPending] = useState<{ field: 'voltageUnit' | 'displacementUnit'; from: string } | null>(null);
  useEffect(() => {
    const before = previous.current;
    previous.current = { voltageUnit, displacementUnit };
    const lengthChanged = before.displacementUnit !== displacementUnit && before.displacementUnit && displacementUnit;
    const voltsChanged = before.voltageUnit !== voltageUnit && before.voltageUnit && voltageUnit;
    if (!lengthChanged && !voltsChanged) return;
    if (source === 'csv') {
      setPending(
        lengthChanged ? { field: 'displacementUnit', from: before.displacementUnit! } : { field: 'voltageUnit', from: before.voltageUnit! },
      );
      return;
    }
    const rows = form.getValues('rows').map((r) => ({
      ...r,
      displacement: lengthChanged
        ? convertText(r.displacement, (v) =>
            convertDisplacement(v, before.displacementUnit as DisplacementUnit, displacementUnit as DisplacementUnit),
          )
        : r.displacement,
      volts: voltsChanged
        ? convertText(r.volts, (v) => fromVolts(toVolts(v, before.voltageUnit as VoltageUnit), voltageUnit as VoltageUnit))
        : r.volts,
    }));
    form.setValue('rows', rows, { shouldValidate: true });
  }, [source, voltageUnit, displacementUnit, form]);
  return {
    pending,
    keep: () => setPending(null),
    undo: () => {
      if (!pending) return;
      form.setValue(pending.field, pending.from as never);
      setPending(null);
    },
  };
}
