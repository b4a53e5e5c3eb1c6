import type { RunDto } from '@shared/schemas/run.ts';
import { StatusBadge } from '@/components/ui/status-badge.tsx';
import { runFigures } from './run-figures.ts';
import { PlusMinusLabel } from '@/components/ui/plus-minus-label.tsx';

const cell = 'px-2 py-2 align-top';

/** One calibration run as a table row: the fit figures, method and review state; the radio picks the run to plot. */
export function RunRow({ run, group, selected, onSelect }: { run: RunDto; group: string; selected: boolean; onSelect: () => void }) {
  const f = runFigures(run);
  return (
    <>
      <tr className={`border-t border-rule ${selected ? 'bg-copper/5' : ''}`}>
        <td className={cell}>
          <input
            type="radio"
            name={group}
            checked={selected}
            onChange={onSelect}
            aria-label={`Plot the run of ${f.date}`}
            className="h-4 w-4 accent-copper"
          />
        </td>
        <td className={`${cell} num whitespace-nowrap`}>{f.date}</td>
        <td className={`${cell} num whitespace-nowrap text-right font-medium`}>
          {f.gain.value}
          {f.gain.uncertainty && (
            <span className="font-normal text-ink-soft">
              {' '}
              ± {f.gain.uncertainty} <PlusMinusLabel kind={f.plusMinusKind} className="text-xs" />
            </span>
          )}
        </td>
        <td className={`${cell} num text-right`}>{f.r2}</td>
        <td className={`${cell} num text-right`}>{f.residualNm}</td>
        <td className={`${cell} num text-right`}>{f.nonlinearityPct}</td>
        <td className={`${cell} num text-right`}>{f.hysteresisPct}</td>
        <td className={`${cell} num text-right`}>{f.n}</td>
        <td className={`${cell} min-w-[9rem]`}>
          {f.method}
          <span className="block text-xs text-ink-soft">{f.kind}</span>
        </td>
        <td className={cell}>
          <StatusBadge tone={f.badge.tone}>{f.badge.label}</StatusBadge>
        </td>
      </tr>
      {run.reviewNote && (
        <tr className={selected ? 'bg-copper/5' : ''}>
          <td />
          <td colSpan={9} className="px-2 pb-2 text-xs text-ink-soft">
            <span className="font-medium text-ink">Review note:</span> {run.reviewNote}
          </td>
        </tr>
      )}
    </>
  );
}
