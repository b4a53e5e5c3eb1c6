import type { MakerFlag } from '@shared/review/maker-checks.ts';
import { Notice } from '@/components/ui/notice.tsx';

/** The plausibility flags a moderator will see, shown to the maker first with what to check; nothing when there are none. */
export function MakerFlags({ flags, overLimit }: { flags: readonly MakerFlag[]; overLimit: string | null }) {
  if (flags.length === 0 && !overLimit) return null;
  return (
    <Notice tone="caution" title="Worth a second look before a moderator sees it">
      <ul className="list-disc space-y-1 pl-5">
        {overLimit && <li>{overLimit}</li>}
        {flags.map((f) => (
          <li key={f.code}>
            {f.message} <span className="text-ink-soft">{f.advice}</span>
          </li>
        ))}
      </ul>
      <p className="mt-1 text-xs text-ink-soft">Flags help a moderator look; they never decide. You can still record the run.</p>
    </Notice>
  );
}
