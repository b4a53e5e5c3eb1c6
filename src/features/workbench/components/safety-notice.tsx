import { Notice } from '@/components/ui/notice.tsx';
import type { Caution } from '@shared/workbench/safety.ts';

/** The cautions from shared/workbench/safety.ts, each with its source tag; nothing when empty. */
export function SafetyNotice({ cautions, title = 'High voltage' }: { cautions: readonly Caution[]; title?: string }) {
  if (cautions.length === 0) return null;
  return (
    <Notice tone="caution" title={title}>
      <ul className="list-disc space-y-1 pl-5">
        {cautions.map((c) => (
          <li key={c.id}>
            {c.text} <span className="text-xs text-ink-soft">{c.source}</span>
          </li>
        ))}
      </ul>
    </Notice>
  );
}
