import type { FieldValues, Path, PathValue, UseFormReturn } from 'react-hook-form';

/** A material preset in a picker: its value, label and source in words. */
export interface Preset {
  value: string;
  label: string;
  source: string;
}

/**
 * The `preset` select of a workbench form: choosing a preset fills the fields `fill` maps it to
 * (undefined values, e.g. for "Custom", leave the fields as typed). Returns the registration and
 * the chosen preset, for its source line.
 */
export function usePresetField<T extends FieldValues, P extends Preset>(
  form: UseFormReturn<T, unknown, unknown>,
  presets: readonly P[],
  fill: (preset: P) => Partial<Record<Path<T>, number | undefined>>,
) {
  const name = 'preset' as Path<T>;
  const registration = form.register(name, {
    onChange: (e: { target: { value: string } }) => {
      const p = presets.find((x) => x.value === e.target.value);
      if (!p) return;
      for (const [field, value] of Object.entries(fill(p)) as [Path<T>, number | undefined][]) {
        if (value !== undefined) form.setValue(field, value as PathValue<T, Path<T>>, { shouldValidate: true });
      }
    },
  });
  const preset = presets.find((p) => p.value === form.watch(name));
  return { registration, preset };
}
