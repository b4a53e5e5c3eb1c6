// The one form kit of the app: the input look, a labelled field with hint and error, the aria wiring,
// form-level errors, and how the server's field issues land on a react-hook-form form.
import { parseNumber } from '@/lib/csv/number-text.ts';
import type { ComponentProps, ReactNode } from 'react';
import type { FieldValues, Path, UseFormSetError } from 'react-hook-form';
import { ApiError } from '@/lib/api-client.ts';

/** Text inputs, selects and text areas of the app's forms (16 px text so phones do not zoom). */
export const inputClass =
  'w-full rounded-md border border-rule bg-white px-2.5 py-1.5 text-base text-ink aria-[invalid=true]:border-danger disabled:bg-paper-deep';

/** A labelled control with an optional hint and its error; the control carries `id={id}` and `{...describe(id, error, !!hint)}`. */
export function Field({
  id,
  label,
  unit,
  optional,
  hint,
  error,
  children,
  className = '',
}: {
  id: string;
  label: ReactNode;
  /** Shown after the label in brackets, e.g. "nm". */
  unit?: string;
  optional?: boolean;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
  className?: string;
}) {
  return (
    <div className={`min-w-0 ${className}`}>
      <label htmlFor={id} className="mb-1 block text-sm font-medium">
        {label}
        {unit && <span className="font-normal text-ink-soft"> ({unit})</span>}
        {optional && <span className="font-normal text-ink-soft"> · optional</span>}
      </label>
      {children}
      {hint && !error && (
        <p id={`${id}-hint`} className="mt-1 text-xs text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${id}-error`} className="mt-1 text-sm text-danger">
          {error}
        </p>
      )}
    </div>
  );
}

/** aria attributes tying a control to its Field's hint or error. */
export const describe = (id: string, error?: string, hint?: boolean) =>
  ({ 'aria-invalid': error ? true : undefined, 'aria-describedby': error ? `${id}-error` : hint ? `${id}-hint` : undefined }) as const;

/** What a Field shows around its control; `fieldClassName` styles the Field, `className` adds to the control's look. */
interface FieldChrome {
  id: string;
  label: ReactNode;
  unit?: string;
  optional?: boolean;
  hint?: ReactNode;
  error?: string;
  fieldClassName?: string;
  className?: string;
}

/** Splits a field component's props into the Field's and the control's (id, look, aria wiring, the rest). */
function splitField<P extends FieldChrome>({ id, label, unit, optional, hint, error, fieldClassName, className = '', ...rest }: P) {
  return {
    field: { id, label, unit, optional, hint, error, className: fieldClassName },
    control: { id, className: `${inputClass} ${className}`.trim(), ...describe(id, error, !!hint), ...rest },
  };
}

/** An input in its Field, tied to the hint or error (spread `register(…)` onto it, or pass value and onChange). */
export function InputField(props: FieldChrome & ComponentProps<'input'>) {
  const { field, control } = splitField(props);
  return (
    <Field {...field}>
      <input {...control} />
    </Field>
  );
}

/** One choice of a SelectField. */
export interface SelectOption {
  value: string | number;
  label: ReactNode;
}

/** A select in its Field, tied to the hint or error; its choices as `options` (after any children, e.g. a "Choose…" entry). */
export function SelectField({
  options = [],
  children,
  ...props
}: FieldChrome & ComponentProps<'select'> & { options?: readonly SelectOption[] }) {
  const { field, control } = splitField(props);
  return (
    <Field {...field}>
      <select {...control}>
        {children}
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    </Field>
  );
}

/** A text area in its Field, tied to the hint or error. */
export function TextAreaField(props: FieldChrome & ComponentProps<'textarea'>) {
  const { field, control } = splitField(props);
  return (
    <Field {...field}>
      <textarea {...control} />
    </Field>
  );
}

/** A form-level error: what the server said that belongs to no single field. */
export function FormError({ message }: { message?: string }) {
  if (!message) return null;
  return (
    <p role="alert" className="rounded-md border border-danger bg-danger/5 px-3 py-2 text-sm text-danger">
      {message}
    </p>
  );
}

/** The message to show for a field: our own words for schema refusals, the server's or a parse message as they are. */
export function fieldMessage(error: { type?: string | number; message?: string } | undefined, fallback: string): string | undefined {
  if (!error) return undefined;
  return error.type === 'server' || error.type === 'custom' ? (error.message ?? fallback) : fallback;
}

/** What to tell a person about a failed request, in one sentence. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) return error.message || 'That did not work; try again.';
  return error instanceof Error ? error.message : 'That did not work; try again.';
}

const isIssues = (d: unknown): d is { path: string; message: string }[] =>
  Array.isArray(d) && d.every((i) => i && typeof i === 'object' && typeof i.path === 'string' && typeof i.message === 'string');

/**
 * Put the server's field issues on the fields they name (`points.3.volts` too: a nested path matches
 * its first segment); whatever names no field of this form, or a failure without details, lands on
 * `root.server`.
 */
export function applyServerErrors<T extends FieldValues>(error: unknown, setError: UseFormSetError<T>, fields: readonly string[]): void {
  const issues = error instanceof ApiError && isIssues(error.details) ? error.details : [];
  const rest = issues.filter((i) => !i.path || !fields.includes(i.path.split('.')[0]!));
  for (const i of issues) if (!rest.includes(i)) setError(i.path as Path<T>, { type: 'server', message: i.message });
  if (issues.length === 0 || rest.length > 0) {
    setError('root.server' as Path<T>, {
      type: 'server',
      message: rest.length ? rest.map((i) => i.message).join(' ') : errorMessage(error),
    });
  }
}

/** An empty field becomes null (a number field the maker left blank); a decimal comma reads as a point. */
export const numberOrNull = (v: unknown) =>
  v === '' || v === null || v === undefined ? null : typeof v === 'number' ? v : parseNumber(String(v));
/** An empty text field becomes undefined, so the server stores nothing rather than "". */
export const textOrUndefined = (v: unknown) => (typeof v === 'string' && v.trim() === '' ? undefined : v);
