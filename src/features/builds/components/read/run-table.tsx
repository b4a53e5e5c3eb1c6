import type { RunDto } from '@shared/schemas/run.ts';
import { RunRow } from './run-row.tsx';

const head = 'px-2 pb-2 font-medium';

/** The fit figures of every calibration run of one actuator, newest first. */
export function RunTable({
  runs,
  actuatorName,
  groupId,
  selectedId,
  onSelect,
}: {
  runs: RunDto[];
  actuatorName: string;
  groupId: string;
  selectedId: number | undefined;
  onSelect: (id: number) => void;
}) {
  return (
    <div
      className="overflow-x-auto rounded-md border border-rule"
      tabIndex={0}
      role="group"
      aria-label={`Calibration runs of ${actuatorName}`}
    >
      <table className="w-full min-w-[46rem] text-left text-sm">
        <caption className="sr-only">
          Calibration runs of {actuatorName}: gain with its 95 % interval (point runs) or standard uncertainty (peak-to-peak and sine runs)
          and the fit figures
        </caption>
        <thead className="bg-paper-deep text-xs text-ink-soft">
          <tr className="[&>th]:pt-2">
            <th className={head}>
              <span className="sr-only">Plot</span>
            </th>
            <th className={head}>Recorded</th>
            <th className={`${head} text-right`}>Gain ± (nm/V)</th>
            <th className={`${head} text-right`}>R²</th>
            <th className={`${head} text-right`}>Residual SD (nm)</th>
            <th className={`${head} text-right`}>Nonlinearity (% of span)</th>
            <th className={`${head} text-right`}>Hysteresis (% of span)</th>
            <th className={`${head} text-right`}>n</th>
            <th className={head}>Method</th>
            <th className={head}>Review</th>
          </tr>
        </thead>
        <tbody>
          {runs.map((r) => (
            <RunRow key={r.id} run={r} group={groupId} selected={r.id === selectedId} onSelect={() => onSelect(r.id)} />
          ))}
        </tbody>
      </table>
    </div>
  );
}
