import { useCallback, useId, useMemo, type ReactNode } from 'react';
import { useUnitConversion } from '@/hooks/use-unit-conversion.ts';
import type { FieldValues, Path, UseFormReturn } from 'react-hook-form';
import { describe, Field, inputClass } from '@/components/ui/form-bits.tsx';
import { asNumber, errorOf } from './fields.tsx';

/**
 * A number with its own unit picker beside it (e.g. capacitance in nF or µF); both controls labelled.
 * Units with a `factor` (to the SI unit) convert the typed number when the unit changes.
 */
export function FormQuantity<T extends FieldValues, O>({
  form,
  name,
  unitName,
  label,
  units,
  hint,
  optional,
}: {
  form: UseFormReturn<T, unknown, O>;
  name: Path<T>;
  unitName: Path<T>;
  label: string;
  units: readonly { value: string; label: string; factor?: number }[];
  hint?: ReactNode;
  optional?: boolean;
}) {
  const id = useId();
  const error = errorOf(form, name);
  const factors = useMemo(() => new Map(units.map((u) => [u.value, u.factor])), [units]);
  const convert = useCallback(
    (v: number, from: string, to: string) => {
      const a = factors.get(from);
      const b = factors.get(to);
      return a !== undefined && b !== undefined ? (v * a) / b : v;
    },
    [factors],
  );
  const fields = useMemo(() => [name], [name]);
  useUnitConversion(form as unknown as UseFormReturn<T, unknown, unknown>, unitName, fields, convert);
  return (
    <Field id={id} label={label} hint={hint} optional={optional} error={error}>
      <div className="flex gap-2">
        <input
          id={id}
          type="text"
          inputMode="decimal"
          step="any"
          {...describe(id, error, !!hint)}
          className={`num min-w-0 flex-1 ${inputClass}`}
          {...form.register(name, asNumber)}
        />
        <select
          aria-label={`${label}: unit`}
          className="w-24 shrink-0 rounded-md border border-rule bg-white px-2 py-1.5 text-base"
          {...form.register(unitName)}
        >
          {units.map((u) => (
            <option key={u.value} value={u.value}>
              {u.label}
            </option>
          ))}
        </select>
      </div>
    </Field>
  );
}
