import type { ReactNode } from 'react';

/** Shared look of text inputs, selects and text areas in the editor (16 px text so phones do not zoom). */
export const inputClass =
  'w-full rounded-md border border-rule bg-white px-2 py-1.5 text-base text-ink aria-[invalid=true]:border-danger disabled:bg-paper-deep';

/** A labelled control with an optional hint and its error; the control must carry `id={htmlFor}`. */
export function Field({
  label,
  htmlFor,
  hint,
  error,
  children,
  className = '',
}: {
  label: ReactNode;
  htmlFor: string;
  hint?: ReactNode;
  error?: string;
  children: ReactNode;
  className?: string;
}) {
  return (
    <div className={`min-w-0 ${className}`}>
      <label htmlFor={htmlFor} className="mb-1 block text-sm font-medium">
        {label}
      </label>
      {children}
      {hint && !error && (
        <p id={`${htmlFor}-hint`} className="mt-1 text-xs text-ink-soft">
          {hint}
        </p>
      )}
      {error && (
        <p id={`${htmlFor}-error`} className="mt-1 text-sm text-danger">
          {error}
        </p>
      )}
    </div>
  );
}

/** aria attributes that tie a control to its Field's hint or error. */
export function describedBy(id: string, error?: string, hint?: boolean) {
  return {
    'aria-invalid': error ? true : undefined,
    'aria-describedby': error ? `${id}-error` : hint ? `${id}-hint` : undefined,
  } as const;
}

/** A form-level error (what the server said that belongs to no single field). */
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
