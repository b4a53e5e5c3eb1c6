import type { ReactNode } from 'react';

/** One anchored section of the build editor; `scroll-mt` keeps its heading clear of the sticky section links. */
export function EditorSection({ id, title, lead, children }: { id: string; title: string; lead?: ReactNode; children: ReactNode }) {
  return (
    <section id={id} aria-labelledby={`${id}-heading`} className="scroll-mt-20 rounded-lg border border-rule bg-white/60 p-3 sm:p-5">
      <h2 id={`${id}-heading`} className="text-lg font-semibold tracking-tight">
        {title}
      </h2>
      {lead && <p className="mt-1 text-sm text-ink-soft">{lead}</p>}
      <div className="mt-4">{children}</div>
    </section>
  );
}
