const tones: Record<string, string> = {
  GET: 'border-teal text-teal-dark',
  POST: 'border-copper text-copper-dark',
  PUT: 'border-amber text-ink',
  PATCH: 'border-amber text-ink',
  DELETE: 'border-danger text-danger',
};

/** The HTTP method as a small outlined label. */
export function MethodBadge({ method }: { method: string }) {
  return (
    <span
      className={`inline-block w-16 shrink-0 rounded border bg-white px-1.5 py-0.5 text-center font-mono text-xs font-semibold ${tones[method] ?? ''}`}
    >
      {method}
    </span>
  );
}
