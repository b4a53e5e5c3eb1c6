import type { ReactNode } from 'react';

/** The side panel's frame: what the item is, one line about it, its details, then the decision. */
export function PanelFrame({
  eyebrow,
  title,
  meta,
  children,
  decision,
}: {
  eyebrow: string;
  title: ReactNode;
  meta: ReactNode;
  children: ReactNode;
  decision: ReactNode;
}) {
  return (
    <article className="space-y-4">
      <header>
        <p className="text-xs font-medium uppercase tracking-wide text-teal-dark">{eyebrow}</p>
        <h2 className="text-xl font-semibold leading-snug">{title}</h2>
        <p className="mt-1 text-sm text-ink-soft">{meta}</p>
      </header>
      {children}
      <section aria-label="Decide">{decision}</section>
    </article>
  );
}

/** A small labelled block inside a panel. */
export function PanelSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section>
      <h3 className="mb-1.5 text-sm font-semibold uppercase tracking-wide text-ink-soft">{title}</h3>
      {children}
    </section>
  );
}

/** Label/value pairs laid out as a two-column list. */
export function Facts({ items }: { items: [string, ReactNode][] }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
      {items.map(([k, v]) => (
        <div key={k} className="contents">
          <dt className="text-ink-soft">{k}</dt>
          <dd className="min-w-0 break-words">{v}</dd>
        </div>
      ))}
    </dl>
  );
}
