import { useFormContext, useWatch } from 'react-hook-form';
import type { PointsRunInput } from '@shared/schemas/run.ts';
import { RUN_METHODS, runMethodLabels } from '@shared/schemas/run-vocabulary.ts';
import { displacementUnitLabels, displacementUnits, voltageUnitLabels, voltageUnits } from '@shared/units.ts';
import { describe, Field, fieldMessage, inputClass } from '@/components/ui/form-bits.tsx';
import type { RunFormValues } from './run-form-schema.ts';

/** How the run was measured and driven, the units the points are in, and the fit model. */
export function RunSetupFields({ idPrefix }: { idPrefix: string }) {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<RunFormValues, unknown, PointsRunInput>();
  const driveKind = useWatch({ control, name: 'drive.kind' });
  const id = (f: string) => `${idPrefix}-${f}`;
  const methodError = fieldMessage(errors.method, 'Pick how you measured the displacement.');
  const freqError = fieldMessage(errors.drive?.frequencyHz, 'Enter the frequency in Hz (more than 0).');
  const ampError = fieldMessage(errors.drive?.amplitudeV, 'Enter the amplitude in volts (more than 0).');

  return (
    <div className="grid gap-3 sm:grid-cols-2">
      <Field label="Method" id={id('method')} error={methodError}>
        <select id={id('method')} className={inputClass} {...describe(id('method'), methodError)} {...register('method')}>
          <option value="">Choose…</option>
          {RUN_METHODS.map((m) => (
            <option key={m} value={m}>
              {runMethodLabels[m]}
            </option>
          ))}
        </select>
      </Field>
      <Field label="Drive signal" id={id('drive')}>
        <select id={id('drive')} className={inputClass} {...register('drive.kind')}>
          <option value="dc-steps">DC steps</option>
          <option value="sine">Sine</option>
        </select>
      </Field>
      {driveKind === 'sine' && (
        <>
          <Field label="Frequency (Hz)" id={id('freq')} error={freqError}>
            <input
              id={id('freq')}
              inputMode="decimal"
              className={`${inputClass} num`}
              {...describe(id('freq'), freqError)}
              {...register('drive.frequencyHz')}
            />
          </Field>
          <Field label="Amplitude (V)" id={id('amp')} error={ampError}>
            <input
              id={id('amp')}
              inputMode="decimal"
              className={`${inputClass} num`}
              {...describe(id('amp'), ampError)}
              {...register('drive.amplitudeV')}
            />
          </Field>
        </>
      )}
      <div className="grid grid-cols-2 gap-3">
        <Field label="Drive unit" id={id('vunit')}>
          <select id={id('vunit')} className={inputClass} {...register('voltageUnit')}>
            {voltageUnits.map((u) => (
              <option key={u} value={u}>
                {voltageUnitLabels[u]}
              </option>
            ))}
          </select>
        </Field>
        <Field label="Displacement unit" id={id('dunit')}>
          <select id={id('dunit')} className={inputClass} {...register('displacementUnit')}>
            {displacementUnits.map((u) => (
              <option key={u} value={u}>
                {displacementUnitLabels[u]}
              </option>
            ))}
          </select>
        </Field>
      </div>
      <Field label="Fit model" id={id('model')}>
        <select id={id('model')} className={inputClass} {...register('model')}>
          <option value="intercept">Line with intercept</option>
          <option value="origin">Line through the origin</option>
        </select>
      </Field>
    </div>
  );
}
