import { Notice } from '@/components/ui/notice.tsx';
import type { Caution } from '@shared/workbench/safety.ts';

/**
 * The cautions a shared calculator or safety rule returned, each with its source in words, and the
 * levels that were crossed (IEC 61010-1); nothing when there are none.
 */
export function SafetyNotice({
  cautions,
  crossed = [],
  title,
}: {
  cautions: readonly Caution[];
  crossed?: readonly string[];
  title?: string;
}) {
  if (cautions.length === 0) return null;
  const heading = title ?? (crossed.length > 0 ? `Hazardous voltage: ${crossed.join('; ')}` : 'High voltage');
  return (
    <Notice tone="caution" title={heading}>
      <ul className="list-disc space-y-1 pl-5">
        {cautions.map((c) => (
          <li key={c.id}>
            {c.text} <span className="text-xs text-ink-soft">({c.source})</span>
          </li>
        ))}
      </ul>
    </Notice>
  );
}
