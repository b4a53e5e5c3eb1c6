import type { PlausibilityFlag } from '@shared/review/plausibility.ts';
import { flagExplanations, flagTitles } from './flag-explanations.ts';

/** Each flag of a run with its message and why it matters; flags help a moderator look, they never decide. */
export function FlagList({ flags }: { flags: PlausibilityFlag[] }) {
  if (flags.length === 0) {
    return <p className="text-sm text-ink-soft">No flags: fit, point count, hysteresis and gain all lie within the usual bounds.</p>;
  }
  return (
    <ul className="space-y-2">
      {flags.map((f) => (
        <li key={f.code} className="rounded-md border border-l-4 border-amber bg-amber/10 px-3 py-2 text-sm">
          <p className="font-semibold">{flagTitles[f.code]}</p>
          <p>{f.message}</p>
          <p className="mt-0.5 text-ink-soft">{flagExplanations[f.code]}</p>
        </li>
      ))}
    </ul>
  );
}
