import type { BuildDto } from '@shared/schemas/build.ts';
import { storedRunFlags } from '@shared/review/maker-checks.ts';
import { formatDate } from '@shared/format/dates.ts';
import { Notice } from '@/components/ui/notice.tsx';

/** Before submitting: the flags the review desk will raise on this build's pending runs, each with what to check. */
export function BuildRunFlags({ build }: { build: BuildDto }) {
  const rows = build.actuators.flatMap((a) =>
    a.runs
      .filter((r) => r.status === 'pending')
      .map((r) => ({
        key: r.id,
        where: `${a.label ?? `${a.axis} axis`} · run of ${formatDate(r.measuredOn ?? r.createdAt)}`,
        flags: storedRunFlags(r, {
          expectedGainNmPerV: a.expectedGain?.gainNmPerV ?? null,
          partMedianNmPerV: a.part.stats.gainMedianNmPerV,
        }),
      }))
      .filter((x) => x.flags.length > 0),
  );
  if (rows.length === 0) return null;
  return (
    <Notice tone="caution" title="What a moderator will ask about">
      <ul className="space-y-1">
        {rows.map((r) => (
          <li key={r.key}>
            <span className="font-medium">{r.where}:</span>{' '}
            {r.flags.map((f) => (
              <span key={f.code} className="block pl-3">
                {f.message} <span className="text-ink-soft">{f.advice}</span>
              </span>
            ))}
          </li>
        ))}
      </ul>
      <p className="mt-1 text-xs text-ink-soft">Flags help a moderator look; they never decide. Correct a run or say why in its notes.</p>
    </Notice>
  );
}
