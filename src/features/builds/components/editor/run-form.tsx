import { FormProvider, useFieldArray, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { PointsRunInput, RunDto } from '@shared/schemas/run.ts';
import { Button } from '@/components/ui/button.tsx';
import { useCreateRun } from '../../api/create-run.ts';
import { fieldMessage, FormError } from '@/components/ui/form-bits.tsx';
import { FitPreview } from './fit-preview.tsx';
import { PointsCsvImport } from './points-csv-import.tsx';
import { PointsGrid } from './points-grid.tsx';
import { RunConditionsFields } from './run-conditions-fields.tsx';
import { runForm, runFormDefaults, type RunFormValues } from './run-form-schema.ts';
import { RunSetupFields } from './run-setup-fields.tsx';
import { applyServerErrors } from '@/components/ui/form-bits.tsx';
import { usePointsUnitConversion } from './use-points-unit-conversion.ts';

const FIELDS = ['method', 'voltageUnit', 'displacementUnit', 'model', 'drive', 'conditions', 'notes', 'points'] as const;

/** A new calibration run for one actuator: setup, conditions, points (typed or from CSV) and the live fit. */
export function RunForm({
  actuatorId,
  maxVolts,
  onSaved,
  onCancel,
}: {
  actuatorId: number;
  maxVolts: number | null;
  onSaved: (run: RunDto) => void;
  onCancel: () => void;
}) {
  const create = useCreateRun(actuatorId);
  const form = useForm<RunFormValues, unknown, PointsRunInput>({ resolver: zodResolver(runForm), defaultValues: runFormDefaults() });
  const points = useFieldArray({ control: form.control, name: 'points' });
  usePointsUnitConversion(form, points);
  const { errors, isSubmitting } = form.formState;
  const idPrefix = `run-${actuatorId}`;
  const pointsError = fieldMessage(
    errors.points?.root ?? (errors.points?.message ? errors.points : undefined),
    'A calibration run needs at least 3 points.',
  );

  const submit = form.handleSubmit(async (values) => {
    try {
      onSaved(await create.mutateAsync(values));
    } catch (err) {
      applyServerErrors(err, form.setError, FIELDS);
    }
  });

  return (
    <FormProvider {...form}>
      <form
        onSubmit={submit}
        noValidate
        aria-label="New calibration run"
        className="space-y-4 rounded-md border border-copper/40 bg-white p-2 sm:p-3"
      >
        <h4 className="font-semibold">New calibration run</h4>
        <RunSetupFields idPrefix={idPrefix} />
        <fieldset className="space-y-3">
          <legend className="mb-2 text-sm font-semibold">Points</legend>
          <PointsCsvImport idPrefix={idPrefix} onPoints={(p) => points.replace(p)} />
          <PointsGrid fields={points.fields} array={points} />
          {pointsError && <p className="text-sm text-danger">{pointsError}</p>}
        </fieldset>
        <FitPreview maxVolts={maxVolts} />
        <RunConditionsFields idPrefix={idPrefix} />
        <FormError message={errors.root?.server?.message} />
        <p className="text-sm text-ink-soft">
          The stored fit is computed by Scanwright from your points; the run then waits for a moderator to accept it before it counts in the
          parts registry.
        </p>
        <div className="flex flex-wrap gap-2">
          <Button type="submit" disabled={isSubmitting}>
            {isSubmitting ? 'Saving…' : 'Save calibration run'}
          </Button>
          <Button variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
