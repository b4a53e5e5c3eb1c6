import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { proposePartInput, type ProposePartInput } from '@shared/schemas/part.ts';
import { PART_CATEGORIES, partCategoryLabels } from '@shared/schemas/part-vocabulary.ts';
import { materialKeys } from '@shared/workbench/materials.ts';
import { Button } from '@/components/ui/button.tsx';
import {
  applyServerErrors,
  FormError,
  InputField,
  SelectField,
  TextAreaField,
  numberOrNull,
  textOrUndefined,
} from '@/components/ui/form-bits.tsx';
import { GEOMETRY_KEYS, geometryFor } from './geometry-fields.ts';

const FIELDS = ['category', 'name', 'salvageSource', 'material', ...GEOMETRY_KEYS, 'capacitanceNf', 'safeVolts', 'notes'] as const;

/** The proposal form: category first, then the geometry that category needs (mm), electrical figures and notes. */
export function ProposePartForm({ onPropose }: { onPropose: (input: ProposePartInput) => Promise<unknown> }) {
  const {
    register,
    handleSubmit,
    setError,
    control,
    formState: { errors, isSubmitting },
  } = useForm<z.input<typeof proposePartInput>, unknown, ProposePartInput>({
    resolver: zodResolver(proposePartInput),
    defaultValues: { name: '', category: undefined },
  });
  const category = useWatch({ control, name: 'category' });
  const geometry = category ? geometryFor[category] : [];
  const num = { setValueAs: numberOrNull };
  const text = { setValueAs: textOrUndefined };

  const submit = handleSubmit(async (values) => {
    const used = new Set(geometry.map((g) => g.key));
    const input = { ...values };
    for (const k of GEOMETRY_KEYS) if (!used.has(k)) input[k] = null;
    try {
      await onPropose(input);
    } catch (err) {
      applyServerErrors(err, setError, FIELDS);
    }
  });

  return (
    <form onSubmit={submit} noValidate className="max-w-3xl space-y-5">
      <div className="grid gap-4 sm:grid-cols-[14rem_1fr]">
        <SelectField
          id="part-category"
          label="Category"
          error={errors.category && 'Pick a category.'}
          {...register('category', { setValueAs: (v) => v || undefined })}
        >
          <option value="">Choose…</option>
          {PART_CATEGORIES.map((c) => (
            <option key={c} value={c}>
              {partCategoryLabels[c]}
            </option>
          ))}
        </SelectField>
        <InputField
          id="part-name"
          label="Name"
          hint="What makers call it, with its main size: “Brass buzzer disc 27 mm”."
          error={errors.name && 'Give it a name of 3 to 160 characters.'}
          autoComplete="off"
          {...register('name')}
        />
      </div>
      <InputField
        id="part-source"
        label="Salvaged from"
        hint="Where people find it: devices, makes, years."
        error={errors.salvageSource?.message}
        {...register('salvageSource', text)}
      />
      <fieldset className="rounded-lg border border-rule bg-white p-4">
        <legend className="px-1 text-sm font-semibold">Geometry</legend>
        {geometry.length === 0 ? (
          <p className="text-sm text-ink-soft">Choose a category to see which sizes to give.</p>
        ) : (
          <div className="grid gap-4 sm:grid-cols-3">
            {geometry.map((g) => (
              <InputField
                key={g.key}
                id={`part-${g.key}`}
                label={`${g.label} (${g.unit === 'mm' ? 'mm' : 'count'})`}
                hint={g.hint}
                error={errors[g.key] && (g.unit === 'mm' ? 'A positive size in mm.' : 'A whole number of layers.')}
                type="text"
                inputMode="decimal"
                min={0}
                step={g.unit === 'mm' ? 'any' : 1}
                className="num"
                {...register(g.key, num)}
              />
            ))}
          </div>
        )}
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-3">
        <SelectField
          id="part-material"
          label="Material family"
          hint="Only if you know it; a guess goes in the notes."
          {...register('material', { setValueAs: (v) => (v === '' ? undefined : v) })}
        >
          <option value="">Unknown</option>
          {materialKeys.map((m) => (
            <option key={m} value={m}>
              {m}
            </option>
          ))}
        </SelectField>
        <InputField
          id="part-capacitance"
          label="Capacitance (nF)"
          error={errors.capacitanceNf && 'A positive value in nF.'}
          type="text"
          inputMode="decimal"
          min={0}
          step="any"
          className="num"
          {...register('capacitanceNf', num)}
        />
        <InputField
          id="part-volts"
          label="Safe voltage (V)"
          hint="Rated, or what you have driven it at safely."
          error={errors.safeVolts && 'A positive value in V.'}
          type="text"
          inputMode="decimal"
          min={0}
          step="any"
          className="num"
          {...register('safeVolts', num)}
        />
      </div>
      <TextAreaField
        id="part-notes"
        label="Notes"
        hint="How to free it, quirks, how you measured the sizes. Markdown works."
        error={errors.notes?.message}
        rows={5}
        {...register('notes', text)}
      />
      <FormError message={errors.root?.server?.message} />
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Sending…' : 'Propose this part'}
        </Button>
        <p className="text-sm text-ink-soft">A moderator checks every proposal before it is listed.</p>
      </div>
    </form>
  );
}
