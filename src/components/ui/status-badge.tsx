import type { ReactNode } from 'react';

/** How a state reads at a glance: neutral (draft), info (waiting), success, caution (needs the owner), danger. */
export type BadgeTone = 'neutral' | 'info' | 'success' | 'caution' | 'danger';

const tones: Record<BadgeTone, string> = {
  neutral: 'border-rule bg-paper-deep text-ink-soft',
  info: 'border-teal bg-white text-teal-dark',
  success: 'border-teal bg-teal text-white',
  caution: 'border-amber bg-amber/15 text-ink',
  danger: 'border-danger bg-white text-danger',
};

/** A small pill naming a review state; the words carry the meaning, the colour only helps. */
export function StatusBadge({ tone, children }: { tone: BadgeTone; children: ReactNode }) {
  return (
    <span className={`inline-flex items-center whitespace-nowrap rounded-full border px-2 py-0.5 text-xs font-medium ${tones[tone]}`}>
      {children}
    </span>
  );
}
