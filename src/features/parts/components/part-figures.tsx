import type { PartStatsDto } from '@shared/schemas/part.ts';
import { formatShort } from '@shared/format/measured-number.ts';

function Figure({ label, value, unit, note }: { label: string; value: string; unit?: string; note?: string }) {
  return (
    <div className="rounded-md border border-rule bg-white px-3 py-2">
      <dt className="text-xs font-medium text-ink-soft">{label}</dt>
      <dd className="mt-0.5">
        <span className="num text-lg font-semibold">{value}</span>
        {unit && value !== '—' && <span className="num ml-1 text-sm text-ink-soft">{unit}</span>}
        {note && <span className="block text-xs text-ink-soft">{note}</span>}
      </dd>
    </div>
  );
}

/** The pooled figures of a part over its accepted runs, each with its unit. */
export function PartFigures({ stats }: { stats: PartStatsDto }) {
  const s = stats;
  const range = (a: number | null, b: number | null) => (a === null || b === null ? '—' : `${formatShort(a)}–${formatShort(b)}`);
  return (
    <dl aria-label="Figures from accepted runs" className="grid grid-cols-2 gap-2 sm:grid-cols-3 lg:grid-cols-6">
      <Figure label="Median gain" value={formatShort(s.gainMedianNmPerV)} unit="nm/V" />
      <Figure label="Quartiles (middle half)" value={range(s.gainP25NmPerV, s.gainP75NmPerV)} unit="nm/V" />
      <Figure label="Lowest–highest" value={range(s.gainMinNmPerV, s.gainMaxNmPerV)} unit="nm/V" />
      <Figure label="Accepted runs" value={String(s.acceptedRunCount)} />
      <Figure label="Builds" value={String(s.buildCount)} />
      <Figure label="Median hysteresis" value={formatShort(s.hysteresisMedianPct, 2)} unit="% of span" />
    </dl>
  );
}
