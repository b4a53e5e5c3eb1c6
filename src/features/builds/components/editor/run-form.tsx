import { FormProvider, useFieldArray, useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { PointsRunInput, RunDto } from '@shared/schemas/run.ts';
import { Button } from '@/components/ui/button.tsx';
import { useCreateRun } from '../../api/create-run.ts';
import { useUpdateRun } from '../../api/update-run.ts';
import { fieldMessage, FormError } from '@/components/ui/form-bits.tsx';
import { FitPreview } from './fit-preview.tsx';
import { PointsCsvImport } from './points-csv-import.tsx';
import { PointsGrid } from './points-grid.tsx';
import { RunConditionsFields } from './run-conditions-fields.tsx';
import { runForm, runFormDefaults, runFormValuesOf, type RunFormValues } from './run-form-schema.ts';
import { RunSetupFields } from './run-setup-fields.tsx';
import { applyServerErrors } from '@/components/ui/form-bits.tsx';
import { usePointsUnitConversion } from './use-points-unit-conversion.ts';

const FIELDS = ['method', 'voltageUnit', 'displacementUnit', 'model', 'drive', 'conditions', 'notes', 'measuredOn', 'points'] as const;

/** A new calibration run for one actuator, or a stored point run to correct: setup, conditions, points (typed or from CSV) and the live fit. */
export function RunForm({
  actuatorId,
  maxVolts,
  flagContext,
  run,
  onSaved,
  onCancel,
}: {
  actuatorId: number;
  maxVolts: number | null;
  flagContext?: { expectedGainNmPerV: number | null; partMedianNmPerV: number | null };
  /** The stored point run to correct (all its points: not a decimated series). */
  run?: RunDto;
  onSaved: (run: RunDto) => void;
  onCancel: () => void;
}) {
  const create = useCreateRun(actuatorId);
  const update = useUpdateRun(run?.id ?? 0);
  const form = useForm<RunFormValues, unknown, PointsRunInput>({
    resolver: zodResolver(runForm),
    defaultValues: run ? runFormValuesOf(run) : runFormDefaults(),
  });
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
      if (run) {
        const { kind: _kind, ...change } = values;
        onSaved(await update.mutateAsync(change));
      } else onSaved(await create.mutateAsync(values));
    } catch (err) {
      applyServerErrors(err, form.setError, FIELDS);
    }
  });

  return (
    <FormProvider {...form}>
      <form
        onSubmit={submit}
        noValidate
        aria-label={run ? 'Correct calibration run' : 'New calibration run'}
        className="space-y-4 rounded-md border border-copper/40 bg-white p-2 sm:p-3"
      >
        <h4 className="font-semibold">{run ? 'Correct this calibration run' : 'New calibration run'}</h4>
        {run?.status === 'accepted' && (
          <p className="text-sm text-ink-soft">
            This run is accepted: saving a correction takes it out of the part&apos;s figures until a moderator accepts it again.
          </p>
        )}
        <RunSetupFields idPrefix={idPrefix} />
        <fieldset className="space-y-3">
          <legend className="mb-2 text-sm font-semibold">Points</legend>
          <PointsCsvImport idPrefix={idPrefix} onPoints={(p) => points.replace(p)} />
          <PointsGrid fields={points.fields} array={points} />
          {pointsError && <p className="text-sm text-danger">{pointsError}</p>}
        </fieldset>
        <FitPreview maxVolts={maxVolts} flagContext={flagContext} />
        <RunConditionsFields idPrefix={idPrefix} />
        <FormError message={errors.root?.server?.message} />
        <p className="text-sm text-ink-soft">
          The stored fit is computed by Scanwright from your points; the run then waits for a moderator to accept it before it counts in the
          parts registry.
        </p>
        <div className="flex flex-wrap gap-2">
          <Button type="submit" disabled={isSubmitting}>
            {isSubmitting ? 'Saving…' : run ? 'Save the correction' : 'Save calibration run'}
          </Button>
          <Button variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        </div>
      </form>
    </FormProvider>
  );
}
