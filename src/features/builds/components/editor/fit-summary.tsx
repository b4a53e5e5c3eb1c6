import type { FitResultDto } from '@shared/schemas/workbench.ts';
import { interval, pct, r2, withUncertainty } from './format.ts';
import { PlusMinusLabel } from '@/components/ui/plus-minus-label.tsx';

/** Gain ± 95 % half-width, interval, R², hysteresis, nonlinearity and n, as the preview and stored runs show them. */
export function FitSummary({ fit, label }: { fit: FitResultDto; label: string }) {
  const half = (fit.gainCi95NmPerV[1] - fit.gainCi95NmPerV[0]) / 2;
  const rows: Array<[string, string]> = [
    ['95 % interval', `${interval(fit.gainCi95NmPerV)} nm/V`],
    ['R²', r2(fit.r2)],
    ['Hysteresis', fit.hysteresisPctFs === null ? '— (needs up and down sweeps)' : `${pct(fit.hysteresisPctFs)} of span`],
    ['Nonlinearity', fit.nonlinearityPctFs === null ? '—' : `${pct(fit.nonlinearityPctFs)} of span`],
    ['Points (n)', String(fit.n)],
  ];
  return (
    <div>
      <p className="text-sm text-ink-soft">{label}</p>
      <p className="num text-xl font-semibold">
        {withUncertainty(fit.gainNmPerV, half)} <span className="text-base font-normal">nm/V</span>{' '}
        <PlusMinusLabel kind="ci95" className="text-sm" />
      </p>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
        {rows.map(([k, v]) => (
          <div key={k} className="contents">
            <dt className="text-ink-soft">{k}</dt>
            <dd className="num">{v}</dd>
          </div>
        ))}
      </dl>
    </div>
  );
}
