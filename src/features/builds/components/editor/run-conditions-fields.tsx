import { useFormContext } from 'react-hook-form';
import type { PointsRunInput } from '@shared/schemas/run.ts';
import { describe, Field, fieldMessage, inputClass } from '@/components/ui/form-bits.tsx';
import type { RunFormValues } from './run-form-schema.ts';

/** Preload, temperature and notes: what a reader needs to compare this run with others. */
export function RunConditionsFields({ idPrefix }: { idPrefix: string }) {
  const {
    register,
    formState: { errors },
  } = useFormContext<RunFormValues, unknown, PointsRunInput>();
  const id = (f: string) => `${idPrefix}-${f}`;
  const tempError = fieldMessage(errors.conditions?.temperatureC, 'Enter a temperature in °C.');
  return (
    <fieldset className="grid gap-3 sm:grid-cols-[2fr_1fr]">
      <legend className="mb-2 text-sm font-semibold">Conditions (optional)</legend>
      <Field label="Preload" id={id('preload')} error={errors.conditions?.preload?.message}>
        <input
          id={id('preload')}
          className={inputClass}
          placeholder="e.g. 20 N spring, clamped at 2 mm"
          {...register('conditions.preload')}
        />
      </Field>
      <Field label="Measured on" id={id('date')} error={errors.measuredOn?.message} hint="Leave empty for the day you save it.">
        <input
          id={id('date')}
          type="date"
          className={inputClass}
          {...describe(id('date'), errors.measuredOn?.message, true)}
          {...register('measuredOn')}
        />
      </Field>
      <Field label="Temperature (°C)" id={id('temp')} error={tempError}>
        <input
          id={id('temp')}
          inputMode="decimal"
          className={`${inputClass} num`}
          {...describe(id('temp'), tempError)}
          {...register('conditions.temperatureC')}
        />
      </Field>
      <Field label="Condition notes" id={id('cnotes')} error={errors.conditions?.notes?.message} className="sm:col-span-2">
        <input
          id={id('cnotes')}
          className={inputClass}
          placeholder="e.g. after 10 min warm-up, lid closed"
          {...register('conditions.notes')}
        />
      </Field>
      <Field label="Notes on this run" id={id('notes')} error={errors.notes?.message} className="sm:col-span-2">
        <textarea id={id('notes')} rows={2} className={inputClass} {...register('notes')} />
      </Field>
    </fieldset>
  );
}
