import { useEffect, useRef, useState } from 'react';
import { convertDisplacement, fromVolts, toVolts, type DisplacementUnit, type VoltageUnit } from '@shared/units.ts';
import { useWatch, type FieldValues, type Path, type PathValue, type UseFormReturn } from 'react-hook-form';

/** Ten significant figures: enough to keep a reading exact, few enough to read (0.1 µm → 100 nm, not 100.00000000001). */
export const tidy = (v: number) => Number(v.toPrecision(10));

/**
 * When the unit picker `unitName` changes, converts the numbers in `fields` from the old unit to the
 * new one, so a typed reading keeps its physical value instead of being relabelled.
 */
export function useUnitConversion<T extends FieldValues, U extends string>(
  form: UseFormReturn<T, unknown, unknown>,
  unitName: Path<T>,
  fields: readonly Path<T>[],
  convert: (value: number, from: U, to: U) => number,
): void {
  const unit = useWatch({ control: form.control, name: unitName }) as U | undefined;
  const previous = useRef(unit);
  useEffect(() => {
    const from = previous.current;
    previous.current = unit;
    if (!from || !unit || from === unit) return;
    for (const name of fields) {
      const value: unknown = form.getValues(name);
      if (typeof value === 'number' && Number.isFinite(value)) {
        form.setValue(name, tidy(convert(value, from, unit)) as PathValue<T, Path<T>>, { shouldValidate: true });
      } else if (typeof value === 'string' && value.trim() !== '' && Number.isFinite(Number(value))) {
        form.setValue(name, String(tidy(convert(Number(value), from, unit))) as PathValue<T, Path<T>>, { shouldValidate: true });
      }
    }
  }, [unit, form, fields, convert]);
}

/** A typed number in a text field converted, or the text left alone when it is empty or not a plain number. */
export const convertTyped = (text: string, convert: (v: number) => number) => {
  const t = text.trim();
  return t !== '' && Number.isFinite(Number(t)) ? String(tidy(convert(Number(t)))) : text;
};

/**
 * For numbers that are not rewritten (pasted text): when the unit picker `unitName` changes, ask
 * whether the numbers really are in the new unit. `pending` holds the old unit until answered;
 * `undo` puts it back.
 */
export function useUnitChangeQuestion<T extends FieldValues>(form: UseFormReturn<T, unknown, unknown>, unitName: Path<T>, enabled = true) {
  const unit = useWatch({ control: form.control, name: unitName }) as string | undefined;
  const previous = useRef(unit);
  const reverting = useRef<string | null>(null);
  const [pending, setPending] = useState<string | null>(null);
  useEffect(() => {
    const from = previous.current;
    previous.current = unit;
    if (reverting.current !== null && unit === reverting.current) {
      reverting.current = null; // our own undo, not a new change to ask about
      return;
    }
    if (enabled && from && unit && from !== unit) setPending(from);
  }, [unit, enabled]);
  useEffect(() => {
    if (!enabled) setPending(null);
  }, [enabled]);
  return {
    pending,
    keep: () => setPending(null),
    undo: () => {
      if (pending === null) return;
      reverting.current = pending;
      form.setValue(unitName, pending as PathValue<T, Path<T>>, { shouldValidate: true });
      setPending(null);
    },
  };
}

/** Typed calibration points (text cells) converted from one pair of units to another; unreadable cells stay as typed. */
export function convertTypedPoints<R extends { volts: string; displacement: string }>(
  rows: readonly R[],
  from: { voltageUnit: VoltageUnit; displacementUnit: DisplacementUnit },
  to: { voltageUnit: VoltageUnit; displacementUnit: DisplacementUnit },
): R[] {
  return rows.map((r) => ({
    ...r,
    displacement:
      from.displacementUnit === to.displacementUnit
        ? r.displacement
        : convertTyped(r.displacement, (v) => convertDisplacement(v, from.displacementUnit, to.displacementUnit)),
    volts:
      from.voltageUnit === to.voltageUnit ? r.volts : convertTyped(r.volts, (v) => fromVolts(toVolts(v, from.voltageUnit), to.voltageUnit)),
  }));
}
