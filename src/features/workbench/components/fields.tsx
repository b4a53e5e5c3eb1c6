import { useId, type ReactNode } from 'react';
import type { FieldValues, Path, UseFormRegisterReturn, UseFormReturn } from 'react-hook-form';
import { InputField, SelectField } from '@/components/ui/form-bits.tsx';
import { parseNumber } from '@/lib/csv/number-text.ts';

/**
 * Empty input → undefined (so optional fields stay absent), anything else → a number for zod to judge, read by the one
 * number reader (a decimal point or comma, a true minus sign, e notation). The inputs are text with a decimal keypad,
 * because a browser's number input drops "4,5" typed under an English locale.
 */
export const asNumber = {
  setValueAs: (v: unknown) => (v === '' || v === null || v === undefined ? undefined : typeof v === 'number' ? v : parseNumber(String(v))),
};

interface Chrome {
  label: ReactNode;
  unit?: string;
  hint?: ReactNode;
  optional?: boolean;
}

/** A numeric input of the form kit: decimal keypad on phones, monospace digits, the unit in its label. */
export function NumberInput({
  registration,
  error,
  step = 'any',
  ...chrome
}: Chrome & { registration: UseFormRegisterReturn; error?: string; step?: string }) {
  return (
    <InputField id={useId()} error={error} type="text" inputMode="decimal" step={step} className="num" {...chrome} {...registration} />
  );
}

/** A select of the form kit with its label; options as value/label pairs. */
export function SelectInput({
  registration,
  error,
  options,
  ...chrome
}: Chrome & { registration: UseFormRegisterReturn; error?: string; options: readonly { value: string; label: string }[] }) {
  return <SelectField id={useId()} error={error} options={options} {...chrome} {...registration} />;
}

/** The error message react-hook-form holds for a field (subscribes to formState.errors). */
export function errorOf<T extends FieldValues, O>(form: UseFormReturn<T, unknown, O>, name: Path<T>): string | undefined {
  return form.getFieldState(name, form.formState).error?.message;
}

/** A NumberInput bound to one field of a form: registers it as a number and shows its error. */
export function FormNumber<T extends FieldValues, O>({
  form,
  name,
  ...chrome
}: Chrome & { form: UseFormReturn<T, unknown, O>; name: Path<T>; step?: string }) {
  return <NumberInput registration={form.register(name, asNumber)} error={errorOf(form, name)} {...chrome} />;
}

/** A SelectInput bound to one field of a form. */
export function FormSelect<T extends FieldValues, O>({
  form,
  name,
  ...rest
}: Chrome & { form: UseFormReturn<T, unknown, O>; name: Path<T>; options: readonly { value: string; label: string }[] }) {
  return <SelectInput registration={form.register(name)} error={errorOf(form, name)} {...rest} />;
}

/** A titled group of fields; two columns from small screens up, or always for short `pairs` (min/max, x/y). */
export function FieldGroup({ legend, children, note, pairs }: { legend: string; children: ReactNode; note?: ReactNode; pairs?: boolean }) {
  return (
    <fieldset className="rounded-lg border border-rule bg-white p-4">
      <legend className="px-1 text-sm font-semibold">{legend}</legend>
      <div className={`grid gap-3 ${pairs ? 'grid-cols-2' : 'sm:grid-cols-2'}`}>{children}</div>
      {note && <div className="mt-3 text-xs text-ink-soft">{note}</div>}
    </fieldset>
  );
}

/** A small set of exclusive choices as labelled radio buttons, drawn as a segmented control. */
export function FormRadios<T extends FieldValues, O>({
  form,
  name,
  legend,
  options,
}: {
  form: UseFormReturn<T, unknown, O>;
  name: Path<T>;
  legend: string;
  options: readonly { value: string; label: string }[];
}) {
  const id = useId();
  return (
    <fieldset className="min-w-0">
      <legend className="text-sm font-medium">{legend}</legend>
      <div className="mt-1 inline-flex flex-wrap rounded-md border border-rule bg-white p-0.5">
        {options.map((o) => (
          <label key={o.value} htmlFor={`${id}-${o.value}`} className="relative cursor-pointer">
            <input
              id={`${id}-${o.value}`}
              type="radio"
              value={o.value}
              className="peer absolute inset-0 h-full w-full cursor-pointer opacity-0"
              {...form.register(name)}
            />
            <span
              className={
                'block rounded px-3 py-1 text-sm peer-checked:bg-ink peer-checked:text-paper peer-focus-visible:outline-2 ' +
                'peer-focus-visible:outline-offset-1 peer-focus-visible:outline-copper'
              }
            >
              {o.label}
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}
