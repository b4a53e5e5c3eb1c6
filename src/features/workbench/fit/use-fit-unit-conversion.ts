import { useEffect, useRef } from 'react';
import { useWatch } from 'react-hook-form';
import type { DisplacementUnit, VoltageUnit } from '@shared/units.ts';
import { convertTypedPoints, useUnitChangeQuestion } from '@/hooks/use-unit-conversion.ts';
import type { FitFormApi, FitFormValues } from './fit-form.ts';

/**
 * Changing a unit picker converts the typed grid's numbers, so a reading keeps its physical value.
 * Pasted CSV text is not rewritten: the page asks instead (`pending`), and `undo` puts the old unit back.
 */
export function useFitUnitConversion(form: FitFormApi) {
  const [source, voltageUnit, displacementUnit] = useWatch({ control: form.control, name: ['source', 'voltageUnit', 'displacementUnit'] });
  const previous = useRef({ voltageUnit, displacementUnit });
  const asForm = form as unknown as Parameters<typeof useUnitChangeQuestion<FitFormValues>>[0];
  const lengthQuestion = useUnitChangeQuestion(asForm, 'displacementUnit', source === 'csv');
  const voltsQuestion = useUnitChangeQuestion(asForm, 'voltageUnit', source === 'csv');
  useEffect(() => {
    const before = previous.current;
    previous.current = { voltageUnit, displacementUnit };
    if (source === 'csv' || !before.voltageUnit || !before.displacementUnit || !voltageUnit || !displacementUnit) return;
    if (before.voltageUnit === voltageUnit && before.displacementUnit === displacementUnit) return;
    const units = (u: typeof before) => ({
      voltageUnit: u.voltageUnit as VoltageUnit,
      displacementUnit: u.displacementUnit as DisplacementUnit,
    });
    form.setValue('rows', convertTypedPoints(form.getValues('rows'), units(before), units({ voltageUnit, displacementUnit })), {
      shouldValidate: true,
    });
  }, [source, voltageUnit, displacementUnit, form]);
  const question = lengthQuestion.pending !== null ? lengthQuestion : voltsQuestion.pending !== null ? voltsQuestion : null;
  return {
    pending: question ? { field: question === lengthQuestion ? ('displacementUnit' as const) : ('voltageUnit' as const) } : null,
    keep: () => question?.keep(),
    undo: () => question?.undo(),
  };
}
