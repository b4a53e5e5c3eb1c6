import type { FitResultDto } from '@shared/schemas/workbench.ts';
import type { RunFitDto } from '@shared/schemas/run.ts';
import { runGainPlusMinus } from '@shared/export/run-figures.ts';
import { formatSig } from '@shared/format/measured-number.ts';
import { latticeRunLines } from '@shared/format/lattice-run-lines.ts';
import { interval, pct, r2, withUncertainty } from './format.ts';
import { PlusMinusLabel } from '@/components/ui/plus-minus-label.tsx';

/**
 * The rows a fit shows beside its gain: a point run's interval and %-of-span figures, a reading's bounds, a sine
 * fit's figures, a lattice run's two axes.
 */
function fitRows(fit: FitResultDto | RunFitDto): Array<[string, string]> {
  const run = fit as RunFitDto;
  if (run.lattice) return latticeRunLines(run.lattice);
  if (run.gainBoundsNmPerV)
    return [
      ['Worst-case bounds', `${formatSig(run.gainBoundsNmPerV[0])} to ${formatSig(run.gainBoundsNmPerV[1])} nm/V`],
      ['Span', `${formatSig(fit.spanNm)} nm peak-to-peak`],
    ];
  if (run.sine)
    return [
      ['Drive frequency', `${formatSig(run.sine.frequencyHz)} Hz${run.sine.frequencyKnown ? ' (given)' : ' (fitted)'}`],
      ['Phase lag', `${formatSig(run.sine.phaseLagDeg, 3)}°`],
      ['Residual SD', `${formatSig(fit.residualStdNm, 2)} nm`],
      ['Samples (n)', String(fit.n)],
    ];
  return [
    ...(fit.gainCi95NmPerV ? [['95 % interval', `${interval(fit.gainCi95NmPerV)} nm/V`] as [string, string]] : []),
    ['R²', r2(fit.r2)],
    ['Hysteresis', fit.hysteresisPctFs === null ? '— (needs up and down sweeps)' : `${pct(fit.hysteresisPctFs)} of span`],
    ['Nonlinearity', fit.nonlinearityPctFs === null ? '—' : `${pct(fit.nonlinearityPctFs)} of span`],
    ['Points (n)', String(fit.n)],
  ];
}

/** Gain ± (95 % interval or standard uncertainty, labelled) and the figures of its kind, as the preview and stored runs show them. */
export function FitSummary({ fit, label }: { fit: FitResultDto | RunFitDto; label: string }) {
  const pm = runGainPlusMinus(fit);
  return (
    <div>
      <p className="text-sm text-ink-soft">{label}</p>
      <p className="num text-xl font-semibold">
        {pm.halfWidth === null ? formatSig(fit.gainNmPerV) : withUncertainty(fit.gainNmPerV, pm.halfWidth)}{' '}
        <span className="text-base font-normal">nm/V</span> {pm.halfWidth !== null && <PlusMinusLabel kind={pm.kind} className="text-sm" />}
      </p>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        {fitRows(fit).map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-ink-soft">{k}</dt>
            <dd className="num">{v}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
