import type { RunDto } from '@shared/schemas/run.ts';
import { StatusBadge } from '@/components/ui/status-badge.tsx';
import { runFigures } from './run-figures.ts';
import { PlusMinusLabel } from '@/components/ui/plus-minus-label.tsx';

/** The runs at phone width: one box per run with the same figures as the table, units beside each. */
export function RunCards({
  runs,
  group,
  selectedId,
  onSelect,
}: {
  runs: RunDto[];
  group: string;
  selectedId: number | undefined;
  onSelect: (id: number) => void;
}) {
  return (
    <ul className="space-y-2">
      {runs.map((run) => {
        const f = runFigures(run);
        const selected = run.id === selectedId;
        return (
          <li key={run.id} className={`rounded-md border p-3 text-sm ${selected ? 'border-copper bg-copper/5' : 'border-rule'}`}>
            <label className="flex items-center gap-2">
              <input
                type="radio"
                name={group}
                checked={selected}
                onChange={() => onSelect(run.id)}
                aria-label={`Plot the run of ${f.date}`}
                className="h-4 w-4 accent-copper"
              />
              <span className="num">{f.date}</span>
              <span className="ml-auto">
                <StatusBadge tone={f.badge.tone}>{f.badge.label}</StatusBadge>
              </span>
            </label>
            <p className="num mt-2 text-base font-medium">
              {f.gain.value}
              {f.gain.uncertainty && <span className="font-normal text-ink-soft"> ± {f.gain.uncertainty}</span>} nm/V
              {f.gain.uncertainty && <PlusMinusLabel kind={f.plusMinusKind} className="ml-1 font-sans text-xs" />}
            </p>
            <dl className="mt-1 grid grid-cols-2 gap-x-3 text-xs">
              <dt className="text-ink-soft">R²</dt>
              <dd className="num">{f.r2}</dd>
              <dt className="text-ink-soft">Residual SD</dt>
              <dd className="num">{f.residualNm} nm</dd>
              <dt className="text-ink-soft">Nonlinearity</dt>
              <dd className="num">{f.nonlinearityPct} % of span</dd>
              <dt className="text-ink-soft">Hysteresis</dt>
              <dd className="num">{f.hysteresisPct} % of span</dd>
              <dt className="text-ink-soft">Points</dt>
              <dd className="num">{f.n}</dd>
              <dt className="text-ink-soft">Method</dt>
              <dd>{f.method}</dd>
            </dl>
            {run.reviewNote && (
              <p className="mt-2 text-xs text-ink-soft">
                <span className="font-medium text-ink">Review note:</span> {run.reviewNote}
              </p>
            )}
          </li>
        );
      })}
    </ul>
  );
}
