import { Suspense, type ReactNode } from 'react';

/** A labelled figure around a lazily loaded chart; the chart code arrives in its own chunk. */
export function ChartFrame({ label, caption, children }: { label: string; caption?: ReactNode; children: ReactNode }) {
  return (
    <figure aria-label={label} className="rounded-lg border border-rule bg-white p-3">
      <Suspense fallback={<div className="flex h-64 items-center justify-center text-sm text-ink-soft">Loading the plot…</div>}>
        {children}
      </Suspense>
      {caption && <figcaption className="mt-2 text-xs text-ink-soft">{caption}</figcaption>}
    </figure>
  );
}
