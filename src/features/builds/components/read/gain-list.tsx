import type { BuildGainDto } from '@shared/schemas/build.ts';
import { formatShort } from '@shared/format/measured-number.ts';

/** Small amber ring beside a gain whose run waits for review; the words are there for screen readers and on hover. */
export function PendingMarker() {
  return (
    <span title="Calibration run pending review" className="inline-flex items-center">
      <span aria-hidden="true" className="ml-1 inline-block h-2 w-2 rounded-full border-2 border-amber" />
      <span className="sr-only"> (pending review)</span>
    </span>
  );
}

/** Key measured gains of a build: "X 104 nm/V", one per actuator with a run. */
export function GainList({ gains }: { gains: BuildGainDto[] }) {
  if (gains.length === 0) return <p className="text-xs text-ink-soft">No calibration runs yet</p>;
  return (
    <ul aria-label="Measured gains" className="flex flex-wrap gap-1.5">
      {gains.map((g) => (
        <li
          key={g.actuatorId}
          title={g.partName}
          className="inline-flex items-center rounded border border-rule bg-paper px-1.5 py-0.5 text-xs"
        >
          <span className="mr-1 font-semibold text-teal-dark">{g.axis}</span>
          <span className="num">{formatShort(g.gainNmPerV, 3)} nm/V</span>
          {g.runStatus === 'pending' && <PendingMarker />}
        </li>
      ))}
    </ul>
  );
}
