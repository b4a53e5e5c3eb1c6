import type { PlausibilityFlag } from '@shared/review/plausibility.ts';

const chip = 'rounded border border-amber bg-amber/15 px-1.5 py-0.5 text-xs leading-snug text-ink';

/**
 * Plausibility flags as amber chips, each carrying its message in words. `inline` renders spans
 * only, for use inside a button (which may hold no list).
 */
export function FlagChips({ flags, inline = false }: { flags: PlausibilityFlag[]; inline?: boolean }) {
  if (flags.length === 0) return null;
  const mark = (
    <span aria-hidden="true" className="mr-1 font-semibold text-amber">
      !
    </span>
  );
  if (inline) {
    return (
      <span className="flex flex-wrap gap-1.5">
        <span className="sr-only">Flags:</span>
        {flags.map((f) => (
          <span key={f.code} className={chip}>
            {mark}
            {f.message}
          </span>
        ))}
      </span>
    );
  }
  return (
    <ul className="flex flex-wrap gap-1.5" aria-label="Flags">
      {flags.map((f) => (
        <li key={f.code} className={chip}>
          {mark}
          {f.message}
        </li>
      ))}
    </ul>
  );
}
