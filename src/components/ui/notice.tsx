import type { ReactNode } from 'react';

type Tone = 'info' | 'caution' | 'danger';
const tones: Record<Tone, string> = {
  info: 'border-teal/40 bg-teal/5 text-ink',
  caution: 'border-amber bg-amber/10 text-ink',
  danger: 'border-danger bg-danger/5 text-ink',
};

/** A boxed message: info (teal), caution (amber, e.g. high voltage) or danger (red). */
export function Notice({ tone = 'info', title, children }: { tone?: Tone; title?: string; children: ReactNode }) {
  return (
    <div role={tone === 'info' ? 'note' : 'alert'} className={`rounded-md border-l-4 border p-3 text-sm ${tones[tone]}`}>
      {title && <p className="mb-1 font-semibold">{title}</p>}
      <div className="space-y-1">{children}</div>
    </div>
  );
}
