import { useState } from 'react';
import { Controller, useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { createActuatorInput, type ActuatorDto, type CreateActuatorInput } from '@shared/schemas/actuator.ts';
import { ACTUATOR_AXES, ACTUATOR_DRIVES, actuatorDriveLabels } from '@shared/schemas/actuator-vocabulary.ts';
import type { PartChoiceDto } from '@shared/schemas/part.ts';
import { Button } from '@/components/ui/button.tsx';
import {
  describe,
  Field,
  fieldMessage,
  FormError,
  inputClass,
  InputField,
  SelectField,
  TextAreaField,
} from '@/components/ui/form-bits.tsx';
import { HighVoltageCaution } from './high-voltage-caution.tsx';
import { parseOptionalNumber } from '@/lib/csv/number-text.ts';
import { PartPicker } from './part-picker.tsx';
import { applyServerErrors } from '@/components/ui/form-bits.tsx';

const FIELDS = ['partId', 'label', 'axis', 'drive', 'amplifier', 'maxVolts', 'notes'] as const;
const AXIS_LABELS = { X: 'X', Y: 'Y', Z: 'Z', XY: 'XY pair' } as const;

/** Which part, on which axis, driven how, through which amplifier, up to how many volts. */
export function ActuatorForm({
  idPrefix,
  actuator,
  submitLabel,
  onSave,
  onCancel,
}: {
  idPrefix: string;
  actuator?: ActuatorDto;
  submitLabel: string;
  onSave: (values: CreateActuatorInput) => Promise<unknown>;
  onCancel?: () => void;
}) {
  const [part, setPart] = useState<PartChoiceDto | undefined>(actuator?.part);
  const {
    register,
    handleSubmit,
    control,
    setError,
    formState: { errors, isSubmitting },
  } = useForm<z.input<typeof createActuatorInput>, unknown, CreateActuatorInput>({
    resolver: zodResolver(createActuatorInput),
    defaultValues: {
      partId: actuator?.part.id,
      label: actuator?.label ?? '',
      axis: actuator?.axis ?? 'Z',
      drive: actuator?.drive ?? 'single',
      amplifier: actuator?.amplifier ?? '',
      maxVolts: actuator?.maxVolts ?? undefined,
      notes: actuator?.notes ?? '',
    },
  });
  const maxVolts = useWatch({ control, name: 'maxVolts' });
  const id = (f: string) => `${idPrefix}-${f}`;
  const voltsError = fieldMessage(errors.maxVolts, 'Enter a positive number of volts (at most 5000), or leave it empty.');

  const submit = handleSubmit(async (values) => {
    try {
      await onSave(values);
    } catch (err) {
      applyServerErrors(err, setError, FIELDS);
    }
  });

  return (
    <form onSubmit={submit} noValidate className="space-y-3 rounded-md border border-rule bg-white p-3">
      <Controller
        control={control}
        name="partId"
        render={({ field, fieldState }) => (
          <PartPicker
            idPrefix={idPrefix}
            value={field.value}
            current={actuator?.part}
            error={fieldMessage(fieldState.error, 'Pick the part this actuator is made from.')}
            onChange={(p) => {
              field.onChange(p.id);
              setPart(p);
            }}
          />
        )}
      />
      <div className="grid gap-3 sm:grid-cols-3">
        <InputField
          label="Label (optional)"
          id={id('label')}
          error={errors.label?.message}
          fieldClassName="sm:col-span-3"
          placeholder="e.g. Z bender, X stack"
          {...register('label')}
        />
        <SelectField label="Axis" id={id('axis')} error={errors.axis?.message} {...register('axis')}>
          {ACTUATOR_AXES.map((a) => (
            <option key={a} value={a}>
              {AXIS_LABELS[a]}
            </option>
          ))}
        </SelectField>
        <SelectField label="Drive" id={id('drive')} error={errors.drive?.message} fieldClassName="sm:col-span-2" {...register('drive')}>
          {ACTUATOR_DRIVES.map((d) => (
            <option key={d} value={d}>
              {actuatorDriveLabels[d]}
            </option>
          ))}
        </SelectField>
        <InputField
          label="Amplifier (optional)"
          id={id('amp')}
          error={errors.amplifier?.message}
          fieldClassName="sm:col-span-2"
          placeholder="e.g. 0–150 V op-amp stage"
          {...register('amplifier')}
        />
        <Field label="Max volts (optional)" id={id('volts')} error={voltsError}>
          <div className="flex items-center gap-2">
            <input
              id={id('volts')}
              inputMode="decimal"
              className={`${inputClass} num`}
              {...describe(id('volts'), voltsError)}
              {...register('maxVolts', {
                setValueAs: (v: unknown) => (typeof v === 'number' ? v : parseOptionalNumber(v as string | undefined)),
              })}
            />
            <span className="text-sm text-ink-soft">V</span>
          </div>
        </Field>
      </div>
      <HighVoltageCaution maxVolts={typeof maxVolts === 'number' ? maxVolts : undefined} capacitanceNf={part?.capacitanceNf} />
      <TextAreaField label="Notes (optional)" id={id('notes')} error={errors.notes?.message} rows={2} {...register('notes')} />
      <FormError message={errors.root?.server?.message} />
      <div className="flex gap-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : submitLabel}
        </Button>
        {onCancel && (
          <Button variant="ghost" onClick={onCancel}>
            Cancel
          </Button>
        )}
      </div>
    </form>
  );
}
