import { useForm, useWatch } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { PART_CATEGORIES, partCategoryLabels, proposePartInput, type ProposePartInput } from '@shared/schemas/part.ts';
import { materialKeys } from '@shared/workbench/materials.ts';
import { Button } from '@/components/ui/button.tsx';
import { applyServerErrors, describe, Field, FormError, inputClass, numberOrNull, textOrUndefined } from '@/components/ui/form-bits.tsx';
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
        <Field id="part-category" label="Category" error={errors.category && 'Pick a category.'}>
          <select
            id="part-category"
            className={inputClass}
            {...describe('part-category', errors.category?.message)}
            {...register('category', { setValueAs: (v) => v || undefined })}
          >
            <option value="">Choose…</option>
            {PART_CATEGORIES.map((c) => (
              <option key={c} value={c}>
                {partCategoryLabels[c]}
              </option>
            ))}
          </select>
        </Field>
        <Field
          id="part-name"
          label="Name"
          hint="What makers call it, with its main size: “Brass buzzer disc 27 mm”."
          error={errors.name && 'Give it a name of 3 to 160 characters.'}
        >
          <input
            id="part-name"
            className={inputClass}
            autoComplete="off"
            {...describe('part-name', errors.name?.message, true)}
            {...register('name')}
          />
        </Field>
      </div>
      <Field
        id="part-source"
        label="Salvaged from"
        hint="Where people find it: devices, makes, years."
        error={errors.salvageSource?.message}
      >
        <input
          id="part-source"
          className={inputClass}
          {...describe('part-source', errors.salvageSource?.message, true)}
          {...register('salvageSource', text)}
        />
      </Field>
      <fieldset className="rounded-lg border border-rule bg-white p-4">
        <legend className="px-1 text-sm font-semibold">Geometry</legend>
        {geometry.length === 0 ? (
          <p className="text-sm text-ink-soft">Choose a category to see which sizes to give.</p>
        ) : (
          <div className="grid gap-4 sm:grid-cols-3">
            {geometry.map((g) => {
              const id = `part-${g.key}`;
              const error = errors[g.key] && (g.unit === 'mm' ? 'A positive size in mm.' : 'A whole number of layers.');
              return (
                <Field key={g.key} id={id} label={`${g.label} (${g.unit === 'mm' ? 'mm' : 'count'})`} hint={g.hint} error={error}>
                  <input
                    id={id}
                    type="number"
                    inputMode="decimal"
                    min={0}
                    step={g.unit === 'mm' ? 'any' : 1}
                    className={`${inputClass} num`}
                    {...describe(id, error, !!g.hint)}
                    {...register(g.key, num)}
                  />
                </Field>
              );
            })}
          </div>
        )}
      </fieldset>
      <div className="grid gap-4 sm:grid-cols-3">
        <Field id="part-material" label="Material family" hint="Only if you know it; a guess goes in the notes.">
          <select
            id="part-material"
            className={inputClass}
            {...describe('part-material', undefined, true)}
            {...register('material', { setValueAs: (v) => (v === '' ? undefined : v) })}
          >
            <option value="">Unknown</option>
            {materialKeys.map((m) => (
              <option key={m} value={m}>
                {m}
              </option>
            ))}
          </select>
        </Field>
        <Field id="part-capacitance" label="Capacitance (nF)" error={errors.capacitanceNf && 'A positive value in nF.'}>
          <input
            id="part-capacitance"
            type="number"
            inputMode="decimal"
            min={0}
            step="any"
            className={`${inputClass} num`}
            {...describe('part-capacitance', errors.capacitanceNf?.message)}
            {...register('capacitanceNf', num)}
          />
        </Field>
        <Field
          id="part-volts"
          label="Safe voltage (V)"
          hint="Rated, or what you have driven it at safely."
          error={errors.safeVolts && 'A positive value in V.'}
        >
          <input
            id="part-volts"
            type="number"
            inputMode="decimal"
            min={0}
            step="any"
            className={`${inputClass} num`}
            {...describe('part-volts', errors.safeVolts?.message, true)}
            {...register('safeVolts', num)}
          />
        </Field>
      </div>
      <Field
        id="part-notes"
        label="Notes"
        hint="How to free it, quirks, how you measured the sizes. Markdown works."
        error={errors.notes?.message}
      >
        <textarea
          id="part-notes"
          rows={5}
          className={inputClass}
          {...describe('part-notes', errors.notes?.message, true)}
          {...register('notes', text)}
        />
      </Field>
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
